/**
 * Stamps the output derived from synthetic weather: every table (in its caption), every plot (a text element inside
 * the SVG, so the mark survives printing and copying the figure), and every box (peak summary, caution) of a
 * scenario's output carry "SYNTHETIC WEATHER — illustration only". The stamp is applied to the finished markup, so a
 * table or plot added later is stamped too. Project text in the markup is escaped (no raw `<`), so the tags matched
 * here are the renderer's own.
 */
import type { SyntheticWeatherResults } from "../../results/types.ts";
import { SYNTHETIC_STAMP } from "../../results/syntheticWeather.ts";
import { html, raw, type Trusted } from "../page/html.ts";

/** Styled inline (the package's CSP allows inline style), so packages without synthetic weather keep their CSS. */
const STAMP_STYLE = "color:#b00000;font-weight:bold";
const TEXT_STAMP = `<span class="synthetic-stamp" style="${STAMP_STYLE}">${SYNTHETIC_STAMP}</span>`;
/** The boxes of a scenario's output that carry a stamp line. */
const BOX = /<div class="(?:peak-summary|caution-box)"[^>]*>/g;
/** A table with its caption opening tag, when it has one. */
const TABLE = /(<table\b[^>]*>)(\s*<caption\b[^>]*>)?/g;
/** A plot: an inline SVG of class `plot`, up to its end tag (plots hold no nested SVG). */
const PLOT = /<svg\b[^>]*>[\s\S]*?<\/svg>/g;

/** The stamp as an SVG text element in the top right corner of a plot whose opening tag is `open`. */
function svgStamp(open: string): string {
  const box = /viewBox="([-\d.]+)[ ,]+([-\d.]+)[ ,]+([-\d.]+)[ ,]+([-\d.]+)"/.exec(open);
  const width = box === null ? Number(/\swidth="([\d.]+)"/.exec(open)?.[1] ?? 640) : Number(box[3]);
  const x0 = box === null ? 0 : Number(box[1]);
  const y0 = box === null ? 0 : Number(box[2]);
  return `<text class="synthetic-stamp" x="${x0 + width - 4}" y="${
    y0 + 12
  }" text-anchor="end" font-size="11" font-weight="bold" fill="#b00000">${SYNTHETIC_STAMP}</text>`;
}

/** Adds the synthetic-weather stamp to every table, plot and box of `markup`. */
export function stampSyntheticOutput(markup: Trusted): Trusted {
  const stamped = markup.markup
    .replace(BOX, (open) => `${open}<p class="synthetic-stamp-line">${TEXT_STAMP}</p>`)
    .replace(
      TABLE,
      (_all, table: string, caption: string | undefined) =>
        caption === undefined
          ? `${table}<caption>${TEXT_STAMP}</caption>`
          : `${table}${caption}${TEXT_STAMP} `,
    )
    .replace(PLOT, (svg) => {
      const open = svg.slice(0, svg.indexOf(">") + 1);
      if (!/\sclass="plot"/.test(open)) return svg;
      return `${svg.slice(0, -"</svg>".length)}${svgStamp(open)}</svg>`;
    });
  return raw(stamped);
}

/** The banner at the head of a synthetic scenario's output: the stamp, where the mark comes from and its note. */
export function syntheticBanner(id: string, mark: SyntheticWeatherResults): Trusted {
  const from = mark.from === "file"
    ? "its weather file's first comment says so"
    : "its scenario block says so (synthetic)";
  return html`
    <p
      class="synthetic-banner">${raw(
        TEXT_STAMP,
      )} Scenario ${id} runs on synthetic weather: ${from}${mark.note === ""
        ? ""
        : `: ${mark.note}`}. Every table and plot below is derived from it; do not use them as design results.</p>
  `;
}
