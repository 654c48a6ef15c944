/** A small invented project, its results and inputs, for rendering tests. All content is made up. */
import { engineEntry } from "./dynamicFixture.ts";
import { packageResultsCopy } from "../../src/results/packageCopy.ts";
import { wall, WALL_SOURCE } from "./wallFixture.ts";
import type { Diagnostic } from "../../src/project/diagnostic.ts";
import type { Construction, Model, ProjectInfo } from "../../src/project/model.ts";
export { wall } from "./wallFixture.ts";
import type { PackageInput } from "../../src/report/package.ts";
import type { CheckResult, ConstructionResults, ResultsJson } from "../../src/results/types.ts";

/** Text pieces that must never come out as live markup or script. */
export const HOSTILE = {
  script: "<script>alert('x')</script>",
  img: '<img src=x onerror="alert(1)">',
  attr: '" onmouseover="alert(2)" x="',
  entity: "&lt;script&gt;alert(3)&lt;/script&gt; &#60;script&#62;",
  style: '"; } body { background: url(https://evil.example/t.png) } </style><script>alert(4)</script>',
  svg: "<svg onload=alert(5)><a xlink:href='javascript:alert(6)'>x</a></svg>",
} as const;

const at = (file: string, line: number) => ({ file, line, col: 1 });

/** Options that vary the fixture: status, hostile strings, checks. */
export interface FixtureOptions {
  readonly status?: ProjectInfo["status"];
  readonly text?: string;
  readonly prose?: string;
  readonly checks?: readonly CheckResult[];
}

/** A passing check on the wall. */
export const PASSING_CHECK: CheckResult = {
  id: "sum-rule-Y",
  subject: "construction:EW-9",
  description: "sum of Y equals U",
  value: 2e-6,
  limit: 1e-3,
  pass: true,
};

/** A failing check on the wall. */
export const FAILING_CHECK: CheckResult = {
  id: "energy-balance",
  subject: "construction:EW-9",
  description: "energy balance over the day",
  value: 0.02,
  limit: 0.001,
  pass: false,
};

/** The wall's results.json entry, steady and dynamic parts computed by the real engine. */
function constructionResults(c: Construction): ConstructionResults {
  return engineEntry(c).results;
}

/** Bytes of the input files: a text file with BOM and CRLF, and a binary file with every byte value. */
export function inputBytes(text: string): { project: Uint8Array; walls: Uint8Array; binary: Uint8Array } {
  const enc = new TextEncoder();
  const project = enc.encode(`\uFEFF---\r\ntitle: ${text}\r\n---\r\nIntro.\r\n`);
  const walls = enc.encode(`# Walls\n\n${WALL_SOURCE}\n`);
  const binary = new Uint8Array(256).map((_, i) => i);
  return { project, walls, binary };
}

/** Builds a complete PackageInput; `text` is written into every free-text field. */
export function fixture(options: FixtureOptions = {}): PackageInput {
  const t = options.text ?? "";
  const c = wall(`Rendered block wall${t}`, `lime render${t}`);
  const info: ProjectInfo = {
    title: `Riverside depot${t}`,
    reference: `J-0042${t}`,
    revision: `B${t}`,
    status: options.status ?? "draft",
    preparedBy: `A. Preparer${t}`,
    checkedBy: `B. Checker${t}`,
    approvedBy: `C. Approver${t}`,
    date: "2031-03-14",
    units: "SI",
    revisions: [{ revision: "A", date: "2031-02-01", description: `First issue for comment${t}` }],
  };
  const model: Model = {
    info,
    documents: [
      {
        path: "project.md",
        segments: [{ kind: "prose", markdown: options.prose ?? "Intro.", at: at("project.md", 4) }],
      },
      {
        path: `walls${t}.md`,
        segments: [
          {
            kind: "prose",
            markdown: "# Walls\n\nSee [the brief](https://example.org/brief).",
            at: at("walls.md", 1),
          },
          {
            kind: "block",
            blockKind: "construction",
            id: "EW-9",
            source: WALL_SOURCE + t,
            at: at("walls.md", 3),
          },
          {
            kind: "block",
            blockKind: "material",
            id: "lime-render",
            source: "```material\nid: lime-render\n```",
            at: at("walls.md", 20),
          },
          {
            kind: "block",
            blockKind: "scenario",
            id: "july-day",
            source: "```scenario\nid: july-day\n```",
            at: at("walls.md", 30),
          },
          {
            kind: "block",
            blockKind: "material",
            source: "```material\nname: no id\n```",
            at: at("walls.md", 40),
          },
        ],
      },
    ],
    materials: [
      {
        id: "lime-render",
        name: `Lime render${t}`,
        origin: "project",
        conductivity: 0.8,
        density: 1600,
        specificHeat: 1000,
        source: `invented test value${t}`,
        at: at("walls.md", 20),
      },
      {
        id: "eps-board",
        name: "EPS board",
        origin: "project",
        conductivity: 0.035,
        density: 20,
        specificHeat: 1450,
        source: "invented test value",
        at: at("walls.md", 28),
      },
      {
        id: "clay-block",
        name: "Clay block",
        origin: "library",
        conductivity: 0.52,
        density: 1400,
        specificHeat: 900,
        source: "invented library value",
        at: at("library", 1),
      },
    ],
    constructions: [c],
    scenarios: [{
      id: "july-day",
      kind: "design-day",
      timestepS: 3600,
      timestepDefaulted: false,
      indoor: { kind: "constant", valueC: 24 },
      outdoor: { kind: "daily-range", maxDryBulbC: 31, dailyRangeK: 11 },
      month: 7,
      day: 21,
      sky: { kind: "none" },
      at: at("walls.md", 30),
      surfaces: [{
        id: "wall-south",
        construction: "EW-9",
        areaM2: 42,
        azimuthDeg: 180,
        tiltDeg: 90,
        at: at("walls.md", 35),
      }],
    }],
    assumptions: [
      {
        id: "default:inside-surface-resistance:EW-9",
        text: `R_si = 0.13 m^2 K/W${t}`,
        source: `ISO 6946:2017${t}`,
        at: "walls.md:3:1",
      },
    ],
  };
  const bytes = inputBytes(t);
  const files = [
    { path: "project.md", sha256: "a".repeat(64), bytes: bytes.project },
    { path: `walls${t}.md`, sha256: "b".repeat(64), bytes: bytes.walls },
    { path: "data/blob.bin", sha256: "c".repeat(64), bytes: bytes.binary },
  ];
  const results: ResultsJson = {
    schema: "fluxnote-results/1",
    tool: { name: "fluxnote", version: "0.1.0" },
    inputs: { files: files.map((f) => ({ path: f.path, sha256: f.sha256 })), sha256: "d".repeat(64) },
    constructions: { "EW-9": constructionResults(c) },
    scenarios: {},
    checks: options.checks ?? [PASSING_CHECK],
    // A build copies the reader's assumptions into results.json and adds the computed ones.
    assumptions: model.assumptions.map((a) => ({ ...a })),
    warnings: [],
  };
  const findings: Diagnostic[] = [
    {
      severity: "warning",
      at: at(`walls${t}.md`, 11),
      rule: "layer-source-missing",
      message: `Layer has no source${t}`,
      hint: `Add a source${t}`,
    },
  ];
  return {
    model,
    results,
    inputFiles: files,
    libraryEntries: [{ id: `clay-block${t}`, canonical: `{"id":"clay-block"${t}}`, sha256: "e".repeat(64) }],
    findings,
    toolVersion: "0.1.0",
    runtimeVersion: "Deno 2.9.6",
    resultsJsonText: JSON.stringify(results, null, 2) + t,
    embeddedResultsText: JSON.stringify(packageResultsCopy(results), null, 2) + t,
  };
}
