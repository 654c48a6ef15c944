/** Degrees per radian. */
export const DEG_PER_RAD = 180 / Math.PI;

/** Converts degrees to radians. */
export function toRad(angleDeg: number): number {
  return angleDeg / DEG_PER_RAD;
}

/** Converts radians to degrees. */
export function toDeg(angleRad: number): number {
  return angleRad * DEG_PER_RAD;
}

/** Wraps an angle in degrees into [0, 360). */
export function wrap360(angleDeg: number): number {
  const wrapped = angleDeg % 360;
  return wrapped < 0 ? wrapped + 360 : wrapped;
}

/** Wraps an angle in degrees into [−180, 180). */
export function wrap180(angleDeg: number): number {
  return wrap360(angleDeg + 180) - 180;
}

/** Sine of an angle in degrees. */
export function sinDeg(angleDeg: number): number {
  return Math.sin(toRad(angleDeg));
}

/** Cosine of an angle in degrees. */
export function cosDeg(angleDeg: number): number {
  return Math.cos(toRad(angleDeg));
}

/** Clamps x into [−1, 1] before an inverse sine or cosine (guards rounding just outside the domain). */
export function clampUnit(x: number): number {
  return Math.min(1, Math.max(-1, x));
}
