/**
 * Reads the examples out of README.md: the fenced input blocks (`material`, `construction`, `scenario`, `room`), the
 * example front matter of project.md, and the `fluxnote <command>` lines of the usage block. Used by the tests
 * that build the README's examples and check its command lines against the command line itself.
 */

/** One fenced input block of the README, with the README line its fence opens on (1-based). */
export interface ReadmeBlock {
  readonly kind: "material" | "construction" | "scenario" | "room";
  readonly text: string;
  readonly line: number;
}

/** What the README's examples hold: the front matter (with its `---` lines) and the input blocks. */
export interface ReadmeExamples {
  readonly frontMatter: string | undefined;
  readonly blocks: readonly ReadmeBlock[];
}

const INPUT_KINDS = ["material", "construction", "scenario", "room"] as const;

interface Fence {
  readonly info: string;
  readonly body: string;
  readonly line: number;
}

/** Every fenced code block of a Markdown text, nested ones included (a ```` block that shows a ``` block). */
export function fencedBlocks(markdown: string): Fence[] {
  const lines = markdown.split("\n");
  const found: Fence[] = [];
  const scan = (from: number, to: number) => {
    for (let i = from; i < to; i++) {
      const open = /^(`{3,})\s*([^`]*)$/.exec(lines[i]!);
      if (open === null) continue;
      const fence = open[1]!;
      let end = i + 1;
      while (end < to && !new RegExp(`^${fence}\\s*$`).test(lines[end]!)) end++;
      found.push({ info: open[2]!.trim(), body: lines.slice(i + 1, end).join("\n"), line: i + 1 });
      scan(i + 1, end);
      i = end;
    }
  };
  scan(0, lines.length);
  return found;
}

/** The README's example front matter (a `markdown` block starting with `---`) and its input blocks. */
export function readmeExamples(markdown: string): ReadmeExamples {
  const fences = fencedBlocks(markdown);
  const frontMatter = fences.find((f) => f.info === "markdown" && f.body.startsWith("---\n"))?.body;
  const blocks = fences.flatMap((f): ReadmeBlock[] => {
    const kind = INPUT_KINDS.find((k) => k === f.info);
    return kind === undefined ? [] : [{ kind, text: f.body, line: f.line }];
  });
  return { frontMatter, blocks };
}

/** One `fluxnote <command> …` usage line: the command and the `--options` it shows, with a sample value each. */
export interface UsageLine {
  readonly line: string;
  readonly command: string;
  readonly options: readonly { readonly name: string; readonly sample: string | undefined }[];
}

/**
 * The usage lines of the README: in every plain or `sh` fenced block, the lines starting with `fluxnote`
 * (after an optional `$ `), each continued by the indented `[--option …]` lines below it. An option's sample
 * value is the first choice of `a|b`, or "1" for a placeholder (`<value>`, `N`); a flag has none.
 */
export function readmeUsageLines(markdown: string): UsageLine[] {
  const entries: string[] = [];
  for (const fence of fencedBlocks(markdown).filter((f) => f.info === "" || f.info === "sh")) {
    let open = false;
    for (const raw of fence.body.split("\n")) {
      const line = raw.replace(/^\$ /, "");
      if (line.startsWith("fluxnote ")) {
        entries.push(line);
        open = true;
      } else if (open && /^\s+\[?--/.test(line)) entries[entries.length - 1] += ` ${line.trim()}`;
      else open = false;
    }
  }
  return entries.map((line) => {
    const command = line.split(/\s+/)[1]!;
    const options = [...line.matchAll(/--([a-z][a-z-]*)(?:[ =](<[^>]*>|[^\s\]<>-][^\s\]]*))?/g)]
      .map((m) => ({ name: m[1]!, sample: sampleValue(m[2]) }));
    return { line, command, options };
  });
}

function sampleValue(shown: string | undefined): string | undefined {
  if (shown === undefined) return undefined;
  if (shown.startsWith("<") || /^[A-Z]$/.test(shown)) return "1";
  return shown.split("|")[0];
}
