// Immutable update of a value deep inside a JSON document by path, for form fields.
export type JsonPath = readonly (string | number)[];

export function getAt(root: unknown, path: JsonPath): unknown {
  let node: unknown = root;
  for (const key of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string | number, unknown>)[key];
  }
  return node;
}

/** Returns a copy of `root` with `value` at `path`; `undefined` removes an object key. */
export function setAt<T>(root: T, path: JsonPath, value: unknown): T {
  if (path.length === 0) return value as T;
  const [key, ...rest] = path;
  if (Array.isArray(root)) {
    const copy = [...root];
    copy[key as number] = setAt(copy[key as number], rest, value);
    return copy as T;
  }
  const base = root !== null && typeof root === 'object' ? (root as Record<string, unknown>) : {};
  const child = setAt(base[key as string], rest, value);
  const copy: Record<string, unknown> = { ...base, [key as string]: child };
  if (child === undefined) delete copy[key as string];
  return copy as T;
}
