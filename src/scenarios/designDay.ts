import {
  type BoundarySurface,
  designDayBoundary,
  type DesignDayInput,
  expandHourlyToSteps,
} from "../climate/mod.ts";
import type { DynamicAnalysis } from "../engine/mod.ts";
import {
  ctfRepeatedDayFlux,
  type RepeatedDay,
  repeatedDayFlux,
  steadyPeriodicFlux,
  type SurfaceFlux,
} from "../engine/surfaceFlux.ts";
import type { Assumption, Construction, Scenario, TemperatureProfile } from "../project/model.ts";
import type { CheckResult } from "../engine/checkResult.ts";
import type { ScenarioResults, SurfaceResults } from "./types.ts";
import { coolingLoadNotes, designDayCoolingLoad } from "./coolingLoad.ts";
import { gainAndLoss, meanOf, peakOf, sumSeries } from "./seriesStats.ts";
import { outsideFilmNote, outsideFilmOf } from "./outsideFilm.ts";
import { type SurfaceParameters, surfaceParameters, type SurfaceWarning } from "./surfaceParameters.ts";

/**
 * What a scenario computation needs: the constructions and their analyses at a timestep, optionally with another
 * outside surface resistance R_se in m²K/W (the design day's summer film), cached by the caller.
 */
export interface ScenarioContext {
  readonly constructions: ReadonlyMap<string, Construction>;
  analysisAt(constructionId: string, timestepS: number, outsideResistance?: number): DynamicAnalysis;
}

/** A computed scenario with the checks, assumptions and warnings it adds. */
export interface ScenarioOutcome {
  readonly results: ScenarioResults;
  readonly checks: readonly CheckResult[];
  readonly assumptions: readonly Assumption[];
  readonly warnings: readonly SurfaceWarning[];
}

/**
 * Convergence criterion of the repeated day: the a priori bound of the whole day's distance from the steady-periodic
 * day (`periodicStart.ts`) and the last day-to-day change are both below this fraction of max(peak |q|, U × 1 K).
 */
export const PERIODIC_CONVERGENCE_TOLERANCE = 1e-4;
/**
 * Limit of the periodic-convergence check (recursion vs periodic response factors, every step of the day, relative
 * to max(peak |q|, U × 1 K)): ten times the convergence criterion. The modal recursion is within the criterion by the
 * bound; the polynomial CTF, used when it is published, adds its resynthesis error (≤ 1e-6 U per term) summed over
 * its memory, which the margin covers; roundoff of either route is below 1e-10.
 */
export const PERIODIC_CONVERGENCE_LIMIT = 10 * PERIODIC_CONVERGENCE_TOLERANCE;
/** Limit of the daily energy balance, relative to U × max(1 K, |mean T_sa − mean T_i|). */
export const ENERGY_BALANCE_LIMIT = 1e-6;

type DesignDayScenario = Extract<Scenario, { kind: "design-day" }>;

/** A sun-exposed outside surface for the climate layer, with the values resolved for it. */
export function solarBoundarySurface(id: string, p: SurfaceParameters): BoundarySurface {
  return {
    kind: "solar",
    id,
    azimuthDeg: p.azimuthDeg,
    tiltDeg: p.tiltDeg,
    absorptance: p.absorptance ?? 0,
    outsideCoefficientWPerM2K: p.outsideCoefficient,
    groundReflectance: p.groundReflectance,
    longwave: { kind: "given", correctionK: p.longwaveCorrectionK },
  };
}

/** The climate input of a design-day scenario for the given outside surfaces (2013 clear sky, handbook diffuse). */
export function designDayInput(
  scenario: DesignDayScenario,
  surfaces: readonly BoundarySurface[],
): DesignDayInput {
  return {
    site: scenario.site ?? { latitudeDeg: 0, longitudeDeg: 0, timeZoneH: 0 },
    month: scenario.month,
    day: scenario.day,
    timestepS: scenario.timestepS,
    outdoor: scenario.outdoor,
    sky: scenario.sky.kind === "none"
      ? { kind: "none" }
      : { ...scenario.sky, edition: "2013", skyDiffuseModel: "handbook" },
    surfaces,
    solarPositionMethod: "meeus",
  };
}

/** Expands a constant or 24-value hourly temperature to one value per step. */
export function temperatureSteps(profile: TemperatureProfile, timestepS: number): number[] {
  return profile.kind === "constant"
    ? new Array<number>(Math.round(86400 / timestepS)).fill(profile.valueC)
    : expandHourlyToSteps(profile.hourlyC, timestepS);
}

/** Computes a design day: boundary conditions, steady-periodic fluxes per surface, gains, peaks and cross-checks. */
export function computeDesignDay(scenario: DesignDayScenario, context: ScenarioContext): ScenarioOutcome {
  const timestepS = scenario.timestepS;
  const assumptions: Assumption[] = [];
  const warnings: SurfaceWarning[] = [];
  const parameters = new Map<string, SurfaceParameters>();
  for (const surface of scenario.surfaces) {
    const construction = context.constructions.get(surface.construction);
    if (construction === undefined) continue;
    parameters.set(
      surface.id,
      surfaceParameters(scenario.id, surface, construction, assumptions, warnings, "summer-design"),
    );
  }
  const boundarySurfaces: BoundarySurface[] = scenario.surfaces.map((surface) => {
    const p = parameters.get(surface.id)!;
    return surface.solAirC !== undefined
      ? { kind: "given-sol-air", id: surface.id, hourlyC: surface.solAirC }
      : solarBoundarySurface(surface.id, p);
  });
  const boundary = designDayBoundary(designDayInput(scenario, boundarySurfaces));
  const indoor = temperatureSteps(scenario.indoor, timestepS);
  const surfaces: Record<string, SurfaceResults> = {};
  const checks: CheckResult[] = [];
  let convergenceDays = 0;
  let convergenceChange = 0;
  for (const [index, surface] of scenario.surfaces.entries()) {
    const p = parameters.get(surface.id)!;
    const analysis = context.analysisAt(surface.construction, timestepS, p.responseOutsideResistance);
    const bound = boundary.surfaces[index]!;
    const solAir = bound.solAirC;
    const subject = `scenario:${scenario.id}/${surface.id}`;
    const { flux, recursion, checks: surfaceChecks } = designDayChecks(analysis, solAir, indoor, subject);
    convergenceDays = Math.max(convergenceDays, recursion.days);
    convergenceChange = Math.max(convergenceChange, recursion.peakChange);
    checks.push(...surfaceChecks);
    const heatGain = flux.insideWPerM2.map((q) => q * surface.areaM2);
    const peak = peakOf(heatGain);
    const insideResistance = context.constructions.get(surface.construction)?.insideResistance ?? NaN;
    surfaces[surface.id] = {
      construction: surface.construction,
      area: surface.areaM2,
      solAir,
      insideFlux: flux.insideWPerM2,
      outsideFlux: flux.outsideWPerM2,
      heatGain,
      radiantGain: heatGain.map((g) => g * p.radiantFraction),
      convectiveGain: heatGain.map((g) => g * (1 - p.radiantFraction)),
      peak: { heatGain: peak.value, time_h: (peak.index * timestepS) / 3600 },
      incident: bound.kind === "solar" ? bound.irradiance.map((e) => e.totalWPerM2) : [],
      parameters: {
        absorptance: p.absorptance,
        emittance: p.emittance,
        outsideCoefficient: p.outsideCoefficient,
        longwaveCorrection: p.longwaveCorrectionK,
        radiantFraction: p.radiantFraction,
        groundReflectance: p.groundReflectance,
      },
      insideSurfaceTemperature: flux.insideWPerM2.map((q, k) => indoor[k]! + insideResistance * q),
    };
  }
  const cooling = scenario.radiantTimeSeries === undefined
    ? undefined
    : designDayCoolingLoad(surfaces, scenario.radiantTimeSeries, timestepS);
  const totalHeatGain = sumSeries(Object.values(surfaces).map((s) => s.heatGain), indoor.length);
  const totalPeak = peakOf(totalHeatGain);
  const outsideFilm = outsideFilmOf(scenario.surfaces, parameters);
  const results: ScenarioResults = {
    kind: "design-day",
    timestep_h: timestepS / 3600,
    outdoor: boundary.outdoorC,
    indoor,
    surfaces: cooling?.surfaces ?? surfaces,
    totalHeatGain,
    peak: { heatGain: totalPeak.value, time_h: (totalPeak.index * timestepS) / 3600 },
    totals: gainAndLoss(totalHeatGain, timestepS),
    convergence: { days: convergenceDays, peakChange: convergenceChange },
    ...(scenario.site === undefined ? {} : {
      sun: boundary.sunPosition.map((s) => ({ altitude_deg: s.altitudeDeg, azimuth_deg: s.azimuthDeg })),
    }),
    ...(outsideFilm === undefined ? {} : { outsideFilm }),
    notes: [
      ...(outsideFilm === undefined ? [] : [outsideFilmNote(outsideFilm)]),
      ...boundary.notes.filter((note) => !note.startsWith('Surface "')),
      ...scenario.surfaces.filter((surface) => surface.solAirC === undefined).map((surface) => {
        const correction = parameters.get(surface.id)?.longwaveCorrectionK ?? 0;
        return `Surface "${surface.id}": long-wave correction ${correction.toFixed(2)} K (${
          surface.longwaveCorrectionK === undefined
            ? "default rule ε·ΔR·cos(tilt)/h_o, 0 from vertical down"
            : "given in the input"
        }).`;
      }),
      ...scenario.surfaces.filter((surface) => surface.solAirC !== undefined).map((surface) =>
        `Surface "${surface.id}": sol-air temperatures given in the input; the solar model is not used for it.`
      ),
      "Inside surface temperature θ_si = θ_i + R_si·q_i at each step, with R_si of the surface's construction.",
      ...(cooling === undefined ? [] : coolingLoadNotes(timestepS)),
    ],
    ...(cooling === undefined ? {} : { coolingLoad: cooling.total }),
  };
  return { results, checks, assumptions, warnings };
}

/**
 * The steady-periodic day of one surface (closed-form periodic response factors) and its two checks: the
 * repeated-day recursion (polynomial CTF when published, else modal form) over every step of the day, and the
 * daily energy balance.
 */
export function designDayChecks(
  analysis: DynamicAnalysis,
  solAir: readonly number[],
  indoor: readonly number[],
  subject: string,
): { flux: SurfaceFlux; recursion: RepeatedDay; checks: CheckResult[] } {
  const root = analysis.airToAir;
  const flux = steadyPeriodicFlux(root.modes, solAir, indoor);
  const recursion = root.ctfAccepted
    ? ctfRepeatedDayFlux(
      root.ctfCandidate.ctf,
      root.uValue,
      solAir,
      indoor,
      PERIODIC_CONVERGENCE_TOLERANCE,
      undefined,
      root.uValue,
      root.modes,
    )
    : repeatedDayFlux(root.modes, solAir, indoor, PERIODIC_CONVERGENCE_TOLERANCE, undefined, root.uValue);
  const scale = Math.max(...flux.insideWPerM2.map(Math.abs), root.uValue);
  const difference = Math.max(...flux.insideWPerM2.map((q, k) => Math.abs(q - recursion.insideWPerM2[k]!))) /
    scale;
  const meanDifferenceK = meanOf(solAir) - meanOf(indoor);
  const balance = Math.abs(meanOf(flux.insideWPerM2) - root.uValue * meanDifferenceK) /
    (root.uValue * Math.max(1, Math.abs(meanDifferenceK)));
  const checks = [
    check(
      "periodic-convergence",
      subject,
      `${
        root.ctfAccepted ? "Polynomial CTF" : "Modal"
      } recursion repeated ${recursion.days} days (last day-to-day change ${
        recursion.dayChange.toExponential(2)
      }, bound of the remaining distance ${
        recursion.remainingEstimate.toExponential(2)
      }) versus periodic response factors: max over the day's steps |Δq| / max(peak |q|, U × 1 K)`,
      difference,
      PERIODIC_CONVERGENCE_LIMIT,
    ),
    check(
      "energy-balance",
      subject,
      "Daily mean inside flux versus U × (mean sol-air − mean indoor), relative",
      balance,
      ENERGY_BALANCE_LIMIT,
    ),
  ];
  return { flux, recursion, checks };
}

function check(id: string, subject: string, description: string, value: number, limit: number): CheckResult {
  return { id, subject, description, value, limit, pass: Math.abs(value) <= limit };
}
