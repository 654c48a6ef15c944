/** Shared pieces of the section drawings: placed layers, square tags, studs and the hatch key. */
import type { Construction, ResolvedLayer } from "../../../project/model.ts";
import { type DisplayUnits, thicknessFigure, toDisplay, unitLabel } from "../../page/displayUnits.ts";
import { THIN_SPACE } from "../../page/format.ts";
import { html, type Trusted } from "../../page/html.ts";
import { LAYER_KIND_LABEL, type LayerKind, layerKind, materialKind } from "./layerKind.ts";
import { patternFill } from "./sectionPatterns.ts";

export const FONT = "system-ui, -apple-system, 'Segoe UI', sans-serif";
export const TAG_SIZE = 15;
export const KEY_ROW_PX = 17;

/** Shortens text to `max` characters with an ellipsis. */
export function clip(text: string, max: number): string {
  return text.length <= max ? text : `${text.slice(0, max - 1)}\u2026`;
}

/**
 * The batt line of an insulation layer in the box (x, y, w, h): a zigzag spanning the layer's thickness and
 * running along its length. `across` says the thickness is vertical (a stack) rather than horizontal (a wall).
 */
export function battLine(box: { x: number; y: number; w: number; h: number }, across: boolean): Trusted {
  const thick = across ? box.h : box.w;
  const length = across ? box.w : box.h;
  const step = Math.min(11, Math.max(4, thick * 0.5));
  const n = Math.max(1, Math.round(length / step));
  const pts: string[] = [];
  for (let i = 0; i <= n; i++) {
    const along = (length * i) / n;
    const side = i % 2 === 0 ? 1 : thick - 1;
    pts.push(
      across
        ? `${coord(box.x + along)} ${coord(box.y + side)}`
        : `${coord(box.x + side)} ${coord(box.y + along)}`,
    );
  }
  return html`
    <path class="batt" d="M${pts.join(" L")}" fill="none" stroke="#111" stroke-width="0.7" />
  `;
}

/** A layer with its drawing family, thickness in the display unit and the family of its studs if framed. */
export interface DrawnLayer {
  readonly number: number;
  readonly kind: LayerKind;
  readonly layer: ResolvedLayer;
  /** Thickness in the display unit (mm or in); absent for a resistive layer. */
  readonly thickness?: number;
  readonly studKind?: LayerKind;
}

/** Prints an SVG coordinate: one decimal, ASCII minus, locale-independent. */
export function coord(value: number): string {
  const rounded = Math.round(value * 10) / 10;
  return String(rounded === 0 ? 0 : rounded);
}

/** The layers of a construction, outside first, with what the drawing needs. */
export function drawnLayers(construction: Construction, d: DisplayUnits): DrawnLayer[] {
  return construction.layers.map((layer, i): DrawnLayer => {
    const base = { number: i + 1, kind: layerKind(layer), layer };
    if (layer.kind !== "massive") return base;
    const thickness = toDisplay(d, "thickness", layer.thicknessM);
    const stud = layer.bridge?.bridge;
    return stud === undefined
      ? { ...base, thickness }
      : { ...base, thickness, studKind: materialKind(stud, layer.thicknessM) };
  });
}

/** The thickness text of a layer, e.g. "12.5 mm"; a resistive layer gives its role instead. */
export function thicknessText(l: DrawnLayer, d: DisplayUnits): string {
  return l.thickness === undefined
    ? "resistive, not to scale"
    : `${thicknessFigure(d, l.thickness)}${THIN_SPACE}${unitLabel(d, "thickness")}`;
}

/** A square layer tag centred on (x, y). */
export function squareTag(number: number, x: number, y: number): Trusted {
  const h = TAG_SIZE / 2;
  return html`
    <g class="layer-tag">
      <rect x="${coord(x - h)}" y="${coord(y - h)}" width="${String(TAG_SIZE)}" height="${String(
        TAG_SIZE,
      )}" fill="#fff" stroke="#111"
        stroke-width="0.9" />
      <text x="${coord(x)}" y="${coord(y + 3.8)}" text-anchor="middle" font-size="10.5">${String(
        number,
      )}</text>
    </g>
  `;
}

/** Spreads label positions so neighbours are at least `spacing` apart, inside [min, max]. */
export function spread(centres: readonly number[], spacing: number, min: number, max: number): number[] {
  const out = centres.map((c) => Math.max(c, min));
  for (let i = 1; i < out.length; i++) out[i] = Math.max(out[i] ?? 0, (out[i - 1] ?? 0) + spacing);
  for (let i = out.length - 1; i >= 0; i--) {
    const limit = i === out.length - 1 ? max : (out[i + 1] ?? max) - spacing;
    out[i] = Math.min(out[i] ?? 0, limit);
  }
  return out;
}

/**
 * The studs (or joists) of a framed layer in the box (x, y, w, h), cut in section: bands of the stud family's
 * hatch with a sawn-section cross, their share of the box equal to the framing fraction. `across` says the
 * bands repeat along x (a vertical stack) rather than along y (a wall).
 */
export function studs(
  l: DrawnLayer,
  box: { x: number; y: number; w: number; h: number },
  across: boolean,
  prefix: string,
): Trusted {
  const fraction = l.layer.bridge?.fraction;
  if (fraction === undefined || l.studKind === undefined) return html``;
  const count = across ? 2 : 1;
  const period = (across ? box.w : box.h) / count;
  const size = Math.max(1, fraction * period);
  const parts: Trusted[] = [];
  for (let i = 0; i < count; i++) {
    const start = (across ? box.x : box.y) + period * (i + 0.5) - size / 2;
    const r = across ? { x: start, y: box.y, w: size, h: box.h } : { x: box.x, y: start, w: box.w, h: size };
    parts.push(
      html`
        <g class="stud">
          <rect x="${coord(r.x)}" y="${coord(r.y)}" width="${coord(r.w)}" height="${coord(
            r.h,
          )}" fill="${patternFill(prefix, l.studKind)}"
            stroke="#111" stroke-width="0.9" />
          <path
            d="M${coord(r.x)} ${coord(r.y)} L${coord(r.x + r.w)} ${coord(r.y + r.h)} M${coord(
              r.x + r.w,
            )} ${coord(r.y)} L${coord(r.x)} ${coord(r.y + r.h)}"
            stroke="#111" stroke-width="0.6" />
        </g>
      `,
    );
  }
  return html`${parts}`;
}

/** Width of one entry of the hatch key (swatch and family name), px. */
const KEY_ENTRY_PX = 150;

/** Rows the hatch key takes in a drawing `width` px wide. */
export function hatchKeyRows(kinds: readonly LayerKind[], width: number): number {
  const perRow = Math.max(1, Math.floor((width - 24) / KEY_ENTRY_PX));
  return Math.max(1, Math.ceil(kinds.length / perRow));
}

/**
 * The hatch key below a drawing: one swatch per material family drawn, laid out in rows. The layers
 * themselves are not listed again: the square tags point at the rows of the layer table.
 */
export function hatchKey(
  kinds: readonly LayerKind[],
  top: number,
  width: number,
  prefix: string,
): Trusted {
  const perRow = Math.max(1, Math.floor((width - 24) / KEY_ENTRY_PX));
  const entries = kinds.map((kind, i) => {
    const x = 12 + (i % perRow) * KEY_ENTRY_PX;
    const y = top + Math.floor(i / perRow) * KEY_ROW_PX;
    return html`
      <g class="hatch-key">
        <rect x="${coord(x)}" y="${coord(y - 6)}" width="26" height="12" fill="${patternFill(
          prefix,
          kind,
        )}" stroke="#111"
          stroke-width="0.7" ${kind === "air"
            ? html`
              stroke-dasharray="3 2"
            `
            : html``} />
        <text x="${coord(x + 32)}" y="${coord(y + 3.5)}" font-size="10.5"
          class="key-label">${LAYER_KIND_LABEL[kind]}</text>
      </g>
    `;
  });
  return html`${entries}`;
}

/** The families drawn, in a fixed order, studs included. */
export function kindsUsed(layers: readonly DrawnLayer[]): LayerKind[] {
  const used = new Set<LayerKind>();
  for (const l of layers) {
    used.add(l.kind);
    if (l.studKind !== undefined) used.add(l.studKind);
  }
  return (Object.keys(LAYER_KIND_LABEL) as LayerKind[]).filter((k) => used.has(k));
}
