/**
 * Draws a roof or floor section as a vertical stack to scale, the exterior face on top for both (the order
 * of the layer table): a roof as it sits, a floor upside down, its faces labelled with where they are in place.
 * Every layer gets a square tag with a leader and a label with its thickness, thin layers included.
 */
import type { Construction } from "../../../project/model.ts";
import type { DisplayUnits } from "../../page/displayUnits.ts";
import { THIN_SPACE } from "../../page/format.ts";
import { thicknessFigure, unitLabel } from "../../page/displayUnits.ts";
import { html, type Trusted } from "../../page/html.ts";
import {
  battLine,
  clip,
  coord,
  type DrawnLayer,
  drawnLayers,
  FONT,
  hatchKey,
  hatchKeyRows,
  KEY_ROW_PX,
  kindsUsed,
  spread,
  squareTag,
  studs,
  thicknessText,
} from "./sectionParts.ts";
import { patternDefs, patternFill, patternPrefix } from "./sectionPatterns.ts";

const WIDTH = 640;
const LEFT = 120;
const RIGHT = 330;
const TOP = 48;
const AVAILABLE_PX = 300;
const GAP_HEIGHT_PX = 10;
const LABEL_SPACING = 19;
const NAME_MAX = 32;

interface StackedLayer extends DrawnLayer {
  readonly y: number;
  readonly height: number;
}

type ScaleBar = (pxPerMm: number, hasGaps: boolean, d: DisplayUnits, x: number, y: number) => Trusted;

function stack(layers: readonly DrawnLayer[]): { stacked: StackedLayer[]; pxPerMm: number } {
  const massiveMm = layers.reduce(
    (s, l) => s + (l.layer.kind === "massive" ? l.layer.thicknessM * 1000 : 0),
    0,
  );
  const gaps = layers.filter((l) => l.layer.kind === "resistive").length;
  const pxPerMm = massiveMm > 0 ? (AVAILABLE_PX - gaps * GAP_HEIGHT_PX) / massiveMm : 0;
  let y = TOP;
  const stacked = layers.map((l): StackedLayer => {
    const height = l.layer.kind === "massive" ? l.layer.thicknessM * 1000 * pxPerMm : GAP_HEIGHT_PX;
    const s = { ...l, y, height };
    y += height;
    return s;
  });
  return { stacked, pxPerMm };
}

function layerBody(l: StackedLayer, prefix: string): Trusted {
  const box = { x: LEFT, y: l.y, w: RIGHT - LEFT, h: l.height };
  return html`
    <rect class="layer layer-${l.kind}" x="${String(LEFT)}" y="${coord(l.y)}" width="${String(
      RIGHT - LEFT,
    )}" height="${coord(l.height)}"
      fill="${l.kind === "insulation"
        ? "#fff"
        : patternFill(prefix, l.kind)}" stroke="#111" stroke-width="${l.kind === "membrane"
        ? "1.6"
        : "0.8"}" ${l.kind === "air"
        ? html`
          stroke-dasharray="4 3"
        `
        : html``} />${l.kind === "insulation" ? battLine(box, true) : html``}${studs(
          l,
          box,
          true,
          prefix,
        )}${l.kind === "air"
        ? html`<text class="air-label" x="${String((LEFT + RIGHT) / 2)}" y="${
          coord(l.y + l.height / 2 + 3)
        }" text-anchor="middle" font-size="8.5">air</text>`
        : html``}
  `;
}

/** Leader from the layer's right edge to its tag and label, with a dot on the layer. */
function leaderLabel(l: StackedLayer, labelY: number, d: DisplayUnits): Trusted {
  const cy = l.y + l.height / 2;
  return html`
    <g
      class="leader-label"><circle cx="${String(RIGHT - 6)}" cy="${coord(
        cy,
      )}" r="1.8" fill="#111"/><path class="leader" d="M${String(RIGHT - 6)} ${coord(cy)} H${String(
        RIGHT + 14,
      )} L${String(RIGHT + 30)} ${coord(labelY)} H${String(
        RIGHT + 36,
      )}" fill="none" stroke="#111" stroke-width="0.6"/>${squareTag(
        l.number,
        RIGHT + 45,
        labelY,
      )}<text x="${String(RIGHT + 58)}" y="${coord(labelY + 3.5)}" font-size="10.5">${thicknessText(
        l,
        d,
      )}  ${clip(l.layer.name, NAME_MAX)}</text></g>
  `;
}

function chain(stacked: readonly StackedLayer[], d: DisplayUnits): Trusted {
  const last = stacked[stacked.length - 1];
  const bottom = last === undefined ? TOP : last.y + last.height;
  const ticks = stacked.map((l) =>
    html`
      <path d="M${String(LEFT - 24)} ${coord(l.y)} H${String(
        LEFT - 4,
      )}" stroke="#111" stroke-width="0.6" />${l.thickness !== undefined && l.height >= 12
        ? html`<text x="${String(LEFT - 28)}" y="${
          coord(l.y + l.height / 2 + 3.5)
        }" text-anchor="end" font-size="10">${thicknessFigure(d, l.thickness)}</text>`
        : html``}
    `
  );
  return html`
    ${ticks}<path d="M${String(LEFT - 24)} ${coord(bottom)} H${String(LEFT - 4)} M${String(
      LEFT - 14,
    )} ${String(TOP)} V${coord(bottom)}" stroke="#111"
      stroke-width="0.6" />
  `;
}

function overall(stacked: readonly StackedLayer[], d: DisplayUnits): Trusted {
  const last = stacked[stacked.length - 1];
  if (last === undefined) return html``;
  const bottom = last.y + last.height;
  const total = stacked.reduce((s, l) => s + (l.thickness ?? 0), 0);
  const x = 40;
  const mid = (TOP + bottom) / 2;
  return html`
    <path
      d="M${String(x)} ${String(TOP)} V${coord(bottom)} M${String(x - 4)} ${String(TOP + 4)} L${String(
        x + 4,
      )} ${String(TOP - 4)} M${String(x - 4)} ${coord(bottom + 4)} L${String(x + 4)} ${coord(bottom - 4)}"
      stroke="#111" stroke-width="0.8" />
    <text x="${String(x - 6)}" y="${coord(mid)}" transform="rotate(-90 ${String(x - 6)} ${coord(
      mid,
    )})" text-anchor="middle"
      font-size="11">${thicknessFigure(d, total)}${THIN_SPACE}${unitLabel(d, "thickness")} overall</text>
  `;
}

function face(text: string, y: number, note: string): Trusted {
  return html`
    <text class="face-label" x="${String((LEFT + RIGHT) / 2)}" y="${coord(
      y,
    )}" text-anchor="middle" font-size="11"
      font-style="italic">${text}</text>
    <text class="face-note" x="${String((LEFT + RIGHT) / 2)}" y="${coord(
      y + 12,
    )}" text-anchor="middle" font-size="9">${note}</text>
  `;
}

/** Renders a roof or floor section as a vertical stack (see the module comment). */
export function renderStackSvg(construction: Construction, d: DisplayUnits, scaleBar: ScaleBar): Trusted {
  const roof = construction.heatFlow === "upward";
  // Outside on top for roofs and floors alike, in the order of the layer table; a floor is therefore drawn
  // upside down, which its face notes say.
  const { stacked, pxPerMm } = stack(drawnLayers(construction, d));
  const prefix = patternPrefix(construction.id);
  const last = stacked[stacked.length - 1];
  const bottom = last === undefined ? TOP : last.y + last.height;
  const labelYs = spread(stacked.map((l) => l.y + l.height / 2), LABEL_SPACING, 12, bottom + 40);
  const scaleY = Math.max(bottom + 14, labelYs[labelYs.length - 1] ?? bottom) + 30;
  const keyTop = scaleY + 44;
  const kinds = kindsUsed(stacked);
  const height = keyTop + hatchKeyRows(kinds, WIDTH) * KEY_ROW_PX;
  const [upper, lower] = ["exterior face", "interior face"];
  const [upperNote, lowerNote] = roof
    ? ["weather side", "room side"]
    : ["the underside in place, drawn on top", "floor surface, room side"];
  const what = roof ? "roof" : "floor";
  const label =
    `Section of ${what} construction ${construction.id}: ${upper} on top (${upperNote}), ${lower} below (${lowerNote})`;
  return html`
    <svg xmlns="http://www.w3.org/2000/svg" class="section-drawing section-stack"
      viewBox="0 0 ${String(WIDTH)} ${String(height)}" width="${String(WIDTH)}" height="${String(
        height,
      )}" role="img"
      aria-label="${label}" font-family="${FONT}"
      fill="#111"><title>${label}</title>${patternDefs(prefix, kinds)}${face(
        upper,
        TOP - 22,
        upperNote,
      )}${stacked.map((l) => layerBody(l, prefix))}${face(lower, bottom + 18, lowerNote)}${stacked.map((
        l,
        i,
      ) => leaderLabel(l, labelYs[i] ?? 0, d))}${chain(stacked, d)}${overall(stacked, d)}${scaleBar(
        pxPerMm,
        stacked.some((l) => l.thickness === undefined),
        d,
        LEFT,
        scaleY,
      )}${hatchKey(kinds, keyTop, WIDTH, prefix)}</svg>
  `;
}
