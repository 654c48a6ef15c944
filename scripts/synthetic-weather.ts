/**
 * Writes the demo's SYNTHETIC weather year, projects/demo/weather/synthetic-year-2031.csv: a first comment line
 * `# synthetic: …` (the weather CSV's marker of invented data), the header, then 8760 hourly rows
 * 2031-01-01T01:00 … 2032-01-01T00:00 (local standard time, UTC), invented by the deterministic formulas below. It
 * is not measured or typical climate data of any place; it exists so the demo can show a weather-year scenario.
 *
 * Run from the repository root:
 *   npx -y deno@2.9.6 run --allow-write=projects/demo scripts/synthetic-weather.ts
 *
 * With d = days since 2031-01-01T00:00 (fractional) and h = clock hour:
 *
 * Cloudiness c ∈ [0, 1] (0 clear, 1 overcast), incommensurate periods so no pattern repeats within the year:
 *   c = clamp(0.58 + 0.30 sin(2π d/3.3 + 0.4) + 0.20 sin(2π d/7.9 + 2.1) + 0.12 sin(2π d/1.37 + 4.0)
 *             + 0.12 cos(2π (d − 15)/365), 0, 1)                      (cloudier in winter)
 *
 * Dry bulb at the row time, °C:
 *   T = 10.0 − 6.5 cos(2π (d − 15)/365)                               (annual: coldest mid-January)
 *       + (2.0 + 2.5 (1 − c)) cos(2π (h − 15)/24)                     (daily: peak 15:00, larger swing when clear)
 *       + 2.2 sin(2π d/4.3 + 1.0) + 1.4 sin(2π d/9.7 + 2.5) + 0.8 sin(2π d/2.1 + 0.3)   ("weather" swings)
 *
 * Irradiance: the ASHRAE clear-sky model of src/climate (2013 exponents) for the demo site (52.4° N, 1.9° W, UTC)
 * with invented optical depths τ_b = 0.37 + 0.05 s, τ_d = 2.45 − 0.25 s, s = sin²(π (d − 15)/365), gives the clear
 * beam horizontal B = E_b sin β and diffuse D; then, per instant,
 *   global  G = (B + D)(1 − 0.8 c²),   beam = B (1 − c)²,   diffuse = G − beam
 * so the diffuse share rises with cloud, and 0 ≤ diffuse ≤ global: beam ≥ 0, and G ≥ beam because
 * 1 − 0.8 c² ≥ (1 − c)² for 0 ≤ c ≤ 10/9.
 * Each row's irradiance is the mean over the hour ending at its time: the average of six instants at the middles of
 * the hour's 10-minute parts. Values are rounded to 0.1 °C and 1 W/m².
 */
import { clearSkyIrradiance } from "../src/climate/clearSky.ts";
import { solarPosition } from "../src/climate/solarPosition.ts";
import { parseWeatherCsv } from "../src/climate/weatherCsv.ts";
import { dayOfYearOf, formatLocalTime, localTimeAt, secondsOf } from "../src/climate/weatherTime.ts";

const OUTPUT = "projects/demo/weather/synthetic-year-2031.csv";
const SITE = { latitudeDeg: 52.4, longitudeDeg: -1.9, timeZoneH: 0 };
const START_S = secondsOf({ year: 2031, month: 1, day: 1, hour: 0, minute: 0 });
const TWO_PI = 2 * Math.PI;
/** The first line: the weather CSV's own marker of invented data, so the file says what it is wherever it goes. */
export const SYNTHETIC_COMMENT =
  "# synthetic: invented by scripts/synthetic-weather.ts (documented formulas), not climate data of any place";

/** Cloudiness 0…1 at d days after 2031-01-01T00:00. */
export function cloudiness(d: number): number {
  const c = 0.58 + 0.30 * Math.sin((TWO_PI * d) / 3.3 + 0.4) + 0.20 * Math.sin((TWO_PI * d) / 7.9 + 2.1) +
    0.12 * Math.sin((TWO_PI * d) / 1.37 + 4.0) + 0.12 * Math.cos((TWO_PI * (d - 15)) / 365);
  return Math.min(1, Math.max(0, c));
}

/** Synthetic dry bulb, °C, at d days after 2031-01-01T00:00. */
export function dryBulbC(d: number): number {
  const h = (d - Math.floor(d)) * 24;
  return 10.0 - 6.5 * Math.cos((TWO_PI * (d - 15)) / 365) +
    (2.0 + 2.5 * (1 - cloudiness(d))) * Math.cos((TWO_PI * (h - 15)) / 24) +
    2.2 * Math.sin((TWO_PI * d) / 4.3 + 1.0) + 1.4 * Math.sin((TWO_PI * d) / 9.7 + 2.5) +
    0.8 * Math.sin((TWO_PI * d) / 2.1 + 0.3);
}

/** Synthetic global and diffuse horizontal irradiance, W/m², at the instant d days after 2031-01-01T00:00. */
export function irradianceAt(d: number): { global: number; diffuse: number } {
  const time = localTimeAt(START_S + Math.round(d * 86400));
  const dayOfYear = dayOfYearOf(time.year, time.month, time.day);
  const clockH = (d - Math.floor(d)) * 24;
  const sun = solarPosition({ ...SITE, dayOfYear, localStandardTimeH: clockH, year: time.year }, "meeus");
  if (!(sun.altitudeDeg > 0)) return { global: 0, diffuse: 0 };
  const s = Math.sin((Math.PI * (d - 15)) / 365) ** 2;
  const sky = clearSkyIrradiance(sun.altitudeDeg, dayOfYear, {
    beamOpticalDepth: 0.37 + 0.05 * s,
    diffuseOpticalDepth: 2.45 - 0.25 * s,
  });
  const beamHorizontal = sky.beamNormalWPerM2 * Math.sin((sun.altitudeDeg * Math.PI) / 180);
  const c = cloudiness(d);
  const global = (beamHorizontal + sky.diffuseHorizontalWPerM2) * (1 - 0.8 * c * c);
  return { global, diffuse: global - beamHorizontal * (1 - c) ** 2 };
}

/** The synthetic year as weather CSV text. */
export function syntheticYearCsv(): string {
  const lines = [SYNTHETIC_COMMENT, "time,dry-bulb,global-horizontal,diffuse-horizontal"];
  for (let k = 1; k <= 8760; k++) {
    const d = k / 24;
    let global = 0;
    let diffuse = 0;
    for (let j = 0; j < 6; j++) {
      const e = irradianceAt(d - (55 - 10 * j) / 1440);
      global += e.global / 6;
      diffuse += e.diffuse / 6;
    }
    const g = Math.round(global);
    const time = formatLocalTime(localTimeAt(START_S + k * 3600));
    lines.push(`${time},${plain(dryBulbC(d), 1)},${g},${Math.min(g, Math.round(diffuse))}`);
  }
  return `${lines.join("\n")}\n`;
}

function plain(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

if (import.meta.main) {
  const text = syntheticYearCsv();
  const check = parseWeatherCsv(text, OUTPUT, 1, 3600);
  if (!check.ok || check.synthetic === undefined) {
    throw new Error(check.diagnostics.map((d) => `${d.at.line}: ${d.message}`).join("\n"));
  }
  await Deno.mkdir("projects/demo/weather", { recursive: true });
  await Deno.writeTextFile(OUTPUT, text);
}
