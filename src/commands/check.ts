import { type Diagnostic, type Severity, sortDiagnostics } from "../project/diagnostic.ts";
import { loadReaderLibraries, ReaderLibraryNeeded } from "../project/readerLibraries.ts";
import type { Acknowledgement } from "../project/signOff.ts";
import { type ComputeOutcome, computeProject } from "../results/buildResults.ts";
import { issueGate } from "../results/issueGate.ts";
import { buildSummary } from "../results/summary.ts";
import { formatPosition } from "../project/position.ts";
import { formatFinding, reviewProject } from "../review/mod.ts";
import { atLeast, formatGroups, groupFindings, markFindings } from "../review/findingGroups.ts";
import type { CommandIo } from "./commandIo.ts";
import { type LoadedProject, loadProject } from "./loadProject.ts";

export interface CheckOptions {
  readonly project: string;
  readonly format: "text" | "json";
  readonly strict: boolean;
  /** Print findings of this severity and above (default `note`: everything); the exit code does not change. */
  readonly severity?: Severity;
}

/**
 * Validates a project without writing anything; returns the exit code. Errors print one by one; warnings and
 * notes grouped by rule. An acknowledged warning (front matter `acknowledged: [{ rule, subject }]`) is listed,
 * marked, and does not count for `--strict`.
 */
export async function runCheck(options: CheckOptions, io: CommandIo): Promise<number> {
  let checked: Checked;
  try {
    checked = await checkProject(options.project);
  } catch (cause) {
    // Plain YAML and Markdown are read without their libraries (src/project/readerLibraries.ts); a text that
    // needs one is checked again with both loaded, and the environment hidden from them first.
    if (!(cause instanceof ReaderLibraryNeeded)) throw cause;
    (await import("./quietDependencies.ts")).hideEnvironmentFromDependencies();
    await loadReaderLibraries();
    checked = await checkProject(options.project);
  }
  const { loaded, computed, diagnostics } = checked;
  const marked = markFindings(diagnostics, loaded.model?.info.acknowledged ?? []);
  const open = marked.filter((m) => m.acknowledged === undefined).map((m) => m.finding);
  const failedChecks = computed?.ok ? computed.computed.results.checks.filter((c) => !c.pass) : [];
  const errors = open.filter((d) => d.severity === "error").length + failedChecks.length;
  const warnings = open.filter((d) => d.severity === "warning").length;
  const notes = open.filter((d) => d.severity === "note").length;
  const acknowledged = marked.length - open.length;
  const min = options.severity ?? "note";
  const shown = marked.filter((m) => atLeast(m.finding.severity, min));
  const groups = groupFindings(shown.filter((m) => m.finding.severity !== "error"));
  if (options.format === "json") {
    const findings = shown.map(({ finding: d, subject, acknowledged: ack }) => ({
      severity: d.severity,
      rule: d.rule,
      at: formatPosition(d.at),
      message: d.message,
      value: d.value ?? null,
      expected: d.expected ?? null,
      source: d.source ?? null,
      hint: d.hint ?? null,
      subject,
      acknowledged: ackJson(ack),
    }));
    const grouped = groupFindings(shown).map((g) => ({
      severity: g.severity,
      rule: g.rule,
      count: g.count,
      message: g.message,
      subjects: g.subjects,
      at: g.at,
      acknowledged: ackJson(g.acknowledged),
    }));
    const counts = { error: errors, warning: warnings, note: notes, acknowledged };
    io.stdout(
      JSON.stringify(
        { schema: "fluxnote-check/1", findings, groups: grouped, counts, severity: min },
        null,
        2,
      ),
    );
  } else {
    for (const m of shown) if (m.finding.severity === "error") io.stderr(formatFinding(m.finding));
    for (const c of failedChecks) {
      io.stderr(
        `${c.subject}: error: computed check ${c.id} failed: ${c.value} > ${c.limit} (${c.description})`,
      );
    }
    for (const line of formatGroups(groups)) io.stderr(line);
    io.stdout(
      `${errors} error(s), ${warnings} warning(s), ${notes} note(s)${
        acknowledged === 0 ? "" : `, ${acknowledged} acknowledged`
      }${loaded.model === undefined ? "" : `, ${loaded.model.constructions.length} constructions read`}`,
    );
  }
  return errors > 0 || (options.strict && warnings > 0) ? 1 : 0;
}

interface Checked {
  readonly loaded: LoadedProject;
  readonly computed: ComputeOutcome | undefined;
  readonly diagnostics: readonly Diagnostic[];
}

/** Reads, computes (without the parts only the package shows) and reviews a project: every finding, sorted. */
async function checkProject(project: string): Promise<Checked> {
  const loaded = await loadProject(project);
  const computed = loaded.model === undefined
    ? undefined
    : computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts, undefined, { packageParts: false });
  const review = loaded.model === undefined
    ? []
    : reviewProject(loaded.model, computed?.ok ? computed.computed.results : undefined);
  const reviewed = [...loaded.diagnostics, ...review];
  const gate = loaded.model === undefined || !computed?.ok ? [] : issueGate(
    loaded.model,
    buildSummary(loaded.model, computed.computed.results, reviewed),
    reviewed,
  );
  const diagnostics = sortDiagnostics([
    ...loaded.diagnostics,
    ...(computed === undefined || computed.ok ? [] : computed.diagnostics),
    ...review,
    ...gate,
  ]);
  return { loaded, computed, diagnostics };
}

function ackJson(ack: Acknowledgement | undefined): { reason: string; by: string; at: string } | null {
  return ack === undefined ? null : { reason: ack.reason, by: ack.by, at: formatPosition(ack.at) };
}
