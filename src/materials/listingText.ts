/**
 * The text form of `fluxnote materials`: two header lines (quantity, then SI unit) and one aligned row per
 * entry. Given a width (a terminal's), the name and then the source column are cut with "…" until the lines
 * fit, down to a floor; ids are never cut (they are what a layer's `material:` names). Without a width (a
 * pipe, a file) nothing is cut. The source column leaves out a leading "from memory", which the source-state
 * column already says.
 */
import type { MaterialListingRow } from "./libraryListing.ts";

/** The narrowest the name and source columns are cut to, in characters (common practice, no source). */
const MIN_NAME = 20;
const MIN_SOURCE = 24;
const NOT_APPLICABLE = "–";

type Align = "left" | "right";
interface Column {
  readonly header: string;
  readonly unit: string;
  readonly align: Align;
  /** Cut when a width is given (name before source), never below this many characters. */
  readonly cutTo?: number;
  cell(row: MaterialListingRow): string;
}

const COLUMNS: readonly Column[] = [
  { header: "id", unit: "", align: "left", cell: (r) => r.id },
  { header: "name", unit: "", align: "left", cutTo: MIN_NAME, cell: (r) => r.name },
  {
    header: "λ",
    unit: "W/(m·K)",
    align: "right",
    cell: (r) => (r.kind === "massive" ? String(r.conductivity) : ""),
  },
  {
    header: "ρ",
    unit: "kg/m³",
    align: "right",
    cell: (r) => (r.kind === "massive" ? String(r.density) : ""),
  },
  {
    header: "c",
    unit: "J/(kg·K)",
    align: "right",
    cell: (r) => (r.kind === "massive" ? String(r.specificHeat) : ""),
  },
  {
    header: "R",
    unit: "m²·K/W",
    align: "right",
    cell: (r) => (r.kind === "resistive" ? String(r.resistance) : ""),
  },
  { header: "class", unit: "", align: "left", cell: (r) => r.materialClass },
  { header: "source state", unit: "", align: "left", cell: (r) => r.confirmation },
  { header: "source", unit: "", align: "left", cutTo: MIN_SOURCE, cell: (r) => sourceShown(r) },
];

/** The source without a leading "from memory" (and its colon or brackets) when the state column says so. */
function sourceShown(r: MaterialListingRow): string {
  if (r.confirmation !== "from memory") return r.source;
  const bracketed = /^from memory \((.*)\)$/s.exec(r.source);
  if (bracketed !== null && !/[()]/.test(bracketed[1]!)) return bracketed[1]!;
  return r.source.replace(/^from memory(: | \((?=.*\)))/s, (m) => (m.endsWith("(") ? "(" : ""));
}

/** Cuts a text to at most `max` characters (code points), ending in "…" when cut. */
export function cutToWidth(text: string, max: number): string {
  const chars = [...text.replace(/\s+/g, " ")];
  return chars.length <= max ? chars.join("") : `${chars.slice(0, max - 1).join("").trimEnd()}…`;
}

function pad(text: string, width: number, align: Align): string {
  const fill = " ".repeat(Math.max(0, width - [...text].length));
  return align === "right" ? fill + text : text + fill;
}

const GAP = 2;

/** Column widths that fit `width`: the name shrinks first, then the source. */
function fittedWidths(natural: readonly number[], width: number | undefined): number[] {
  const widths = [...natural];
  if (width === undefined) return widths;
  const excess = () => widths.reduce((a, b) => a + b, 0) + GAP * (widths.length - 1) - width;
  for (let i = 0; i < COLUMNS.length && excess() > 0; i++) {
    const floor = COLUMNS[i]!.cutTo;
    if (floor === undefined) continue;
    widths[i] = Math.max(Math.min(floor, natural[i]!), widths[i]! - excess());
  }
  return widths;
}

/**
 * The listing as lines: two header lines, one line per row and a closing count of `total` (the library's size).
 * `width` is the terminal's width in characters, or undefined for no cutting.
 */
export function listingTextLines(
  rows: readonly MaterialListingRow[],
  total: number,
  width?: number,
): string[] {
  const full = rows.map((row) => COLUMNS.map((c) => c.cell(row).replace(/\s+/g, " ") || NOT_APPLICABLE));
  const natural = COLUMNS.map((c, i) =>
    Math.max([...c.header].length, [...c.unit].length, ...full.map((r) => [...r[i]!].length))
  );
  const widths = fittedWidths(natural, width);
  const line = (texts: readonly string[]) =>
    texts.map((t, i) => pad(cutToWidth(t, widths[i]!), widths[i]!, COLUMNS[i]!.align)).join(" ".repeat(GAP))
      .trimEnd();
  const cut = widths.some((w, i) => w < natural[i]!);
  const count = `${rows.length} of ${total} built-in materials${
    cut ? '; names and sources cut at "…" (--format json gives them in full)' : ""
  }`;
  return [line(COLUMNS.map((c) => c.header)), line(COLUMNS.map((c) => c.unit)), ...full.map(line), count];
}
