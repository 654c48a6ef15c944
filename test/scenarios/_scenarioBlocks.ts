/**
 * Scenario blocks as project Markdown text, over wall EW-1 of the minimal good project (test/fixtures/good/minimal),
 * for tests that add a scenario to a project. Sites, temperatures and surfaces are invented.
 */

/** A south wall surface: 10 m², tilt 90°, absorptance 0.6. */
export const SOUTH_WALL =
  "{ id: s1, construction: EW-1, azimuth: 180 deg, tilt: 90 deg, area: 10 m^2, absorptance: 0.6 }";

/**
 * A weather scenario block reading `weather` (the text after "weather: ", quoted if needed), indoor 21 °C, at a site at
 * 52.4° N, 1.9° W, UTC, with the south wall; `extra` lines come right after the weather line. Ends with a newline.
 */
export function weatherScenarioBlock(
  weather: string,
  options: { readonly id?: string; readonly extra?: readonly string[] } = {},
): string {
  return [
    "```scenario",
    `id: ${options.id ?? "year"}`,
    "kind: weather",
    `weather: ${weather}`,
    ...(options.extra ?? []),
    "indoor: 21 degC",
    "site: { latitude: 52.4 deg, longitude: -1.9 deg, time-zone: 0 h }",
    "surfaces:",
    `  - ${SOUTH_WALL}`,
    "```",
    "",
  ].join("\n");
}

/**
 * A design-day scenario block `id`: indoor 24 °C, 21 July, 30 °C peak with a 10 K daily range, no sky model, over the
 * given surfaces (each a flow mapping). Ends with a newline.
 */
export function designDayBlock(id: string, surfaces: readonly string[]): string {
  return [
    "```scenario",
    `id: ${id}`,
    "kind: design-day",
    "indoor: 24 degC",
    "outdoor: { max-dry-bulb: 30 degC, daily-range: 10 K }",
    "date: 07-21",
    "sky: none",
    "surfaces:",
    ...surfaces.map((s) => `  - ${s}`),
    "```",
    "",
  ].join("\n");
}
