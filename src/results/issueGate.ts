/**
 * Issued means checked: a project with `status: issued` is refused while a blocking open item (from memory or
 * unconfirmed source, synthetic data, failed check) is not acknowledged in the front matter with a reason and a
 * name. An acknowledgement that matches no open item (or, for a finding, no warning or note) is a warning: a stale
 * entry would hide a later one. `findings` (the review findings) only sharpen that warning's message.
 */
import { type Diagnostic, error, warning } from "../project/diagnostic.ts";
import type { Model } from "../project/model.ts";
import { staleFindingMessage } from "../project/acknowledgedFindings.ts";
import { parsePosition } from "../project/position.ts";
import type { OpenItemKind, SummaryJson } from "./summaryTypes.ts";

/** Why each blocking kind stops issue (the item's full text is in the summary of results). */
const BLOCKING_REASON: Partial<Record<OpenItemKind, string>> = {
  "from-memory-source": "a source is from memory or not yet confirmed",
  "synthetic-data": "the data are synthetic, not measured or published",
  "failed-check": "a computed check failed",
};

/** The diagnostics of the issue gate: errors for unacknowledged blocking items once the status is issued. */
export function issueGate(
  model: Model,
  summary: SummaryJson,
  findings: readonly Diagnostic[] = [],
): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const ack of model.info.acknowledged ?? []) {
    const matches = summary.openItems.some((i) => i.id === ack.item || i.kind === ack.item);
    if (!matches) {
      out.push(warning(
        ack.at,
        "acknowledged-nothing",
        ack.finding === undefined
          ? `Acknowledged item "${ack.item}" matches no open item`
          : staleFindingMessage(ack, findings),
        ack.finding === undefined
          ? "copy an id from the open items of the summary (e.g. `synthetic-data:<scenario>`) or a kind; remove the entry if the item is closed"
          : "copy the rule and a subject from `fluxnote check` (a warning or a note); remove the entry if the finding is gone",
      ));
    }
  }
  if (model.info.status !== "issued") return out;
  for (const item of summary.openItems) {
    if (!item.blocking || item.acknowledged !== null) continue;
    out.push(error(
      parsePosition(item.at),
      "issue-blocked",
      `Cannot issue with the open item "${item.id}": ${BLOCKING_REASON[item.kind] ?? item.kind}`,
      `resolve it, or acknowledge it in project.md: \`acknowledged: [{ item: "${item.id}", reason: <why it may stand>, by: <name> }]\`, or keep \`status: for-review\``,
    ));
  }
  return out;
}
