/**
 * Blinds and shades of a window: states open / lowered / closed. A lowered or closed shade is a
 * diffuser (EnergyPlus shade model): no direct sun and no
 * view; the window becomes a uniform luminance τ_shade·E_transmitted/π. Default diffuse
 * transmittances: lowered 0.25 (the "simple dynamic shading" convention of annual daylight tools),
 * closed 0.02 (blackout, assumed).
 *
 * Control:
 *  - manual: one state all the time;
 *  - schedule: a state per minute of the day;
 *  - sun-on-work-area: after Reinhart (2004, Solar Energy 77(1):15–28; rule details from memory):
 *    lower when direct sun on the work area exceeds `lowerAbove_W_m2`
 *    (default 50 W/m²); raise again either once a day on the occupant's first arrival
 *    (`raise: 'on-arrival'`, Reinhart's active user) or when the direct sun on the work area has
 *    stayed below `raiseBelow_W_m2` (default 25 W/m², our hysteresis choice) for `raiseAfter_min`
 *    minutes (default 30).
 */
import { expandDailySchedule, type DailySchedule } from './daily-schedule.js';
import { SceneInputError, requireFraction, requireNonNegative } from './scene-input-error.js';

export const BLIND_OPEN = 0;
export const BLIND_LOWERED = 1;
export const BLIND_CLOSED = 2;
export type BlindStateName = 'open' | 'lowered' | 'closed';
const STATE_CODE: Record<BlindStateName, number> = { open: BLIND_OPEN, lowered: BLIND_LOWERED, closed: BLIND_CLOSED };

export type BlindControl =
  | { readonly kind: 'manual'; readonly state: BlindStateName }
  | { readonly kind: 'schedule'; readonly schedule: DailySchedule<BlindStateName> }
  | {
      readonly kind: 'sun-on-work-area';
      readonly lowerAbove_W_m2?: number;
      readonly raiseBelow_W_m2?: number;
      readonly raiseAfter_min?: number;
      readonly raise?: 'when-clear' | 'on-arrival';
      readonly loweredState?: 'lowered' | 'closed';
    };

export interface ShadingSpec {
  readonly loweredTransmittance?: number;
  readonly closedTransmittance?: number;
  readonly control: BlindControl;
}

export interface PreparedShading {
  /** Diffuse transmittance by state code (open = 1). */
  readonly transmittance: readonly [number, number, number];
  readonly control: BlindControl;
  readonly scheduled: Uint8Array | undefined;
}

export function prepareShading(field: string, spec: ShadingSpec | undefined): PreparedShading {
  const s = spec ?? { control: { kind: 'manual', state: 'open' } as const };
  const lowered = requireFraction(`${field}.loweredTransmittance`, s.loweredTransmittance ?? 0.25);
  const closed = requireFraction(`${field}.closedTransmittance`, s.closedTransmittance ?? 0.02);
  const c = s.control;
  let scheduled: Uint8Array | undefined;
  if (c.kind === 'schedule') scheduled = Uint8Array.from(expandDailySchedule(`${field}.control.schedule`, c.schedule), (v) => STATE_CODE[v]);
  else if (c.kind === 'manual') {
    if (STATE_CODE[c.state] === undefined) throw new SceneInputError(`${field}.control.state`, `must be open, lowered or closed (got ${String(c.state)})`);
  } else {
    const lo = requireNonNegative(`${field}.control.lowerAbove_W_m2`, c.lowerAbove_W_m2 ?? 50);
    const hi = requireNonNegative(`${field}.control.raiseBelow_W_m2`, c.raiseBelow_W_m2 ?? 25);
    if (hi > lo) throw new SceneInputError(`${field}.control.raiseBelow_W_m2`, `must not exceed lowerAbove_W_m2 (${hi} > ${lo})`);
    requireNonNegative(`${field}.control.raiseAfter_min`, c.raiseAfter_min ?? 30);
  }
  return { transmittance: [1, lowered, closed], control: c, scheduled };
}

/** Mutable state of one window's blind under the sun rule. */
export interface BlindMemory {
  state: number;
  clearMinutes: number;
}

/**
 * Next blind state. `sunOnWorkArea_W_m2`: direct solar irradiance on the work area through this
 * window with the blind open; `arrival`: first minute of the occupant in the room this day.
 */
export function nextBlindState(sh: PreparedShading, memory: BlindMemory, minuteOfDay: number, sunOnWorkArea_W_m2: number, arrival: boolean): number {
  const c = sh.control;
  if (c.kind === 'manual') return STATE_CODE[c.state];
  if (c.kind === 'schedule') return (sh.scheduled as Uint8Array)[minuteOfDay] as number;
  const lowerAbove = c.lowerAbove_W_m2 ?? 50;
  const loweredCode = c.loweredState === 'closed' ? BLIND_CLOSED : BLIND_LOWERED;
  if (memory.state === BLIND_OPEN) {
    if (sunOnWorkArea_W_m2 > lowerAbove) {
      memory.state = loweredCode;
      memory.clearMinutes = 0;
    }
    return memory.state;
  }
  if ((c.raise ?? 'when-clear') === 'on-arrival') {
    if (arrival) memory.state = sunOnWorkArea_W_m2 > lowerAbove ? loweredCode : BLIND_OPEN;
    return memory.state;
  }
  memory.clearMinutes = sunOnWorkArea_W_m2 < (c.raiseBelow_W_m2 ?? 25) ? memory.clearMinutes + 1 : 0;
  if (memory.clearMinutes >= (c.raiseAfter_min ?? 30)) memory.state = BLIND_OPEN;
  return memory.state;
}
