/** One numerical check of a result against its limit (results.json `checks[]`, DESIGN.md §4). */
export interface CheckResult {
  /** Stable id, e.g. `sum-rule-Y`. */
  readonly id: string;
  /** `construction:<id>` or `scenario:<id>/<surface>` */
  readonly subject: string;
  readonly description: string;
  readonly value: number;
  readonly limit: number;
  readonly pass: boolean;
}
