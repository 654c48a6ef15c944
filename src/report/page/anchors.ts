/**
 * Fragment ids of output blocks that the contents links to, shared by the sections that carry them and the
 * contents that lists them (ids are not shown; headings carry no package numbers).
 */

/** The heating output after a `kind: heating` scenario block. */
export function heatingAnchor(scenarioId: string): string {
  return `hs-${scenarioId}`;
}

/** The prefix of the figure ids in a scenario's output, given the output's anchor (`sc-…`). */
export function scenarioFigurePrefix(scenarioAnchor: string): string {
  return `${scenarioAnchor}-fig`;
}

/** The cooling load part of a design day's output, given the output's figure prefix. */
export function coolingLoadAnchor(figurePrefix: string): string {
  return `${figurePrefix}-cooling-load`;
}

/** A construction's or a design day's part of the sensitivity study, given its output anchor. */
export function sensitivityAnchor(outputAnchor: string): string {
  return `sv-${outputAnchor}`;
}

/** The section holding one project file (1-based, in build order). */
export function documentAnchor(index: number): string {
  return `s-2-${String(index + 1)}`;
}

/** The sensitivity study's section. */
export const SENSITIVITY_ANCHOR = "s-sensitivity";
