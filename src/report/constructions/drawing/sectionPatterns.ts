/**
 * Hatch patterns of the section drawing, one per material family, drawn with general drafting conventions:
 * insulation as a batt zigzag, masonry as diagonal lines, concrete as aggregate (dots and small triangles),
 * plaster as a fine stipple, timber as grain lines, boards as fine close diagonals, membranes solid dark,
 * metal as a close cross-hatch, air blank. All in black on white so the drawing prints in greyscale.
 */
import { html, raw, type Trusted } from "../../page/html.ts";
import type { LayerKind } from "./layerKind.ts";

const INK = "#111";

/** The pattern body of each family (pattern tiles in user space, patternUnits="userSpaceOnUse"). */
const PATTERN_TILES: Readonly<Record<LayerKind, { size: number; body: string }>> = {
  insulation: {
    size: 10,
    body: `<path d="M0 0 L10 5 L0 10" fill="none" stroke="${INK}" stroke-width="0.7"/>`,
  },
  masonry: {
    size: 7,
    body: `<path d="M-1 8 L8 -1 M-1 1 L1 -1 M6 8 L8 6" stroke="${INK}" stroke-width="0.7"/>`,
  },
  concrete: {
    size: 24,
    body: `<circle cx="3" cy="4" r="0.9" fill="${INK}"/><circle cx="17" cy="15" r="0.7" fill="${INK}"/>` +
      `<circle cx="20" cy="3" r="0.6" fill="${INK}"/><circle cx="6" cy="19" r="0.8" fill="${INK}"/>` +
      `<circle cx="12" cy="10" r="0.5" fill="${INK}"/><circle cx="22" cy="22" r="0.6" fill="${INK}"/>` +
      `<path d="M9 3 L13 5.5 L8.5 7 Z M1 11 L4.5 10 L3.5 13.5 Z M14 18 L18.5 20 L14.5 22.5 Z ` +
      `M19 8 L22 11 L18 11.5 Z" fill="none" stroke="${INK}" stroke-width="0.6"/>`,
  },
  plaster: {
    size: 6,
    body:
      `<circle cx="1.5" cy="1.5" r="0.45" fill="${INK}"/><circle cx="4.5" cy="4.5" r="0.45" fill="${INK}"/>`,
  },
  timber: {
    size: 14,
    body: `<path d="M0 3 Q3.5 1.5 7 3 T14 3 M0 8 Q3.5 9.5 7 8 T14 8 M0 12 Q3.5 11 7 12 T14 12" ` +
      `fill="none" stroke="${INK}" stroke-width="0.5"/>`,
  },
  board: {
    size: 3,
    body: `<path d="M-1 -1 L4 4 M-1 2 L1 4 M2 -1 L4 1" stroke="${INK}" stroke-width="0.35"/>`,
  },
  membrane: { size: 4, body: `<rect width="4" height="4" fill="${INK}"/>` },
  metal: {
    size: 3,
    body: `<path d="M-1 4 L4 -1 M-1 -1 L4 4" stroke="${INK}" stroke-width="0.45"/>`,
  },
  air: { size: 4, body: "" },
};

/** A unique, id-safe prefix for a construction: letters and digits kept, anything else as _hex_. */
export function patternPrefix(constructionId: string): string {
  let out = "hatch-";
  for (const ch of constructionId) {
    out += /^[A-Za-z0-9]$/.test(ch) ? ch : `_${(ch.codePointAt(0) ?? 0).toString(16)}_`;
  }
  return out;
}

/** The id of a family's pattern for one construction. */
export function patternId(prefix: string, kind: LayerKind): string {
  return `${prefix}-${kind}`;
}

/** The fill attribute value of a family (air is plain white). */
export function patternFill(prefix: string, kind: LayerKind): string {
  return kind === "air" ? "#fff" : `url(#${patternId(prefix, kind)})`;
}

/** The <defs> with one pattern per family used; the tiles are fixed markup, ids are id-safe. */
export function patternDefs(prefix: string, kinds: readonly LayerKind[]): Trusted {
  const patterns = kinds.filter((k) => k !== "air").map((kind) => {
    const tile = PATTERN_TILES[kind];
    return html`
      <pattern id="${patternId(
        prefix,
        kind,
      )}" class="hatch-${kind}" patternUnits="userSpaceOnUse" width="${String(tile.size)}"
        height="${String(tile.size)}"><rect width="${String(tile.size)}" height="${String(
          tile.size,
        )}" fill="#fff"/>${trustedTile(tile.body)}</pattern>
    `;
  });
  return html`<defs>${patterns}</defs>`;
}

/** The tile bodies are constants of this module, never user text. */
function trustedTile(body: string): Trusted {
  return raw(body);
}
