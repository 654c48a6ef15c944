/** Colours and dash patterns of scenario plot series, and the swatches that name them in the captions. */
import { html, raw, type Trusted } from "../page/html.ts";

/** A series' look: stroke or fill colour and dash pattern (SVG `stroke-dasharray`, "none" for solid). */
export interface SeriesStyle {
  readonly colour: string;
  readonly dash: string;
}

// Alternating dark and light, so neighbouring series differ in greyscale as well as in hue.
const COLOURS = ["#1f4e79", "#e0a040", "#2e6b30", "#9cc3e6", "#5b2d86", "#c9b037", "#8c2d04", "#8fc46a"];
const DASHES = ["none", "6 3", "2 2", "8 3 2 3", "4 4"];

/** Outdoor air: solid black, drawn thicker than the surfaces. */
export const OUTDOOR_STYLE: SeriesStyle = { colour: "#111111", dash: "none" };
/** Indoor air: grey, long dashes. */
export const INDOOR_STYLE: SeriesStyle = { colour: "#777777", dash: "10 4" };
/** Heat gain bars (above zero) in the monthly plot. */
export const GAIN_STYLE: SeriesStyle = { colour: "#b5470f", dash: "none" };
/** Heat loss bars (below zero) in the monthly plot: a lighter blue, so gain and loss differ in grey too. */
export const LOSS_STYLE: SeriesStyle = { colour: "#7fa7d6", dash: "none" };

/** The style of the i-th surface (input order): colour and dash cycle with different periods. */
export function surfaceStyle(index: number): SeriesStyle {
  return { colour: COLOURS[index % COLOURS.length]!, dash: DASHES[index % DASHES.length]! };
}

/** A small inline SVG line sample in a series' style; only constant colours and dashes reach the markup. */
export function lineSwatch(style: SeriesStyle, width = 2): Trusted {
  const dash = style.dash === "none" ? "" : ` stroke-dasharray="${style.dash}"`;
  return raw(
    `<svg xmlns="http://www.w3.org/2000/svg" class="swatch" width="28" height="10" viewBox="0 0 28 10" aria-hidden="true"><line x1="0" y1="5" x2="28" y2="5" stroke="${style.colour}" stroke-width="${width}"${dash}/></svg>`,
  );
}

/** A small inline SVG filled square in a series' colour. */
export function fillSwatch(style: SeriesStyle): Trusted {
  return raw(
    `<svg xmlns="http://www.w3.org/2000/svg" class="swatch swatch-fill" width="12" height="10" viewBox="0 0 12 10" aria-hidden="true"><rect x="1" y="0" width="10" height="10" fill="${style.colour}"/></svg>`,
  );
}

/** A caption legend entry: swatch then the (escaped) series name. */
export function legendEntry(swatch: Trusted, name: string): Trusted {
  return html`<span class="legend-entry">${swatch} ${name}</span>`;
}
