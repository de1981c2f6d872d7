/**
 * 3-D vectors in the site frame used by the light-at-the-eye model: x = east, y = north,
 * z = up (metres for positions, unit length for directions). Azimuths are measured from north,
 * clockwise (eastward), as for the sun position.
 */
export interface Vec3 {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

const DEG = Math.PI / 180;

export function vec3(x: number, y: number, z: number): Vec3 {
  return { x, y, z };
}

export function dot(a: Vec3, b: Vec3): number {
  return a.x * b.x + a.y * b.y + a.z * b.z;
}

export function add(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x + b.x, y: a.y + b.y, z: a.z + b.z };
}

export function sub(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x - b.x, y: a.y - b.y, z: a.z - b.z };
}

export function scale(a: Vec3, k: number): Vec3 {
  return { x: a.x * k, y: a.y * k, z: a.z * k };
}

export function norm(a: Vec3): number {
  return Math.hypot(a.x, a.y, a.z);
}

export function normalize(a: Vec3): Vec3 {
  const n = norm(a);
  return { x: a.x / n, y: a.y / n, z: a.z / n };
}

/** Unit vector toward altitude α (deg above horizontal) and azimuth A (deg clockwise from north). */
export function directionFromAltAz_deg(altitude_deg: number, azimuth_deg: number): Vec3 {
  const a = altitude_deg * DEG;
  const z = azimuth_deg * DEG;
  return { x: Math.sin(z) * Math.cos(a), y: Math.cos(z) * Math.cos(a), z: Math.sin(a) };
}

/** Horizontal unit vector at azimuth A (deg clockwise from north). */
export function horizontalDirection_deg(azimuth_deg: number): Vec3 {
  return directionFromAltAz_deg(0, azimuth_deg);
}
