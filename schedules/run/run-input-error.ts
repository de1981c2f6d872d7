/** A run input that cannot be used; `path` names the scenario field or input (e.g. "site.weather.file"). */
export class RunInputError extends Error {
  constructor(
    readonly path: string,
    message: string,
  ) {
    super(`${path}: ${message}`);
    this.name = 'RunInputError';
  }
}
