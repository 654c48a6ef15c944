/** A small valid project whose every free-text place holds a given text, for the XSS corpus and fuzzing. */
import { designDayBlock, SOUTH_WALL } from "../scenarios/_scenarioBlocks.ts";

/** Places a text can go in a project. */
export interface HostileTexts {
  /** Markdown prose (raw, after a heading in every file). */
  readonly prose?: string;
  /** Front-matter text values: title, reference, revision, prepared-by, checked-by, approved-by, description. */
  readonly frontMatter?: string;
  /** Material name, source and class. */
  readonly material?: string;
  /** Construction name, inline layer name and source. */
  readonly construction?: string;
}

/** Quotes a text as a YAML double-quoted scalar (JSON strings are valid YAML 1.2 double-quoted scalars). */
export function yamlQuoted(text: string): string {
  return JSON.stringify(text);
}

/** Files (path → text) of a project that builds when every text is plain. */
export function hostileProjectFiles(t: HostileTexts): Record<string, string> {
  const fm = yamlQuoted(t.frontMatter ?? "Fixture project");
  const prose = t.prose === undefined ? "" : `\n${t.prose}\n`;
  const mat = yamlQuoted(t.material ?? "Test board");
  const con = yamlQuoted(t.construction ?? "Test wall");
  return {
    "project.md": [
      "---",
      `title: ${fm}`,
      `reference: ${fm}`,
      `revision: ${fm}`,
      "status: draft",
      `prepared-by: ${fm}`,
      `checked-by: ${fm}`,
      `approved-by: ${fm}`,
      "date: 2031-01-15",
      "units: SI",
      "revisions:",
      `  - { revision: A, date: 2031-01-15, description: ${fm} }`,
      "---",
      "",
      "# Fixture",
      prose,
    ].join("\n"),
    "materials.md": [
      "# Materials",
      prose,
      "```material",
      "id: board-x",
      `name: ${mat}`,
      "conductivity: 0.2 W/(m K)",
      "density: 800 kg/m^3",
      "specific-heat: 1000 J/(kg K)",
      `source: ${mat}`,
      `class: ${mat}`,
      "```",
      "",
    ].join("\n"),
    "walls.md": [
      "# Walls",
      prose,
      "```construction",
      "id: EW-1",
      `name: ${con}`,
      "layers:",
      "  - { material: concrete-2200, thickness: 150 mm }",
      "  - { material: board-x, thickness: 20 mm }",
      `  - { name: ${con}, thickness: 13 mm, conductivity: 0.21 W/(m K), density: 700 kg/m^3, specific-heat: 1000 J/(kg K), source: ${con} }`,
      "```",
      "",
    ].join("\n"),
    "zz-scenario.md": ["# Design day", prose, designDayBlock("july", [SOUTH_WALL])].join("\n"),
  };
}

/** Writes files (path → text) into a folder. */
export function writeProject(folder: string, files: Record<string, string>): void {
  Deno.mkdirSync(folder, { recursive: true });
  for (const [path, text] of Object.entries(files)) Deno.writeTextFileSync(`${folder}/${path}`, text);
}
