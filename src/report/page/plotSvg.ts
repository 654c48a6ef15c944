/**
 * Server-side Observable Plot: renders a plot into a linkedom document and returns inline SVG markup
 * that is stable (fixed size, renamed ids, rounded coordinates) and inert (no script, no external load).
 */
import * as Plot from "@observablehq/plot";
import { parseHTML } from "linkedom";
import { escapeHtml, raw, type Trusted } from "./html.ts";

/** Fixed plot width in CSS pixels, so the layout is the same on every render. */
export const PLOT_WIDTH = 640;

const SVG_NS = "http://www.w3.org/2000/svg";
const GEOMETRY_ATTRIBUTES = ["d", "transform", "x", "y", "x1", "x2", "y1", "y2", "width", "height", "points"];
const FORBIDDEN = /<(script|foreignobject|iframe|image|use)\b|\son[a-z]+\s*=|href\s*=\s*"(?!#)/i;

/** Plot options with the document, width and SVG-only output filled in by `renderPlotSvg`. */
export type PlotSpec = Omit<Plot.PlotOptions, "document" | "width" | "title" | "subtitle" | "caption">;

/** Keeps two decimals of every number in a geometry attribute (sub-pixel detail only). */
function roundGeometry(value: string): string {
  return value.replace(/(\d+\.\d\d)\d+/g, "$1");
}

function renameIds(svg: Element, prefix: string): void {
  const ids = new Map<string, string>();
  for (const el of Array.from(svg.querySelectorAll("[id]"))) {
    const id = el.getAttribute("id") ?? "";
    const renamed = `${prefix}-${ids.size + 1}`;
    ids.set(id, renamed);
    el.setAttribute("id", renamed);
  }
  if (ids.size === 0) return;
  for (const el of Array.from(svg.querySelectorAll("*"))) {
    for (const attr of Array.from(el.attributes)) {
      const value = attr.value.replace(/#([^)"\s]+)/g, (whole, id: string) => {
        const renamed = ids.get(id);
        return renamed === undefined ? whole : `#${renamed}`;
      });
      if (value !== attr.value) el.setAttribute(attr.name, value);
    }
  }
}

/**
 * The y-axis title set along the axis, rotated and centred beside the tick labels (Plot's default puts it at the
 * top left, above the axis), without an arrow; a plot that sets its own anchor keeps it.
 */
function alongTheAxis(spec: PlotSpec): PlotSpec {
  const y = spec.y;
  if (y === undefined || y === null || y.label === null || y.label === undefined) return spec;
  return { ...spec, y: { labelAnchor: "center", labelArrow: "none", ...y } };
}

/** The placeholder a plot mark draws for the i-th project name, replaced by the escaped name afterwards. */
export function namePlaceholder(i: number): string {
  return `@name-${String(i)}@`;
}

/**
 * Renders the plot as inline SVG; `idPrefix` names any generated id, `label` is the SVG's accessible
 * name. Labels and data must not contain project text: only constant labels and numbers. Project names
 * (`names`) reach the plot only as `namePlaceholder(i)` text and are put in, escaped and isolated, after
 * the markup is checked.
 */
export function renderPlotSvg(
  spec: PlotSpec,
  idPrefix: string,
  label: string,
  names: readonly string[] = [],
): Trusted {
  const { document } = parseHTML("<!doctype html><html><head></head><body></body></html>");
  const node = Plot.plot({
    ...alongTheAxis(spec),
    width: PLOT_WIDTH,
    document: document as unknown as Document,
  });
  const svg = node as unknown as Element;
  if (svg.tagName.toLowerCase() !== "svg") {
    throw new Error(`Cannot inline plot "${label}": Plot returned <${svg.tagName}> instead of <svg>`);
  }
  for (const style of Array.from(svg.querySelectorAll("style"))) style.remove();
  svg.removeAttribute("class");
  svg.setAttribute("xmlns", SVG_NS);
  svg.setAttribute("role", "img");
  svg.setAttribute("aria-label", label);
  svg.setAttribute("class", "plot");
  for (const el of [svg, ...Array.from(svg.querySelectorAll("*"))]) {
    for (const name of GEOMETRY_ATTRIBUTES) {
      const value = el.getAttribute(name);
      if (value !== null) el.setAttribute(name, roundGeometry(value));
    }
  }
  renameIds(svg, idPrefix);
  const markup = svg.outerHTML;
  if (FORBIDDEN.test(markup)) {
    throw new Error(`Cannot inline plot "${label}": it holds live or external content`);
  }
  const named = names.reduce(
    (text, name, i) => text.split(namePlaceholder(i)).join(`\u2068${escapeHtml(name)}\u2069`),
    markup,
  );
  return raw(named);
}
