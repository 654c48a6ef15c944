import assert from "node:assert/strict";

/** Asserts |actual − expected| ≤ tolerance, naming the quantity in the message. */
export function assertNear(actual: number, expected: number, tolerance: number, what: string): void {
  assert.ok(
    Number.isFinite(actual) && Math.abs(actual - expected) <= tolerance,
    `${what}: expected ${expected} ± ${tolerance}, got ${actual}`,
  );
}

/** Smallest signed difference a − b between two angles in degrees, in [−180, 180). */
export function angleDiffDeg(aDeg: number, bDeg: number): number {
  return ((((aDeg - bDeg + 180) % 360) + 360) % 360) - 180;
}
