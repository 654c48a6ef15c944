/**
 * The memory bound of a weather scenario. The hourly CSV is written row by row, so every surface's sol-air and inside
 * flux, and every orientation's incident irradiance, are held until then (Float64, 8 B a value, one more transient
 * series per orientation while transposing). A scenario whose estimated peak would pass 2 GB is refused before any
 * series is made, with the figure. The constants are measured with scripts/scale-weather.ts (README "Reliability").
 */
import { type Diagnostic, error } from "../project/diagnostic.ts";
import type { Scenario } from "../project/model.ts";
import { DEFAULT_GROUND_REFLECTANCE } from "./surfaceParameters.ts";

/** Peak a run may reach, bytes. */
export const MEMORY_BUDGET_BYTES = 2e9;
/** Runtime, engine and package before any weather row, bytes (measured: about 300 MB, with margin). */
export const BASE_BYTES = 400e6;
/**
 * Bytes per weather row whatever the surfaces: the file's text and bytes, its base64 in the package, the parsed
 * columns, clock, indoor, outdoor, total and heat-gain series, the recursion's transient arrays and collector slack
 * (measured with one surface: 2,448,000 rows of a 66 MB file peak at 1.15 GB, about 345 B a row with the 300 MB
 * base; taken as 320 B plus the surface and orientation below, with the 400 MB base).
 */
export const BYTES_PER_ROW = 320;
/** Bytes per row and surface (sol-air, inside flux) and per row and orientation (incident, transposition). */
export const BYTES_PER_SURFACE_STEP = 16;

type WeatherScenario = Extract<Scenario, { kind: "weather" }>;

const grouped = (n: number) => String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ",");

/** Distinct orientations with the solar model (surfaces with a given sol-air list have none), as the boundary groups them. */
export function orientationCount(scenario: WeatherScenario): number {
  const keys = new Set<string>();
  for (const s of scenario.surfaces) {
    if (s.solAirC !== undefined) continue;
    keys.add(
      `${s.azimuthDeg ?? 180}|${s.tiltDeg ?? 90}|${s.groundReflectance ?? DEFAULT_GROUND_REFLECTANCE}`,
    );
  }
  return keys.size;
}

/** Bytes a weather scenario of `rows` rows holds until its CSV is written. */
export function weatherScenarioBytes(rows: number, surfaces: number, orientations: number): number {
  return rows * (BYTES_PER_ROW + BYTES_PER_SURFACE_STEP * (surfaces + orientations));
}

/**
 * Checks a weather scenario against the budget, given the bytes earlier weather scenarios of the run already hold
 * (their CSVs are written at the end): the error with the figure, or the bytes this one adds.
 */
export function weatherBudget(
  scenario: WeatherScenario,
  rows: number,
  heldBytes = 0,
): { ok: true; bytes: number } | { ok: false; diagnostic: Diagnostic } {
  const surfaces = scenario.surfaces.length;
  const bytes = weatherScenarioBytes(rows, surfaces, orientationCount(scenario));
  const peak = BASE_BYTES + heldBytes + bytes;
  if (peak <= MEMORY_BUDGET_BYTES) return { ok: true, bytes };
  const perSurface = rows * BYTES_PER_SURFACE_STEP * 2;
  const room = MEMORY_BUDGET_BYTES - BASE_BYTES - heldBytes - weatherScenarioBytes(rows, 0, 0);
  const fitting = Math.max(0, Math.floor(room / perSurface));
  const diagnostic = error(
    scenario.weatherAt,
    "weather-too-large",
    `Split scenario "${scenario.id}": ${grouped(rows)} rows × ${grouped(surfaces)} surfaces = ${
      grouped(rows * surfaces)
    } surface-steps needs about ${(peak / 1e9).toFixed(1)} GB, above the ${
      MEMORY_BUDGET_BYTES / 1e9
    } GB a run may use`,
    fitting > 0
      ? `give at most about ${grouped(fitting)} surfaces here, or use a coarser time step or a shorter file`
      : "use a coarser time step or a shorter weather file, or fewer weather scenarios in one project",
  );
  return { ok: false, diagnostic };
}
