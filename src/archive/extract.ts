import { parseHTML } from "linkedom";
import { decodeBase64 } from "./base64Decode.ts";
import { sha256Hex } from "./hash.ts";

/** What a package carries for re-running it: the exact input files, library entries and results. */
export interface PackageContents {
  /** The version the `<meta name="generator">` mark claims; `verify` trusts only the embedded results. */
  readonly generatorVersion: string;
  readonly files: ReadonlyMap<string, Uint8Array>;
  readonly library: readonly { readonly id: string; readonly canonical: string; readonly sha256: string }[];
  readonly resultsJsonText: string;
  /** Embedded items whose bytes no longer match the hash written beside them. */
  readonly tampered: readonly string[];
}

export type ExtractOutcome =
  | { readonly ok: true; readonly contents: PackageContents }
  | { readonly ok: false; readonly reason: string };

/** Reads the embedded inputs and results of a fluxnote package (no script is run; the HTML is only parsed). */
export function extractPackage(pageText: string): ExtractOutcome {
  const generator = /<meta name="generator" content="fluxnote ([^"]+)">/.exec(pageText);
  if (generator === null) return { ok: false, reason: "it has no fluxnote generator mark" };
  const { document } = parseHTML(pageText);
  const tampered: string[] = [];
  const files = new Map<string, Uint8Array>();
  for (const pre of document.querySelectorAll("pre.embedded-file")) {
    const path = pre.getAttribute("data-path") ?? "";
    const bytes = decodeBase64(pre.textContent ?? "");
    if (path === "" || bytes === undefined) {
      return { ok: false, reason: `an embedded input "${path}" cannot be decoded` };
    }
    if (sha256Hex(bytes) !== pre.getAttribute("data-sha256")) tampered.push(`input file ${path}`);
    files.set(path, bytes);
  }
  const library = [...document.querySelectorAll("pre.embedded-library")].map((pre) => {
    const canonical = pre.textContent ?? "";
    const entry = {
      id: pre.getAttribute("data-id") ?? "",
      canonical,
      sha256: pre.getAttribute("data-sha256") ?? "",
    };
    if (sha256Hex(canonical) !== entry.sha256) tampered.push(`library entry ${entry.id}`);
    return entry;
  });
  const resultsPre = document.querySelector('pre[data-embedded="results-json"]');
  if (resultsPre === null || !files.has("project.md")) {
    return { ok: false, reason: "it has no embedded inputs or results" };
  }
  const resultsJsonText = (resultsPre.textContent ?? "").replace(/^\n/, "");
  return {
    ok: true,
    contents: { generatorVersion: generator[1] ?? "", files, library, resultsJsonText, tampered },
  };
}
