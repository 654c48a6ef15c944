/**
 * A heating scenario: steady design heat loss U·A·(θ_i − θ_e) per surface, inside surface temperature and the
 * ISO 13788 surface-condensation and mould checks at the one design condition. Pure.
 */
import type { SteadyState } from "../engine/steady.ts";
import type { Assumption, Construction, HeatingScenario } from "../project/model.ts";
import { formatPosition } from "../project/position.ts";
import type { HeatingResults, HeatingSurfaceResults } from "./heatingTypes.ts";
import {
  dewPoint,
  ISO13788_FORMULA_SOURCE,
  ISO13788_INSIDE_SURFACE_RESISTANCE,
  MOULD_SURFACE_RELATIVE_HUMIDITY,
  mouldCriterion,
  temperatureFactor,
  vapourPressure,
} from "./iso13788.ts";

/** A computed heating scenario and the assumptions it logs. */
export interface HeatingOutcome {
  readonly results: HeatingResults;
  readonly assumptions: readonly Assumption[];
}

/**
 * Inside surface temperature, °C, of a plane element in steady state: θ_si = θ_i − R_si·(θ_i − θ_e)/R_T, where
 * R_T = 1/U − R_si,U + R_si (U computed with R_si,U; equal to θ_i − R_si·U·(θ_i − θ_e) when R_si = R_si,U).
 */
export function steadyInsideSurfaceTemperature(
  indoorC: number,
  outdoorC: number,
  uValue: number,
  uInsideResistance: number,
  insideResistance: number,
): number {
  const total = 1 / uValue - uInsideResistance + insideResistance;
  return indoorC - (insideResistance * (indoorC - outdoorC)) / total;
}

/**
 * Computes a heating scenario from the steady state of its constructions (missing ones are skipped). The heat loss
 * uses U_c, the construction's U with the user's ΔU corrections (`correctedU`, as the U-limit of the same run); the
 * surface temperature uses the plane-element U (the corrections are local: fasteners, air gaps).
 */
export function computeHeating(
  scenario: HeatingScenario,
  constructions: ReadonlyMap<string, Construction>,
  steady: Readonly<Record<string, SteadyState>>,
  correctedU: ReadonlyMap<string, number> = new Map(),
): HeatingOutcome {
  const { indoorC, outdoorC, indoorRelativeHumidity: phi } = scenario;
  const at = formatPosition(scenario.at);
  const assumptions: Assumption[] = [
    {
      id: `iso13788:mould-criterion:${scenario.id}`,
      text:
        `Mould criterion of ${scenario.id}: surface relative humidity at most ${MOULD_SURFACE_RELATIVE_HUMIDITY}, ` +
        "giving θ_si,min and f_Rsi,min at the design condition",
      source: "ISO 13788:2012, clause 5, critical surface humidity (from memory)",
      at,
    },
    {
      id: `iso13788:saturation-pressure:${scenario.id}`,
      text:
        `Saturation vapour pressure and dew point of ${scenario.id} by the Magnus-type formula over water and ice`,
      source: ISO13788_FORMULA_SOURCE,
      at,
    },
  ];
  const rsi = scenario.moistureSurfaceResistance ?? ISO13788_INSIDE_SURFACE_RESISTANCE;
  if (scenario.moistureSurfaceResistance === undefined) {
    assumptions.push({
      id: `default:moisture-surface-resistance:${scenario.id}`,
      text:
        `Inside surface resistance for the surface temperatures of ${scenario.id}: R_si = ${rsi} m²·K/W ` +
        "(the heat loss keeps each construction's own U)",
      source: "ISO 13788:2012, clause 4, internal surface resistance for opaque elements (from memory)",
      at,
    });
  }
  const pressure = vapourPressure(indoorC, phi);
  const dew = dewPoint(indoorC, phi);
  const mould = mouldCriterion(indoorC, outdoorC, phi);
  const surfaces: Record<string, HeatingSurfaceResults> = {};
  let totalHeatLoss = 0;
  let totalUA = 0;
  for (const surface of scenario.surfaces) {
    const construction = constructions.get(surface.construction);
    const state = steady[surface.construction];
    if (construction === undefined || state === undefined) continue;
    const u = state.uValue;
    const uc = correctedU.get(surface.construction) ?? u;
    const heatLoss = uc * surface.areaM2 * (indoorC - outdoorC);
    const thetaSi = steadyInsideSurfaceTemperature(indoorC, outdoorC, u, construction.insideResistance, rsi);
    const fRsi = temperatureFactor(thetaSi, indoorC, outdoorC);
    totalHeatLoss += heatLoss;
    totalUA += uc * surface.areaM2;
    surfaces[surface.id] = {
      construction: surface.construction,
      area: surface.areaM2,
      U: u,
      correctedU: uc,
      heatLoss,
      moistureSurfaceResistance: rsi,
      insideSurfaceTemperature: thetaSi,
      fRsi,
      fRsiMin: mould.minimumTemperatureFactor,
      dewPoint: dew,
      surfaceCondensation: { pass: thetaSi >= dew, margin: thetaSi - dew },
      mould: { pass: fRsi >= mould.minimumTemperatureFactor, margin: fRsi - mould.minimumTemperatureFactor },
    };
  }
  return {
    assumptions,
    results: {
      kind: "heating",
      indoor: indoorC,
      outdoor: outdoorC,
      indoorRelativeHumidity: phi,
      indoorVapourPressure: pressure,
      indoorDewPoint: dew,
      mouldCriterion: {
        surfaceRelativeHumidity: MOULD_SURFACE_RELATIVE_HUMIDITY,
        minimumSaturationPressure: mould.minimumSaturationPressure,
        minimumSurfaceTemperature: mould.minimumSurfaceTemperature,
        fRsiMin: mould.minimumTemperatureFactor,
      },
      surfaces,
      totalHeatLoss,
      totalUA,
      notes: heatingNotes(rsi),
    },
  };
}

function heatingNotes(rsi: number): string[] {
  return [
    "Steady state: heat loss of each surface = U_c·A·(θ_i − θ_e), U_c = U of its construction plus the ΔU corrections given for it (ISO 6946 Annex F; U_c = U without corrections); one-dimensional, thermal bridges, ground and air leakage excluded.",
    "Surface temperatures use U without the ΔU corrections: the corrections stand for local effects (fasteners, air gaps), not for the plane element's surface temperature.",
    `Surface temperature θ_si = θ_i − R_si·(θ_i − θ_e)/R_T with R_si = ${rsi} m²·K/W and R_T the construction's total resistance with this R_si in place of its own; f_Rsi = (θ_si − θ_e)/(θ_i − θ_e).`,
    "Surface condensation: the check fails when θ_si is below the indoor dew point.",
    `Mould: the check fails when f_Rsi is below f_Rsi,min, the factor at which the surface relative humidity reaches ${MOULD_SURFACE_RELATIVE_HUMIDITY}.`,
    "A screening at one design condition: the monthly assessment of ISO 13788 (monthly mean outdoor temperature and indoor humidity, critical month) is not made here, nor interstitial condensation.",
  ];
}
