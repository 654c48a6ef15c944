/** Design-day conditions the sensitivity study varies, the steps it uses and the threshold below which it drops an effect. */
import type { Scenario, ScenarioSurface, TemperatureProfile } from "../project/model.ts";
import { SUMMER_DESIGN_OUTSIDE_COEFFICIENT } from "../scenarios/surfaceParameters.ts";

type DesignDay = Extract<Scenario, { kind: "design-day" }>;

/** A design-day condition varied by the study. */
export type VariedCondition = "absorptance" | "outsideCoefficient" | "maxDryBulb" | "dailyRange" | "indoor";

/** The effect of one condition lowered and raised by its stated step, W on the peak total heat gain. */
export interface ConditionEffect {
  readonly condition: VariedCondition;
  /** The step as stated in the package, e.g. "±0.1" or "±2 K". */
  readonly step: string;
  readonly minus: number;
  readonly plus: number;
}

/**
 * Steps of the conditions (our stated choice, common practice, no source): absorptance ±0.1 (about the spread
 * between a clean and a weathered finish, clipped to 0…1), the outside film h_o ± the study's variation, the design
 * maximum dry bulb ±2 K, the daily range ±2 K and the indoor temperature ±1 K.
 */
export const ABSORPTANCE_STEP = 0.1;
export const DRY_BULB_STEP_K = 2;
export const DAILY_RANGE_STEP_K = 2;
export const INDOOR_STEP_K = 1;

/**
 * An effect is dropped from the lists when both its changes are below this fraction of the base value (0.5 %, our
 * stated threshold, common practice, no source); the number dropped is reported.
 */
export const EFFECT_THRESHOLD = 0.005;

/** True when an effect is at or above the threshold relative to |base|. */
export function isShown(effect: { readonly minus: number; readonly plus: number }, base: number): boolean {
  return Math.max(Math.abs(effect.minus), Math.abs(effect.plus)) >= EFFECT_THRESHOLD * Math.abs(base);
}

/** A design-day variant lowered (−1) or raised (+1) by one condition's step. */
type Variant = (scenario: DesignDay, sign: -1 | 1, variation: number) => DesignDay | undefined;

const onSolarSurfaces = (
  scenario: DesignDay,
  change: (s: ScenarioSurface) => ScenarioSurface,
): DesignDay | undefined => {
  if (!scenario.surfaces.some((s) => s.solAirC === undefined)) return undefined;
  return { ...scenario, surfaces: scenario.surfaces.map((s) => (s.solAirC === undefined ? change(s) : s)) };
};

const shifted = (profile: TemperatureProfile, deltaK: number): TemperatureProfile =>
  profile.kind === "constant"
    ? { kind: "constant", valueC: profile.valueC + deltaK }
    : { kind: "hourly", hourlyC: profile.hourlyC.map((t) => t + deltaK) };

/** The conditions, their stated steps and how each builds its variant (undefined: not applicable to the day). */
export function conditionVariants(
  variation: number,
): { condition: VariedCondition; step: string; variant: Variant }[] {
  const percent = Number((variation * 100).toPrecision(3));
  return [
    {
      condition: "absorptance",
      step: `±${ABSORPTANCE_STEP}`,
      variant: (s, sign) =>
        onSolarSurfaces(s, (surface) => ({
          ...surface,
          absorptance: Math.min(1, Math.max(0, (surface.absorptance ?? 0) + sign * ABSORPTANCE_STEP)),
        })),
    },
    {
      condition: "outsideCoefficient",
      step: `±${percent} %`,
      variant: (s, sign, v) =>
        onSolarSurfaces(s, (surface) => ({
          ...surface,
          outsideCoefficient: (surface.outsideCoefficient ?? SUMMER_DESIGN_OUTSIDE_COEFFICIENT) *
            (1 + sign * v),
        })),
    },
    {
      condition: "maxDryBulb",
      step: `±${DRY_BULB_STEP_K} K`,
      variant: (s, sign) => ({
        ...s,
        outdoor: s.outdoor.kind === "daily-range"
          ? { ...s.outdoor, maxDryBulbC: s.outdoor.maxDryBulbC + sign * DRY_BULB_STEP_K }
          : { kind: "hourly", hourlyC: s.outdoor.hourlyC.map((t) => t + sign * DRY_BULB_STEP_K) },
      }),
    },
    {
      condition: "dailyRange",
      step: `±${DAILY_RANGE_STEP_K} K`,
      variant: (s, sign) =>
        s.outdoor.kind !== "daily-range" ? undefined : {
          ...s,
          outdoor: {
            ...s.outdoor,
            dailyRangeK: Math.max(0, s.outdoor.dailyRangeK + sign * DAILY_RANGE_STEP_K),
          },
        },
    },
    {
      condition: "indoor",
      step: `±${INDOOR_STEP_K} K`,
      variant: (s, sign) => ({ ...s, indoor: shifted(s.indoor, sign * INDOOR_STEP_K) }),
    },
  ];
}

/**
 * The effects of the design-day conditions on the peak total heat gain, given a function that computes the peak of
 * a scenario variant with the base constructions.
 */
export function conditionEffects(
  scenario: DesignDay,
  variation: number,
  basePeak: number,
  peakOf: (variant: DesignDay) => number,
): ConditionEffect[] {
  const effects: ConditionEffect[] = [];
  for (const { condition, step, variant } of conditionVariants(variation)) {
    const down = variant(scenario, -1, variation);
    const up = variant(scenario, 1, variation);
    if (down === undefined || up === undefined) continue;
    effects.push({ condition, step, minus: peakOf(down) - basePeak, plus: peakOf(up) - basePeak });
  }
  return effects;
}
