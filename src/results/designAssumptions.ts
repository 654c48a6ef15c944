/** Assumption-register entries for a bridged layer's equivalent homogeneous layer and for ΔU corrections. */
import { COMBINED_METHOD_SOURCE } from "../engine/bridgedLayer.ts";
import type { BridgedEvaluation } from "../project/bridgedLayers.ts";
import type { Assumption, Construction } from "../project/model.ts";
import { formatPosition } from "../project/position.ts";

const sig = (x: number, digits = 4) => String(Number(x.toPrecision(digits)));

/** Percent of an area fraction, to 0.1 %. */
export function percent(fraction: number): string {
  return String(Math.round(fraction * 1000) / 10);
}

/** States that the bridged layer enters every calculation as one homogeneous layer, and what that leaves out. */
export function bridgedAssumption(construction: Construction, evaluation: BridgedEvaluation): Assumption {
  const { bridge, equivalent, result, index } = evaluation;
  const base = bridge.base.materialId ?? bridge.base.name;
  const studs = bridge.bridge.materialId ?? bridge.bridge.name;
  return {
    id: `equivalent-layer:${construction.id}`,
    text: `Layer ${index + 1} of ${construction.id} (${base} ${percent(1 - bridge.fraction)} % / ${studs} ${
      percent(bridge.fraction)
    } %) is replaced by one homogeneous layer: λ_eq = ${
      sig(equivalent.conductivity)
    } W/(m·K), chosen so that the element's R equals R_T = ${
      sig(result.R)
    } m²·K/W of the combined method, and ρc = Σ f·ρ·c = ${
      sig(equivalent.density * equivalent.specificHeat)
    } J/(m³·K) (area-weighted). Consequence: the dynamic response treats the stud zone as one homogeneous layer; lateral heat flow and 2-D effects are not modelled.`,
    source: COMBINED_METHOD_SOURCE,
    at: formatPosition(bridge.at),
  };
}

/** States that the user's ΔU corrections are added to U only, not to the dynamic response. */
export function correctionAssumption(
  construction: Construction,
  corrections: {
    readonly deltaU: number;
    readonly layers: readonly { readonly source: string; readonly at: string }[];
  },
  uValue: number,
): Assumption {
  return {
    id: `correction:${construction.id}`,
    text: `ΔU = ${
      sig(corrections.deltaU)
    } W/(m²·K) from the corrections given for ${construction.id} is added to U (U_c = ${
      sig(uValue + corrections.deltaU)
    } W/(m²·K)); it does not enter the dynamic response (response factors, CTF, ISO 13786 figures, scenarios), which use U = ${
      sig(uValue)
    } W/(m²·K).`,
    source: corrections.layers.map((l) => l.source).join("; "),
    at: corrections.layers[0]?.at ?? formatPosition(construction.at),
  };
}
