/** Why a construction cannot be analysed. */
export type UnresolvableReason =
  | "no-layers"
  | "invalid-layer"
  | "invalid-surface-resistance"
  | "zero-resistance"
  | "invalid-timestep"
  | "too-many-poles";

/** A construction the engine cannot resolve, with the reason and a message a user can act on. */
export interface Unresolvable {
  readonly kind: "unresolvable";
  readonly reason: UnresolvableReason;
  readonly message: string;
}

/** Builds an unresolvable-construction value. */
export function unresolvable(reason: UnresolvableReason, message: string): Unresolvable {
  return { kind: "unresolvable", reason, message };
}
