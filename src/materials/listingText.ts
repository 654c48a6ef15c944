/**
 * The text form of `fluxnote materials`: two header lines (quantity, then SI unit) and one aligned row per
 * entry. Given a width (a terminal's), the name and source columns are cut with "…" to share the room the
 * other columns leave, each down to a floor; ids are never cut (they are what a layer's `material:` names).
 * Without a width (a pipe, a file) nothing is cut. The source column leaves out a leading "from memory", which
 * the source-state column already says.
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
  cell(row: MaterialListingRow): string;
}

const COLUMNS: readonly Column[] = [
  { header: "id", unit: "", align: "left", cell: (r) => r.id },
  { header: "name", unit: "", align: "left", cell: (r) => r.name },
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
  { header: "source", unit: "", align: "left", cell: (r) => sourceShown(r) },
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

/** The name's share of the room left by the uncut columns when name and source must be cut (no source). */
const NAME_SHARE = 0.4;

/**
 * Column widths that fit `width`: the uncut columns keep theirs, the name gets up to `NAME_SHARE` of the rest
 * (at least its floor) and the source what remains (at least its floor).
 */
function fittedWidths(natural: readonly number[], width: number | undefined): number[] {
  const widths = [...natural];
  const total = natural.reduce((a, b) => a + b, 0) + GAP * (natural.length - 1);
  if (width === undefined || total <= width) return widths;
  const name = COLUMNS.findIndex((c) => c.header === "name");
  const source = COLUMNS.findIndex((c) => c.header === "source");
  const room = width - (total - natural[name]! - natural[source]!);
  const nameWidth = Math.min(natural[name]!, Math.max(MIN_NAME, Math.floor(room * NAME_SHARE)));
  widths[name] = Math.max(nameWidth, room - natural[source]!);
  widths[source] = Math.min(natural[source]!, Math.max(MIN_SOURCE, room - widths[name]!));
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
