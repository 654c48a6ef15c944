/**
 * A scenario's results.json notes as printed under its conditions: a note the conditions table already quotes
 * word for word is not printed again, and the per-surface long-wave lines that share one rule are set as one
 * line naming each surface with its value.
 */
import { html, type Trusted } from "../page/html.ts";
import type { DisplayUnits } from "../page/displayUnits.ts";
import { quotedNumbers } from "../page/quotedText.ts";

const LONGWAVE = /^Surface "(.+)": long-wave correction (.+) \((.+)\)\.$/;

/** The notes to print, in their order, with the long-wave lines of one rule joined where the first stood. */
export function printedNotes(notes: readonly string[], quoted: readonly string[]): string[] {
  const shown = notes.filter((n) => !quoted.includes(n));
  const byRule = new Map<string, string[]>();
  for (const n of shown) {
    const m = LONGWAVE.exec(n);
    if (m === null) continue;
    const [, surface, value, rule] = m;
    byRule.set(rule!, [...(byRule.get(rule!) ?? []), `${surface} ${value}`]);
  }
  const done = new Set<string>();
  return shown.flatMap((n) => {
    const m = LONGWAVE.exec(n);
    if (m === null) return [n];
    const rule = m[3]!;
    const parts = byRule.get(rule) ?? [];
    if (parts.length < 2) return [n];
    if (done.has(rule)) return [];
    done.add(rule);
    return [`Long-wave correction per surface (${rule}): ${parts.join(", ")}.`];
  });
}

/** Renders the notes list, or nothing when no note is left to print. */
export function renderScenarioNotes(
  notes: readonly string[],
  quoted: readonly string[],
  d: DisplayUnits,
): Trusted {
  const shown = printedNotes(notes, quoted);
  if (shown.length === 0) return html``;
  return html`
    <p class="muted">Conventions applied (results.json notes${d.system === "SI"
      ? ""
      : ", quoted as recorded, so any value in them is in SI units"}):</p>
    <ul class="scenario-notes">${shown.map((n) => html`<li>${quotedNumbers(n, d)}</li>`)}</ul>
  `;
}
