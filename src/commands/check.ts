import { sortDiagnostics } from "../project/diagnostic.ts";
import { computeProject } from "../results/buildResults.ts";
import { issueGate } from "../results/issueGate.ts";
import { buildSummary } from "../results/summary.ts";
import { formatPosition } from "../project/position.ts";
import { formatFinding, reviewProject } from "../review/mod.ts";
import type { CommandIo } from "./commandIo.ts";
import { loadProject } from "./loadProject.ts";

export interface CheckOptions {
  readonly project: string;
  readonly format: "text" | "json";
  readonly strict: boolean;
}

/** Validates a project without writing anything; returns the exit code. */
export async function runCheck(options: CheckOptions, io: CommandIo): Promise<number> {
  const loaded = await loadProject(options.project);
  const computed = loaded.model === undefined
    ? undefined
    : computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
  const review = loaded.model === undefined
    ? []
    : reviewProject(loaded.model, computed?.ok ? computed.computed.results : undefined);
  const gate = loaded.model === undefined || !computed?.ok ? [] : issueGate(
    loaded.model,
    buildSummary(loaded.model, computed.computed.results, [...loaded.diagnostics, ...review]),
  );
  const diagnostics = sortDiagnostics([
    ...loaded.diagnostics,
    ...(computed === undefined || computed.ok ? [] : computed.diagnostics),
    ...review,
    ...gate,
  ]);
  const failedChecks = computed?.ok ? computed.computed.results.checks.filter((c) => !c.pass) : [];
  const errors = diagnostics.filter((d) => d.severity === "error").length + failedChecks.length;
  const warnings = diagnostics.filter((d) => d.severity === "warning").length;
  const notes = diagnostics.filter((d) => d.severity === "note").length;
  if (options.format === "json") {
    const findings = diagnostics.map((d) => ({
      severity: d.severity,
      rule: d.rule,
      at: formatPosition(d.at),
      message: d.message,
      value: d.value ?? null,
      expected: d.expected ?? null,
      source: d.source ?? null,
      hint: d.hint ?? null,
    }));
    io.stdout(JSON.stringify({ schema: "fluxnote-check/1", findings }, null, 2));
  } else {
    for (const d of diagnostics) io.stderr(formatFinding(d));
    for (const c of failedChecks) {
      io.stderr(
        `${c.subject}: error: computed check ${c.id} failed: ${c.value} > ${c.limit} (${c.description})`,
      );
    }
    io.stdout(
      `${errors} error(s), ${warnings} warning(s), ${notes} note(s)${
        loaded.model === undefined ? "" : `, ${loaded.model.constructions.length} constructions read`
      }`,
    );
  }
  return errors > 0 || (options.strict && warnings > 0) ? 1 : 0;
}
