/** Draws a construction section to scale as inline SVG: outside on the left, inside on the right. */
import type { Construction } from "../project/model.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "./displayUnits.ts";
import { formatTrim, THIN_SPACE } from "./format.ts";
import { html, type Trusted } from "./html.ts";
import { LAYER_KIND_FILL, LAYER_KIND_LABEL, type LayerKind, layerKind } from "./layerKind.ts";

const WIDTH = 640;
const HEIGHT = 330;
const SECTION_LEFT = 90;
const SECTION_RIGHT = 550;
const LAYER_TOP = 62;
const LAYER_BOTTOM = 190;
const GAP_WIDTH_PX = 10;
const CALLOUT_SPACING_PX = 20;
const FONT = "system-ui, -apple-system, 'Segoe UI', sans-serif";

interface PlacedLayer {
  readonly number: number;
  readonly kind: LayerKind;
  readonly x: number;
  readonly width: number;
  /** Thickness in the display unit (mm or in); absent for a resistive layer. */
  readonly thickness?: number;
}

/** Prints an SVG coordinate: one decimal, ASCII minus, locale-independent. */
function coord(value: number): string {
  const rounded = Math.round(value * 10) / 10;
  return String(rounded === 0 ? 0 : rounded);
}

function placeLayers(
  construction: Construction,
  d: DisplayUnits,
): { layers: PlacedLayer[]; pxPerMm: number } {
  const massiveMm = construction.layers.reduce(
    (s, l) => s + (l.kind === "massive" ? l.thicknessM * 1000 : 0),
    0,
  );
  const gaps = construction.layers.filter((l) => l.kind === "resistive").length;
  const available = SECTION_RIGHT - SECTION_LEFT - gaps * GAP_WIDTH_PX;
  const pxPerMm = massiveMm > 0 ? available / massiveMm : 0;
  let x = SECTION_LEFT;
  const layers = construction.layers.map((layer, i): PlacedLayer => {
    const width = layer.kind === "massive" ? layer.thicknessM * 1000 * pxPerMm : GAP_WIDTH_PX;
    const placed = layer.kind === "massive"
      ? {
        number: i + 1,
        kind: layerKind(layer),
        x,
        width,
        thickness: toDisplay(d, "thickness", layer.thicknessM),
      }
      : { number: i + 1, kind: layerKind(layer), x, width };
    x += width;
    return placed;
  });
  return { layers, pxPerMm };
}

/** Spreads callout positions so neighbours are at least CALLOUT_SPACING_PX apart, inside the drawing. */
function spreadCallouts(centres: readonly number[]): number[] {
  const out = [...centres];
  for (let i = 1; i < out.length; i++) out[i] = Math.max(out[i] ?? 0, (out[i - 1] ?? 0) + CALLOUT_SPACING_PX);
  const maxX = WIDTH - 12;
  for (let i = out.length - 1; i >= 0; i--) {
    const limit = i === out.length - 1 ? maxX : (out[i + 1] ?? maxX) - CALLOUT_SPACING_PX;
    out[i] = Math.min(out[i] ?? 0, limit);
  }
  return out;
}

function layerRect(layer: PlacedLayer): Trusted {
  const dashed = layer.kind === "gap"
    ? html`
      stroke-dasharray="4 3"
    `
    : html``;
  return html`
    <rect x="${coord(layer.x)}" y="${coord(LAYER_TOP)}" width="${coord(layer.width)}" height="${coord(
      LAYER_BOTTOM - LAYER_TOP,
    )}" fill="${LAYER_KIND_FILL[layer.kind]}"
      stroke="#333" stroke-width="0.8" ${dashed} />
  `;
}

function callout(layer: PlacedLayer, labelX: number): Trusted {
  const cx = layer.x + layer.width / 2;
  return html`
    <line x1="${coord(labelX)}" y1="36" x2="${coord(cx)}" y2="${coord(
      LAYER_TOP,
    )}" stroke="#666" stroke-width="0.6" />
    <circle cx="${coord(labelX)}" cy="26" r="9" fill="#fff" stroke="#333" stroke-width="0.8" />
    <text x="${coord(labelX)}" y="30" text-anchor="middle" font-size="11">${String(layer.number)}</text>
  `;
}

function chainDimension(layer: PlacedLayer): Trusted {
  if (layer.thickness === undefined) return html``;
  const label = formatTrim(layer.thickness, 4);
  const fits = layer.width >= label.length * 6.5 + 4;
  const x2 = layer.x + layer.width;
  return html`
    <line x1="${coord(layer.x)}" y1="198" x2="${coord(
      layer.x,
    )}" y2="214" stroke="#333" stroke-width="0.6" /><line
      x1="${coord(x2)}" y1="198" x2="${coord(x2)}" y2="214" stroke="#333" stroke-width="0.6" />${fits
        ? html`<text x="${
          coord(layer.x + layer.width / 2)
        }" y="210" text-anchor="middle" font-size="10">${label}</text>`
        : html``}
  `;
}

function overallDimension(layers: readonly PlacedLayer[], d: DisplayUnits): Trusted {
  const first = layers[0];
  const last = layers[layers.length - 1];
  if (first === undefined || last === undefined) return html``;
  const total = layers.reduce((s, l) => s + (l.thickness ?? 0), 0);
  const hasGaps = layers.some((l) => l.kind === "gap");
  const x1 = first.x;
  const x2 = last.x + last.width;
  const text = `${formatTrim(total, 4)}${THIN_SPACE}${unitLabel(d, "thickness")} overall${
    hasGaps ? " (resistive layers not counted)" : ""
  }`;
  const tick = (x: number) =>
    html`
      <line x1="${coord(x - 4)}" y1="236" x2="${coord(x + 4)}" y2="228" stroke="#333" stroke-width="1" />
    `;
  return html`
    <line x1="${coord(x1)}" y1="232" x2="${coord(x2)}" y2="232" stroke="#333"
      stroke-width="0.8" />${tick(x1)}${tick(x2)}<text x="${coord(
        (x1 + x2) / 2,
      )}" y="248" text-anchor="middle"
      font-size="11">${text}</text>
  `;
}

/** Scale-bar lengths tried, longest first, in the display unit of thickness. */
const SCALE_BAR_LENGTHS: Readonly<Record<DisplayUnits["system"], readonly number[]>> = {
  SI: [1000, 500, 200, 100, 50, 20, 10, 5, 2, 1],
  IP: [48, 24, 12, 6, 4, 2, 1, 0.5, 0.25],
};

function scaleBar(pxPerMm: number, hasGaps: boolean, d: DisplayUnits): Trusted {
  const note = hasGaps
    ? "Drawn to scale, except resistive layers (dashed): nominal width, NOT TO SCALE."
    : "Drawn to scale.";
  if (pxPerMm <= 0) {
    return html`<text x="12" y="288" font-size="10">Resistive layers only: NOT TO SCALE.</text>`;
  }
  const pxPerUnit = pxPerMm / toDisplay(d, "thickness", 0.001);
  const candidates = SCALE_BAR_LENGTHS[d.system];
  const length = candidates.find((n) => n * pxPerUnit <= 120) ?? candidates[candidates.length - 1] ?? 1;
  const barPx = length * pxPerUnit;
  const x = SECTION_LEFT;
  return html`
    <rect x="${coord(x)}" y="264" width="${coord(barPx)}" height="4" fill="#333" />
    <text x="${coord(x + barPx + 6)}" y="270" font-size="10">${formatTrim(length, 4)}${THIN_SPACE}${unitLabel(
      d,
      "thickness",
    )}</text>
    <text x="12" y="288" font-size="10">${note}</text>
  `;
}

function legend(kinds: readonly LayerKind[]): Trusted {
  let x = 12;
  let y = 298;
  const items = kinds.map((kind) => {
    const label = LAYER_KIND_LABEL[kind];
    const itemWidth = 16 + label.length * 5.4 + 14;
    if (x + itemWidth > WIDTH && x > 12) {
      x = 12;
      y += 16;
    }
    const item = html`
      <rect x="${coord(x)}" y="${coord(
        y,
      )}" width="12" height="10" fill="${LAYER_KIND_FILL[kind]}" stroke="#333"
        stroke-width="0.6" ${kind === "gap"
          ? html`
            stroke-dasharray="3 2"
          `
          : html``} />
      <text x="${coord(x + 16)}" y="${coord(y + 9)}" font-size="10">${label}</text>
    `;
    x += itemWidth;
    return item;
  });
  return html`${items}`;
}

/**
 * Renders the section of a construction as a self-contained SVG element (no ids, no external references),
 * dimensioned in the display unit of thickness.
 */
export function renderSectionSvg(construction: Construction, d: DisplayUnits): Trusted {
  const { layers, pxPerMm } = placeLayers(construction, d);
  const labelXs = spreadCallouts(layers.map((l) => l.x + l.width / 2));
  const kinds = (["masonry", "insulation", "board", "metal", "gap"] as const).filter((k) =>
    layers.some((l) => l.kind === k)
  );
  const label = `Section of construction ${construction.id}: outside on the left, inside on the right`;
  return html`
    <svg xmlns="http://www.w3.org/2000/svg" class="section-drawing" viewBox="0 0 ${String(WIDTH)} ${String(
      HEIGHT,
    )}"
      width="${String(WIDTH)}" height="${String(
        HEIGHT,
      )}" role="img" aria-label="${label}" font-family="${FONT}"
      fill="#111"><title>${label}</title>${layers.map(layerRect)}${layers.map((l, i) =>
        callout(l, labelXs[i] ?? 0)
      )}<text x="45" y="130" text-anchor="middle" font-size="12" font-weight="bold">OUTSIDE</text><text x="595" y="130" text-anchor="middle" font-size="12" font-weight="bold">INSIDE</text>${layers
        .map(chainDimension)}${overallDimension(layers, d)}${scaleBar(
          pxPerMm,
          layers.some((l) => l.kind === "gap"),
          d,
        )}${legend(kinds)}</svg>
  `;
}
