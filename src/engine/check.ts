/** One computed check: passes when |value| ≤ limit (a NaN value fails). */
export interface EngineCheck {
  readonly id: string;
  readonly description: string;
  readonly value: number;
  readonly limit: number;
  readonly pass: boolean;
}

/** Builds a check from its value and limit. */
export function engineCheck(id: string, description: string, value: number, limit: number): EngineCheck {
  return { id, description, value, limit, pass: Math.abs(value) <= limit };
}

/**
 * A method choice recorded instead of a check: the engine tried a form, found it unfit for reasons that are
 * numerical properties of that form (not errors in the results), and used another. Never a failure.
 */
export interface MethodNote {
  readonly id: string;
  /** What was chosen and why, one sentence. */
  readonly text: string;
  /** The acceptance figures behind the choice (value against limit; at least one is over its limit). */
  readonly figures: readonly EngineCheck[];
}
