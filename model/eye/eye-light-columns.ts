/**
 * Result columns of the light-at-the-eye model: one sample per minute, per source, per quantity.
 * Photopic illuminance (lx) and the five CIE S 026 α-opic equivalent daylight (D65) illuminances
 * (lx) on the vertical eye plane facing the gaze.
 */
export interface QuantityColumns {
  readonly photopic_lx: Float64Array;
  readonly sc_edi_lx: Float64Array;
  readonly mc_edi_lx: Float64Array;
  readonly lc_edi_lx: Float64Array;
  readonly rh_edi_lx: Float64Array;
  readonly mel_edi_lx: Float64Array;
}

export const EYE_LIGHT_SOURCES = ['daylight', 'electric', 'screen', 'outdoor'] as const;
export type EyeLightSource = (typeof EYE_LIGHT_SOURCES)[number];

export interface EyeLightColumns {
  readonly minutes: number;
  readonly startMinuteOfDay: number;
  readonly bySource: Readonly<Record<EyeLightSource, QuantityColumns>>;
  readonly total: QuantityColumns;
  /** Blind state per window per minute (0 open, 1 lowered, 2 closed), for charts and checks. */
  readonly blindState: readonly Uint8Array[];
}

export function emptyQuantityColumns(n: number): QuantityColumns {
  return {
    photopic_lx: new Float64Array(n),
    sc_edi_lx: new Float64Array(n),
    mc_edi_lx: new Float64Array(n),
    lc_edi_lx: new Float64Array(n),
    rh_edi_lx: new Float64Array(n),
    mel_edi_lx: new Float64Array(n),
  };
}

/** Add `lux` of a source with response r ([photopic, sc, mc, lc, rh, mel] per lux) at minute i. */
export function addResponse(c: QuantityColumns, i: number, lux: number, r: Float64Array): void {
  c.photopic_lx[i] = (c.photopic_lx[i] as number) + lux * (r[0] as number);
  c.sc_edi_lx[i] = (c.sc_edi_lx[i] as number) + lux * (r[1] as number);
  c.mc_edi_lx[i] = (c.mc_edi_lx[i] as number) + lux * (r[2] as number);
  c.lc_edi_lx[i] = (c.lc_edi_lx[i] as number) + lux * (r[3] as number);
  c.rh_edi_lx[i] = (c.rh_edi_lx[i] as number) + lux * (r[4] as number);
  c.mel_edi_lx[i] = (c.mel_edi_lx[i] as number) + lux * (r[5] as number);
}

/** addResponse into a source's columns and into the total at once. */
export function addResponse2(c: QuantityColumns, total: QuantityColumns, i: number, lux: number, r: Float64Array): void {
  addResponse(c, i, lux, r);
  addResponse(total, i, lux, r);
}
