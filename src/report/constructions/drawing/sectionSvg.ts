/**
 * Draws a construction section to scale as inline SVG with drafting hatches. Walls read across the page,
 * exterior face on the left; roofs and floors (heat flow upward or downward) are drawn as a vertical stack
 * (sectionStack.ts).
 */
import type { Construction } from "../../../project/model.ts";
import { type DisplayUnits, thicknessFigure, toDisplay, unitLabel } from "../../page/displayUnits.ts";
import { THIN_SPACE } from "../../page/format.ts";
import { html, type Trusted } from "../../page/html.ts";
import {
  battLine,
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
  TAG_SIZE,
  thicknessText,
} from "./sectionParts.ts";
import { patternDefs, patternFill, patternPrefix } from "./sectionPatterns.ts";
import { renderStackSvg } from "./sectionStack.ts";

const WIDTH = 640;
const SECTION_LEFT = 90;
const SECTION_RIGHT = 550;
const LAYER_TOP = 62;
const LAYER_BOTTOM = 190;
const GAP_WIDTH_PX = 10;
const TAG_Y = 26;
/** Below this width a layer is marked by a dot where its tag leader ends. */
const THIN_PX = 6;
const KEY_TOP = 312;

interface PlacedLayer extends DrawnLayer {
  readonly x: number;
  readonly width: number;
}

function placeLayers(layers: readonly DrawnLayer[]): { placed: PlacedLayer[]; pxPerMm: number } {
  const massiveMm = layers.reduce(
    (s, l) => s + (l.layer.kind === "massive" ? l.layer.thicknessM * 1000 : 0),
    0,
  );
  const gaps = layers.filter((l) => l.layer.kind === "resistive").length;
  const available = SECTION_RIGHT - SECTION_LEFT - gaps * GAP_WIDTH_PX;
  const pxPerMm = massiveMm > 0 ? available / massiveMm : 0;
  let x = SECTION_LEFT;
  const placed = layers.map((l): PlacedLayer => {
    const width = l.layer.kind === "massive" ? l.layer.thicknessM * 1000 * pxPerMm : GAP_WIDTH_PX;
    const p = { ...l, x, width };
    x += width;
    return p;
  });
  return { placed, pxPerMm };
}

function layerBody(l: PlacedLayer, prefix: string): Trusted {
  const air = l.kind === "air";
  const box = { x: l.x, y: LAYER_TOP, w: l.width, h: LAYER_BOTTOM - LAYER_TOP };
  return html`
    <rect class="layer layer-${l.kind}" x="${coord(l.x)}" y="${coord(LAYER_TOP)}" width="${coord(
      l.width,
    )}" height="${coord(LAYER_BOTTOM - LAYER_TOP)}"
      fill="${l.kind === "insulation"
        ? "#fff"
        : patternFill(prefix, l.kind)}" stroke="#111" stroke-width="${l.kind === "membrane"
        ? "1.6"
        : "0.8"}" ${air
        ? html`
          stroke-dasharray="4 3"
        `
        : html``} />${l.kind === "insulation" ? battLine(box, false) : html``}${studs(
          l,
          box,
          false,
          prefix,
        )}${air ? airLabel(l) : html``}
  `;
}

/** The word "air" set upright in a resistive layer, which is drawn blank. */
function airLabel(l: PlacedLayer): Trusted {
  const x = l.x + l.width / 2 + 3;
  const y = (LAYER_TOP + LAYER_BOTTOM) / 2;
  return html`
    <text class="air-label" x="${coord(x)}" y="${coord(y)}" transform="rotate(-90 ${coord(x)} ${coord(y)})"
      text-anchor="middle" font-size="8.5">air</text>
  `;
}

/** Tag above the layer with a leader down to it; a dot marks where a thin layer sits. */
function tagWithLeader(l: PlacedLayer, tagX: number): Trusted {
  const cx = l.x + l.width / 2;
  const thin = l.width < THIN_PX;
  return html`
    <path class="leader" d="M${coord(tagX)} ${coord(TAG_Y + TAG_SIZE / 2)} L${coord(cx)} ${coord(
      LAYER_TOP + 10,
    )}" fill="none" stroke="#111"
      stroke-width="0.6" />${thin
        ? html`
          <circle cx="${coord(cx)}" cy="${coord(LAYER_TOP + 10)}" r="1.8" fill="#111" />
        `
        : html``}${squareTag(l.number, tagX, TAG_Y)}
  `;
}

function chainDimension(l: PlacedLayer): Trusted {
  if (l.thickness === undefined) return html``;
  const x2 = l.x + l.width;
  return html`
    <path d="M${coord(l.x)} 196 V212 M${coord(x2)} 196 V212" stroke="#111" stroke-width="0.6" />
  `;
}

/** Thickness figures under the chain; thin layers get a leader label dropped below, spread apart. */
function chainFigures(layers: readonly PlacedLayer[], d: DisplayUnits): Trusted {
  const fig = (l: PlacedLayer) => thicknessFigure(d, l.thickness ?? 0);
  const fits = (l: PlacedLayer) => l.width >= fig(l).length * 6 + 6;
  const wide = layers.filter((l) => l.thickness !== undefined && fits(l));
  const thin = layers.filter((l) => l.thickness !== undefined && !fits(l));
  const xs = spread(thin.map((l) => l.x + l.width / 2), 52, 30, WIDTH - 30);
  return html`${
    wide.map((l) =>
      html`<text x="${coord(l.x + l.width / 2)}" y="208" text-anchor="middle" font-size="10">${fig(l)}</text>`
    )
  }${
    thin.map((l, i) => {
      const cx = l.x + l.width / 2;
      const lx = xs[i] ?? cx;
      return html`
        <g class="leader-label">
          <path d="M${coord(cx)} 206 L${coord(lx)} 218" fill="none" stroke="#111" stroke-width="0.5" />
          <text x="${coord(lx)}" y="228" text-anchor="middle" font-size="10">${String(
            l.number,
          )}: ${thicknessText(l, d)}</text>
        </g>
      `;
    })
  }`;
}

function overallDimension(layers: readonly PlacedLayer[], d: DisplayUnits): Trusted {
  const first = layers[0];
  const last = layers[layers.length - 1];
  if (first === undefined || last === undefined) return html``;
  const total = layers.reduce((s, l) => s + (l.thickness ?? 0), 0);
  const hasGaps = layers.some((l) => l.kind === "air" && l.thickness === undefined);
  const x1 = first.x;
  const x2 = last.x + last.width;
  const text = `${thicknessFigure(d, total)}${THIN_SPACE}${unitLabel(d, "thickness")} overall${
    hasGaps ? " (resistive layers not counted)" : ""
  }`;
  const tick = (x: number) =>
    html`
      <path d="M${coord(x - 4)} 248 L${coord(x + 4)} 240" stroke="#111" stroke-width="1" />
    `;
  return html`
    <path d="M${coord(x1)} 244 H${coord(x2)}" stroke="#111" stroke-width="0.8" />${tick(x1)}${tick(x2)}<text
      x="${coord((x1 + x2) / 2)}" y="260" text-anchor="middle" font-size="11">${text}</text>
  `;
}

/** Scale-bar lengths tried, longest first, in the display unit of thickness. */
const SCALE_BAR_LENGTHS: Readonly<Record<DisplayUnits["system"], readonly number[]>> = {
  SI: [1000, 500, 200, 100, 50, 20, 10, 5, 2, 1],
  IP: [48, 24, 12, 6, 4, 2, 1, 0.5, 0.25],
};

/** Scale bar and the to-scale note at (x, y). */
export function scaleBar(pxPerMm: number, hasGaps: boolean, d: DisplayUnits, x: number, y: number): Trusted {
  const note = hasGaps
    ? "Drawn to scale, except resistive layers (dashed): nominal size, NOT TO SCALE."
    : "Drawn to scale.";
  if (pxPerMm <= 0) {
    return html`<text x="12" y="${coord(y + 18)}" font-size="10">Resistive layers only: NOT TO SCALE.</text>`;
  }
  const pxPerUnit = pxPerMm / toDisplay(d, "thickness", 0.001);
  const candidates = SCALE_BAR_LENGTHS[d.system];
  const length = candidates.find((n) => n * pxPerUnit <= 120) ?? candidates[candidates.length - 1] ?? 1;
  const barPx = length * pxPerUnit;
  return html`
    <rect x="${coord(x)}" y="${coord(y)}" width="${coord(barPx)}" height="4" fill="#111" />
    <text x="${coord(x + barPx + 6)}" y="${coord(y + 6)}" font-size="10">${thicknessFigure(
      d,
      length,
    )}${THIN_SPACE}${unitLabel(d, "thickness")}</text>
    <text x="12" y="${coord(y + 22)}" font-size="10">${note}</text>
  `;
}

/** Face label set along a face, rotated to read upward. */
function faceLabel(text: string, x: number): Trusted {
  const y = (LAYER_TOP + LAYER_BOTTOM) / 2;
  return html`
    <text class="face-label" x="${coord(x)}" y="${coord(y)}" transform="rotate(-90 ${coord(x)} ${coord(y)})"
      text-anchor="middle" font-size="11" font-style="italic">${text}</text>
  `;
}

function renderWallSvg(construction: Construction, d: DisplayUnits): Trusted {
  const { placed, pxPerMm } = placeLayers(drawnLayers(construction, d));
  const prefix = patternPrefix(construction.id);
  const tagXs = spread(placed.map((l) => l.x + l.width / 2), TAG_SIZE + 5, 12, WIDTH - 12);
  const kinds = kindsUsed(placed);
  const height = KEY_TOP + hatchKeyRows(kinds, WIDTH) * KEY_ROW_PX;
  const label =
    `Section of construction ${construction.id}: exterior face on the left, interior face on the right`;
  return html`
    <svg xmlns="http://www.w3.org/2000/svg" class="section-drawing section-wall"
      viewBox="0 0 ${String(WIDTH)} ${String(height)}" width="${String(WIDTH)}" height="${String(
        height,
      )}" role="img"
      aria-label="${label}" font-family="${FONT}"
      fill="#111"><title>${label}</title>${patternDefs(prefix, kinds)}${placed.map((l) =>
        layerBody(l, prefix)
      )}${placed.map((l, i) => tagWithLeader(l, tagXs[i] ?? 0))}${faceLabel(
        "exterior face",
        SECTION_LEFT - 12,
      )}${faceLabel("interior face", SECTION_RIGHT + 20)}${placed.map(chainDimension)}${chainFigures(
        placed,
        d,
      )}${overallDimension(placed, d)}${scaleBar(
        pxPerMm,
        placed.some((l) => l.thickness === undefined),
        d,
        SECTION_LEFT,
        270,
      )}${hatchKey(kinds, KEY_TOP, WIDTH, prefix)}</svg>
  `;
}

/**
 * Renders the section of a construction as a self-contained SVG element, dimensioned in the display unit
 * of thickness. Its hatch patterns carry ids prefixed by the (encoded) construction id, unique per page.
 */
export function renderSectionSvg(construction: Construction, d: DisplayUnits): Trusted {
  return construction.heatFlow === "horizontal"
    ? renderWallSvg(construction, d)
    : renderStackSvg(construction, d, scaleBar);
}
