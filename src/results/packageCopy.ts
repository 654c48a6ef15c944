/**
 * The copy of the results that a package embeds. It is results.json with every response-factor series of a
 * construction (air to air and surface to surface) cut to its leading terms. The remaining terms are the
 * construction's modal form expanded, RF_j = Σ c_n q_n^(j−1) for j ≥ 2 (`modal`, and `surfaceToSurface.modal`),
 * exactly as the engine formed them, so `expandPackageCopy` regains every term bit for bit. The standalone
 * results.json keeps every term; the copy keeps a package of heavy walls small (a 3 m-massive wall has about
 * a thousand terms per series).
 */
import { expandPulseModes } from "../engine/pulseModes.ts";

/** Terms of each response-factor series written out in the copy (one day at 1 h). */
export const LEADING_TERMS = 24;

/** What the copy says in place of the terms it leaves out. */
export const REST_FROM_MODAL = "terms from index 24 on: the modal form expanded, RF_j = Σ c_n q_n^(j−1)";

type Json = unknown;
type JsonObject = Record<string, Json>;

function isObject(value: Json): value is JsonObject {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function isNumbers(value: Json): value is number[] {
  return Array.isArray(value) && value.every((v) => typeof v === "number");
}

interface ModalSeriesJson {
  readonly rf0: number;
  readonly rf1: number;
  readonly coefficients: readonly number[];
}

function modalSeries(modal: JsonObject, key: "X" | "Y" | "Z"): ModalSeriesJson | undefined {
  const series = modal[key];
  if (!isObject(series)) return undefined;
  const { rf0, rf1, coefficients } = series;
  if (typeof rf0 !== "number" || typeof rf1 !== "number" || !isNumbers(coefficients)) return undefined;
  return { rf0, rf1, coefficients };
}

/** The series the modal form gives, `terms` long, by the engine's own expansion (bit-identical). */
function expandSeries(modal: JsonObject, key: "X" | "Y" | "Z", terms: number): number[] | undefined {
  const series = modalSeries(modal, key);
  const ratios = modal.ratios;
  if (series === undefined || !isNumbers(ratios)) return undefined;
  return expandPulseModes({ timestepS: 0, ratios, ...series }, terms);
}

/** True when every series of `factors` is the expansion of `modal` (so its tail may be left out). */
function expandsFromModal(factors: JsonObject, modal: Json): modal is JsonObject {
  if (!isObject(modal)) return false;
  return (["X", "Y", "Z"] as const).every((key) => {
    const series = factors[key];
    if (!isNumbers(series)) return false;
    const expanded = expandSeries(modal, key, series.length);
    return expanded !== undefined && expanded.every((v, i) => Object.is(v, series[i]));
  });
}

/** `{ X, Y, Z, truncationResidual }` → `{ terms, leading: { X, Y, Z }, rest, truncationResidual }`. */
function cutFactors(factors: Json, modal: Json): Json {
  if (!isObject(factors) || !expandsFromModal(factors, modal)) return factors;
  const { X, Y, Z, ...others } = factors as JsonObject & { X: number[]; Y: number[]; Z: number[] };
  if (X.length <= LEADING_TERMS) return factors;
  return {
    terms: X.length,
    leading: { X: X.slice(0, LEADING_TERMS), Y: Y.slice(0, LEADING_TERMS), Z: Z.slice(0, LEADING_TERMS) },
    rest: REST_FROM_MODAL,
    ...others,
  };
}

/** The inverse of `cutFactors`: the full series regained from the modal form. */
function restoreFactors(factors: Json, modal: Json): Json {
  if (!isObject(factors) || !isObject(modal) || typeof factors.terms !== "number") return factors;
  const { terms, leading: _leading, rest: _rest, ...others } = factors;
  const [X, Y, Z] = (["X", "Y", "Z"] as const).map((key) => expandSeries(modal, key, terms as number));
  if (X === undefined || Y === undefined || Z === undefined) return factors;
  return { X, Y, Z, ...others };
}

type FactorsEdit = (factors: Json, modal: Json) => Json;

/** Applies `edit` to both response-factor blocks of every construction, keeping every other member as it is. */
function editConstructions(results: Json, edit: FactorsEdit): Json {
  if (!isObject(results) || !isObject(results.constructions)) return results;
  const constructions: JsonObject = {};
  for (const [id, construction] of Object.entries(results.constructions)) {
    if (!isObject(construction)) {
      constructions[id] = construction;
      continue;
    }
    const edited: JsonObject = { ...construction };
    if ("responseFactors" in construction) {
      edited.responseFactors = edit(construction.responseFactors, construction.modal);
    }
    const surface = construction.surfaceToSurface;
    if (isObject(surface) && "responseFactors" in surface) {
      edited.surfaceToSurface = { ...surface, responseFactors: edit(surface.responseFactors, surface.modal) };
    }
    constructions[id] = edited;
  }
  return { ...results, constructions };
}

/**
 * The package's copy of `results`: long response-factor series cut to `LEADING_TERMS` where the modal form beside
 * them expands to exactly those series; anything else (and a series that is not its modal form) stays whole.
 * Applying it to a copy changes nothing.
 */
export function packageResultsCopy(results: Json): Json {
  return editConstructions(results, cutFactors);
}

/** Regains the full results from a package's copy: every left-out term from its modal form, bit for bit. */
export function expandPackageCopy(copy: Json): Json {
  return editConstructions(copy, restoreFactors);
}
