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
