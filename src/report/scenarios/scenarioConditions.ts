/** The conditions of a scenario as the computation used them: the day or year, the site, the sky, and each surface. */
import type { Assumption, Scenario, ScenarioSurface, Site, TemperatureProfile } from "../../project/model.ts";
import type { ScenarioResults, SurfaceResults } from "../../results/types.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatFixed, formatSig, formatTrim, MINUS } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { renderScenarioNotes } from "./scenarioNotes.ts";
import {
  coverageLabel,
  MONTH_NAMES,
  numberKey,
  objectKey,
  orientationWord,
  type ParameterBasis,
  parameterBasis,
  stringKey,
  weatherTime,
} from "./scenarioData.ts";

const DASH = "—";

function signedDeg(value: number, positive: string, negative: string): string {
  return `${formatTrim(Math.abs(value), 6)}° ${value < 0 ? negative : positive}`;
}

function utcOffset(hours: number): string {
  return `UTC${hours < 0 ? MINUS : "+"}${formatTrim(Math.abs(hours), 4)} h`;
}

/** The time step as minutes below one hour, hours otherwise. */
export function stepText(timestepH: number): string {
  return timestepH < 1 ? `${formatTrim(timestepH * 60, 4)} min` : `${formatTrim(timestepH, 4)} h`;
}

function siteText(site: Site | undefined, d: DisplayUnits): string {
  if (site === undefined) return "Not given (no sun position is needed without a sky model).";
  const elevation = site.elevationM === undefined
    ? "elevation not given"
    : `elevation ${formatTrim(toDisplay(d, "length", site.elevationM), 3)} ${unitLabel(d, "length")}`;
  return `Latitude ${signedDeg(site.latitudeDeg, "N", "S")}, longitude ${
    signedDeg(site.longitudeDeg, "E", "W")
  }, time zone ${utcOffset(site.timeZoneH)}, ${elevation}.`;
}

function temperatureText(profile: TemperatureProfile, d: DisplayUnits): string {
  const t = (c: number) => toDisplay(d, "temperature", c);
  const unit = unitLabel(d, "temperature");
  if (profile.kind === "constant") return `${formatTrim(t(profile.valueC), 4)} ${unit} at every step.`;
  const min = Math.min(...profile.hourlyC);
  const max = Math.max(...profile.hourlyC);
  return `24 hourly values given in the input (${formatFixed(t(min), 1)} to ${
    formatFixed(t(max), 1)
  } ${unit}), linear between hours.`;
}

function noteStarting(notes: readonly string[], start: string): string {
  return notes.find((n) => n.startsWith(start)) ?? "";
}

function row(label: string, value: Trusted | string): Trusted {
  return html`
    <tr>
      <th scope="row">${label}</th>
      <td>${value}</td>
    </tr>
  `;
}

function designDayRows(
  scenario: Extract<Scenario, { kind: "design-day" }>,
  results: ScenarioResults,
  d: DisplayUnits,
): Trusted[] {
  const outdoor = scenario.outdoor.kind === "daily-range"
    ? `Maximum dry bulb ${formatTrim(toDisplay(d, "temperature", scenario.outdoor.maxDryBulbC), 4)} ${
      unitLabel(d, "temperature")
    }, daily range ${formatTrim(toDisplay(d, "temperatureDifference", scenario.outdoor.dailyRangeK), 4)} ${
      unitLabel(d, "temperatureDifference")
    }. ${noteStarting(results.notes, "Outdoor dry bulb:")}`
    : `24 hourly dry-bulb values given in the input, linear between hours.`;
  const sky = scenario.sky.kind === "none"
    ? "None: no solar irradiance; sol-air temperature = outdoor air − long-wave correction."
    : `Clear sky, beam optical depth τb = ${
      formatTrim(scenario.sky.beamOpticalDepth, 4)
    }, diffuse optical depth τd = ${formatTrim(scenario.sky.diffuseOpticalDepth, 4)}. ${
      noteStarting(results.notes, "Irradiance:")
    }`;
  const convergence = results.convergence === undefined
    ? "Not recorded."
    : `Day repeated ${
      String(results.convergence.days)
    } times from rest until the whole day settled (every step within the bound of the periodic-convergence check; last change of the daily peak ${
      formatSig(results.convergence.peakChange, 2)
    }, relative); see the periodic-convergence checks.`;
  return [
    row("Kind", "Design day, steady-periodic: the same day repeats, indoor temperature held throughout."),
    row("Date", `${MONTH_NAMES[scenario.month - 1] ?? String(scenario.month)} ${String(scenario.day)}.`),
    row("Outdoor air", outdoor),
    row("Sky", sky),
    row("Repetition", convergence),
  ];
}

function weatherRows(path: string, results: ScenarioResults, d: DisplayUnits): Trusted[] {
  const t = (c: number) => formatFixed(toDisplay(d, "temperature", c), 1);
  const unit = unitLabel(d, "temperature");
  const w = objectKey(results, "weather");
  const first = stringKey(w, "firstTime");
  const last = stringKey(w, "lastTime");
  const steps = numberKey(w, "steps");
  const mean = numberKey(w, "dryBulbMean_C");
  const min = numberKey(w, "dryBulbMin_C");
  const max = numberKey(w, "dryBulbMax_C");
  const global = numberKey(w, "globalHorizontal_J_per_m2");
  const days = numberKey(objectKey(results, "warmUp"), "days");
  const coverage = coverageLabel(results);
  const tau = numberKey(objectKey(results, "warmUp"), "tau1_h");
  const span = first === undefined || last === undefined || steps === undefined
    ? "Extent not recorded in results.json."
    : `${String(steps)} rows, ${weatherTime(first)} to ${weatherTime(last)}.`;
  const air = mean === undefined || min === undefined || max === undefined
    ? "Not recorded in results.json."
    : `Dry bulb from the file: mean ${t(mean)} ${unit}, lowest ${t(min)} ${unit}, highest ${t(max)} ${unit}.`;
  const rows = [
    row(
      "Kind",
      coverage.kind === "year"
        ? "Weather year: the file's rows in sequence after a warm-up (see the assumptions register)."
        : `Weather ${coverage.label} (not a year, as the scenario's period states): the file's rows in sequence after a warm-up, the period repeating (see the assumptions register).`,
    ),
    row("Weather file", html`<code>${path}</code> ${span}`),
    row("Outdoor air", air),
    row(
      "Sky",
      global === undefined
        ? "Irradiance from the weather file (see the notes)."
        : `Irradiance from the weather file; global horizontal ${
          formatTrim(toDisplay(d, "irradiation", global), 3)
        } ${unitLabel(d, "irradiation")} over the file (see the notes for the transposition).`,
    ),
  ];
  if (days !== undefined && tau !== undefined) {
    rows.push(
      row(
        "Warm-up",
        `${String(days)} days run before the first row (slowest τ1 = ${formatFixed(tau, 1)} h).`,
      ),
    );
  }
  return rows;
}

/** Rows of the conditions table: kind, step and time base, site, date, outdoor, sky, indoor. */
function conditionRows(scenario: Scenario, results: ScenarioResults, d: DisplayUnits): Trusted[] {
  const timeBase = scenario.kind === "design-day"
    ? "Local standard time (no daylight saving); value k is at k·Δ from 00:00. Solar time is derived from it as local standard time + equation of time + (longitude − 15° × time zone)/15° h."
    : "Local standard time as written in the weather file; row k is at the first row's time + k·Δ.";
  const kindRows = scenario.kind === "design-day"
    ? designDayRows(scenario, results, d)
    : weatherRows(scenario.weatherPath, results, d);
  const [kindRow, ...otherRows] = kindRows;
  return [
    row("Scenario", scenario.id),
    ...(kindRow === undefined ? [] : [kindRow]),
    row("Time step Δ", `${stepText(results.timestep_h)}${scenario.timestepDefaulted ? " (default)" : ""}.`),
    row("Time base", timeBase),
    row("Site", siteText(scenario.site, d)),
    ...otherRows,
    row("Indoor air", temperatureText(scenario.indoor, d)),
  ];
}

/** The notes the conditions table quotes word for word (a design day's outdoor and sky rows). */
function quotedNotes(scenario: Scenario, results: ScenarioResults): string[] {
  if (scenario.kind !== "design-day") return [];
  const quoted: string[] = [];
  if (scenario.outdoor.kind === "daily-range") quoted.push(noteStarting(results.notes, "Outdoor dry bulb:"));
  if (scenario.sky.kind !== "none") quoted.push(noteStarting(results.notes, "Irradiance:"));
  return quoted.filter((n) => n !== "");
}

function marked(text: string, basis: ParameterBasis): Trusted {
  if (basis === "given") return html`${text}`;
  const note = basis === "default" ? "(default)" : "(given; differs from 1/R_se)";
  return html`${text}<span class="muted default-mark">${note}</span>`;
}

function orientationCell(surface: ScenarioSurface | undefined, computed: SurfaceResults): Trusted {
  if (surface === undefined) return html`<td>${DASH}</td>`;
  if (computed.parameters.absorptance === null) {
    return html`<td>${DASH} <span class="muted">(sol-air given)</span></td>`;
  }
  const azimuth = surface.azimuthDeg ?? 180;
  const tilt = surface.tiltDeg ?? 90;
  const azimuthText = `${formatTrim(azimuth, 4)}°${surface.azimuthDeg === undefined ? " (default)" : ""}`;
  const tiltText = `${formatTrim(tilt, 4)}°${surface.tiltDeg === undefined ? " (default)" : ""}`;
  return html`<td>${
    orientationWord(azimuth, tilt)
  }<span class="muted default-mark">azimuth ${azimuthText}, tilt ${tiltText}</span></td>`;
}

/** Input to the surface table: the scenario, its results, the register that marks defaults and the display units. */
export interface SurfaceTableInput {
  readonly scenario: Scenario;
  readonly results: ScenarioResults;
  readonly assumptions: readonly Pick<Assumption, "id">[];
  readonly constructionAnchors: ReadonlyMap<string, string>;
  readonly display: DisplayUnits;
}

function surfaceRow(input: SurfaceTableInput, id: string, computed: SurfaceResults): Trusted {
  const { scenario, assumptions, display: d } = input;
  const surface = scenario.surfaces.find((s) => s.id === id);
  const basis = (name: string) => parameterBasis(assumptions, name, scenario.id, id);
  const p = computed.parameters;
  const anchor = input.constructionAnchors.get(computed.construction);
  const construction = anchor === undefined
    ? html`${computed.construction}`
    : html`<a href="#${anchor}">${computed.construction}</a>`;
  return html`<tr><td>${id}</td><td>${construction}</td>${
    orientationCell(surface, computed)
  }<td class="num">${formatTrim(toDisplay(d, "area", computed.area), 3)}</td><td>${
    p.absorptance === null ? DASH : formatTrim(p.absorptance, 3)
  }</td><td>${marked(formatTrim(p.emittance, 3), basis("emittance"))}</td><td>${
    marked(formatTrim(toDisplay(d, "transmittance", p.outsideCoefficient), 3), basis("outside-coefficient"))
  }</td><td>${
    marked(
      formatFixed(toDisplay(d, "temperatureDifference", p.longwaveCorrection), 2),
      basis("longwave-correction"),
    )
  }</td><td>${marked(formatTrim(p.radiantFraction, 3), basis("radiant-fraction"))}</td><td>${
    marked(formatTrim(p.groundReflectance, 3), basis("ground-reflectance"))
  }</td></tr>`;
}

/** Renders the conditions table, the surface table (defaults marked, display units) and the scenario's notes. */
export function renderConditions(input: SurfaceTableInput): Trusted {
  const { scenario, results, display: d } = input;
  const rows = Object.entries(results.surfaces).map(([id, s]) => surfaceRow(input, id, s));
  return html`
    <table class="conditions">
      <caption>Conditions of scenario ${scenario.id} as computed</caption>
      <tbody>${conditionRows(scenario, results, d)}</tbody>
    </table>
    <table class="scenario-surfaces compact">
      <caption>Surfaces of scenario ${scenario
        .id} with the values used. Azimuth clockwise from north, tilt from horizontal; α solar absorptance, ε long-wave emittance, h_o outside surface coefficient, ΔT_lw long-wave correction subtracted from the sol-air temperature, f_rad radiant fraction of the heat gain, ρg ground reflectance. "(default)" marks a value the tool filled in (assumptions register).</caption>
      <thead>
        <tr>
          <th>Surface</th>
          <th>Construction</th>
          <th>Orientation</th>
          <th>Area ${unitLabel(d, "area")}</th>
          <th>α</th>
          <th>ε</th>
          <th>h_o ${unitLabel(d, "transmittance")}</th>
          <th>ΔT_lw ${unitLabel(d, "temperatureDifference")}</th>
          <th>f_rad</th>
          <th>ρg</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
    ${renderScenarioNotes(results.notes, quotedNotes(scenario, results), d)}
  `;
}
