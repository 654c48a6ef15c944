import { formatDiagnostic } from "../project/diagnostic.ts";
import { formatPosition } from "../project/position.ts";
import type { CommandIo } from "./build.ts";
import { loadProject } from "./loadProject.ts";

export interface CheckOptions {
  readonly project: string;
  readonly format: "text" | "json";
  readonly strict: boolean;
}

/** Validates a project without writing anything; returns the exit code. */
export async function runCheck(options: CheckOptions, io: CommandIo): Promise<number> {
  const loaded = await loadProject(options.project);
  const errors = loaded.diagnostics.filter((d) => d.severity === "error").length;
  const warnings = loaded.diagnostics.filter((d) => d.severity === "warning").length;
  if (options.format === "json") {
    const findings = loaded.diagnostics.map((d) => ({
      severity: d.severity,
      rule: d.rule,
      at: formatPosition(d.at),
      message: d.message,
      value: null,
      expected: null,
      source: null,
      hint: d.hint ?? null,
    }));
    io.stdout(JSON.stringify({ schema: "fluxnote-check/1", findings }, null, 2));
  } else {
    for (const d of loaded.diagnostics) io.stderr(formatDiagnostic(d));
    io.stdout(
      `${errors} error(s), ${warnings} warning(s)${
        loaded.model === undefined ? "" : `, ${loaded.model.constructions.length} constructions read`
      }`,
    );
  }
  return errors > 0 || (options.strict && warnings > 0) ? 1 : 0;
}
