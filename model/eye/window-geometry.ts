/**
 * Geometry of a rectangular window in a vertical wall, described from the occupant's side.
 *
 * Site frame: x east, y north, z up, origin on the floor below the occupant's eye. The wall's
 * outward normal points to `facadeAzimuth_deg` (clockwise from north). The eye (and the work area
 * on the desk) are placed relative to the wall: perpendicular distance to the wall's inner plane
 * and a horizontal offset of the window centre along the wall, positive to the right when looking
 * out. Heights are above the floor.
 */
import { SceneInputError, requireFinite, requireFraction, requireNonNegative, requirePositive } from './scene-input-error.js';
import { add, horizontalDirection_deg, scale, vec3, type Vec3 } from './vector3.js';
import type { PlaneRectangle } from './rectangle-view.js';
import type { Transmittance } from '../photometry/spectrum.js';

/** Position of a viewpoint (eye or work area) relative to one window's wall. */
export interface WallRelativePoint {
  /** Perpendicular distance from the point to the wall's inner plane (m, > 0: inside the room). */
  readonly distanceToWall_m: number;
  /** Horizontal offset of the window centre from the foot of the perpendicular (m, + to the right looking out). */
  readonly windowOffset_m: number;
}

export interface GlazingSpec {
  /** Normal-incidence visible transmittance τ_v,n (0–1), used when no spectral curve is given. */
  readonly visibleTransmittance?: number;
  /** Normal-incidence spectral transmittance; takes precedence over visibleTransmittance. */
  readonly spectralTransmittance?: Transmittance;
  /** Number of glass panes for the angular dependence (default 2; 0 = unglazed opening, no angular loss). */
  readonly panes?: number;
}

export interface ObstructionSpec {
  /** Elevation of the exterior obstruction's top edge seen from the window (deg, 0 = none). */
  readonly horizonAngle_deg: number;
  /** Fraction of the hidden sky (and sun) let through the obstruction per month Jan…Dec (e.g. deciduous trees); default 0 for all months. */
  readonly monthlyTransmittance?: readonly number[];
  /**
   * Luminance of the obstruction's opaque part as a fraction of the sky luminance it hides.
   * Default 0.2 (BRE Digest 309 for a CIE overcast sky, via Tregenza & Sharples "Daylight
   * algorithms" §2.21).
   */
  readonly luminanceFraction?: number;
}

export interface WindowSpec {
  readonly name: string;
  readonly facadeAzimuth_deg: number;
  readonly width_m: number;
  readonly height_m: number;
  readonly sillHeight_m: number;
  readonly eye: WallRelativePoint;
  /** Work-area point on the desk (for the blinds rule and daylight-linked dimming); default: below the eye. */
  readonly desk?: WallRelativePoint;
  readonly glazing: GlazingSpec;
  readonly obstruction?: ObstructionSpec;
}

/** A window placed in the site frame, validated. */
export interface PlacedWindow {
  readonly spec: WindowSpec;
  readonly outwardNormal: Vec3;
  /** Unit vector along the wall, to the right looking out. */
  readonly rightAxis: Vec3;
  readonly area_m2: number;
  readonly panes: number;
  readonly obstructionAngle_deg: number;
  readonly obstructionTransmittance: readonly number[];
  readonly obstructionLuminanceFraction: number;
  /** The aperture as seen from the eye and from the work area. */
  readonly apertureFromEye: PlaneRectangle;
  readonly apertureFromDesk: PlaneRectangle;
}

function aperture(spec: WindowSpec, point: WallRelativePoint, n: Vec3, right: Vec3): PlaneRectangle {
  const centreXY = add(scale(n, point.distanceToWall_m), scale(right, point.windowOffset_m));
  return {
    centre: vec3(centreXY.x, centreXY.y, spec.sillHeight_m + spec.height_m / 2),
    uAxis: right,
    vAxis: vec3(0, 0, 1),
    width_m: spec.width_m,
    height_m: spec.height_m,
  };
}

function checkPoint(field: string, p: WallRelativePoint): void {
  requireFinite(`${field}.distanceToWall_m`, p.distanceToWall_m);
  if (!(p.distanceToWall_m > 0)) {
    throw new SceneInputError(`${field}.distanceToWall_m`, `must be greater than 0: the point is in or behind the window wall (got ${p.distanceToWall_m})`);
  }
  requireFinite(`${field}.windowOffset_m`, p.windowOffset_m);
}

/** Validate a window and place it in the site frame. `field` prefixes messages, e.g. "windows[0]". */
export function placeWindow(field: string, spec: WindowSpec, roomHeight_m: number): PlacedWindow {
  requireFinite(`${field}.facadeAzimuth_deg`, spec.facadeAzimuth_deg);
  requirePositive(`${field}.width_m`, spec.width_m);
  requirePositive(`${field}.height_m`, spec.height_m);
  requireNonNegative(`${field}.sillHeight_m`, spec.sillHeight_m);
  if (spec.sillHeight_m + spec.height_m > roomHeight_m + 1e-9) {
    throw new SceneInputError(`${field}.height_m`, `sill height + window height (${spec.sillHeight_m + spec.height_m} m) exceeds the room height (${roomHeight_m} m)`);
  }
  checkPoint(`${field}.eye`, spec.eye);
  const desk = spec.desk ?? spec.eye;
  if (spec.desk !== undefined) checkPoint(`${field}.desk`, spec.desk);
  const g = spec.glazing;
  if (g.visibleTransmittance !== undefined) requireFraction(`${field}.glazing.visibleTransmittance`, g.visibleTransmittance);
  if (g.spectralTransmittance !== undefined) {
    g.spectralTransmittance.values.forEach((v, i) => {
      if (!(v >= 0 && v <= 1)) throw new SceneInputError(`${field}.glazing.spectralTransmittance[${i}]`, `must lie between 0 and 1 (got ${v})`);
    });
  }
  if (g.visibleTransmittance === undefined && g.spectralTransmittance === undefined) {
    throw new SceneInputError(`${field}.glazing`, 'needs visibleTransmittance or spectralTransmittance');
  }
  const panes = g.panes ?? 2;
  if (!Number.isInteger(panes) || panes < 0 || panes > 4) throw new SceneInputError(`${field}.glazing.panes`, `must be an integer 0–4 (got ${panes}; 0 = unglazed opening)`);
  const ob = spec.obstruction;
  const angle = ob?.horizonAngle_deg ?? 0;
  requireFinite(`${field}.obstruction.horizonAngle_deg`, angle);
  if (angle < 0 || angle >= 90) throw new SceneInputError(`${field}.obstruction.horizonAngle_deg`, `must be in [0, 90) degrees (got ${angle})`);
  const monthly = ob?.monthlyTransmittance ?? new Array<number>(12).fill(0);
  if (monthly.length !== 12) throw new SceneInputError(`${field}.obstruction.monthlyTransmittance`, `needs 12 monthly values (got ${monthly.length})`);
  monthly.forEach((v, i) => requireFraction(`${field}.obstruction.monthlyTransmittance[${i}]`, v));
  const lumFrac = ob?.luminanceFraction ?? 0.2;
  requireFraction(`${field}.obstruction.luminanceFraction`, lumFrac);
  const n = horizontalDirection_deg(spec.facadeAzimuth_deg);
  const right = horizontalDirection_deg(spec.facadeAzimuth_deg + 90);
  return {
    spec,
    outwardNormal: n,
    rightAxis: right,
    area_m2: spec.width_m * spec.height_m,
    panes,
    obstructionAngle_deg: angle,
    obstructionTransmittance: monthly,
    obstructionLuminanceFraction: lumFrac,
    apertureFromEye: aperture(spec, spec.eye, n, right),
    apertureFromDesk: aperture(spec, desk, n, right),
  };
}
