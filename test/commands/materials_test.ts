/**
 * `fluxnote materials`: the built-in library made visible. The expected values are the library entries
 * themselves (src/materials/), which the listing must reproduce unchanged; the confirmation states are checked
 * against the words the library uses to record them and against the summary's open-item rule.
 */
import assert from "node:assert/strict";
import { main } from "../../src/cli.ts";
import { MATERIAL_CLASSES } from "../../src/materials/classes.ts";
import { isResistiveLibraryMaterial, LIBRARY_MATERIALS } from "../../src/materials/library.ts";
import { listLibraryMaterials } from "../../src/materials/libraryListing.ts";
import { listingTextLines } from "../../src/materials/listingText.ts";
import { sourceConfirmation } from "../../src/materials/sourceConfirmation.ts";
import { UNCONFIRMED_SOURCE } from "../../src/results/openItems.ts";

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { stdout: (l) => (out += `${l}\n`), stderr: (l) => (err += `${l}\n`) });
  return { code, out, err };
}

/** The text rows of a listing (after the two header lines, before the count line), split at column gaps. */
function rows(out: string): string[][] {
  return out.trimEnd().split("\n").slice(2, -1).map((line) => line.split(/ {2,}/));
}

Deno.test("materials lists every built-in entry with its values, class and source state", async () => {
  const { code, out, err } = await run(["materials"]);
  assert.equal(code, 0, err);
  const [header, units] = out.split("\n");
  assert.match(header!, /^id +name +λ +ρ +c +R +class +source state +source$/);
  assert.match(units!, /W\/\(m·K\) +kg\/m³ +J\/\(kg·K\) +m²·K\/W/);
  const listed = rows(out);
  assert.deepEqual(listed.map((r) => r[0]), LIBRARY_MATERIALS.map((m) => m.id));
  for (const [i, m] of LIBRARY_MATERIALS.entries()) {
    const [, name, l, rho, c, r, cls, state, source] = listed[i]!;
    assert.equal(name, m.name);
    if (isResistiveLibraryMaterial(m)) {
      assert.deepEqual([l, rho, c, r], ["–", "–", "–", String(m.resistance)], m.id);
    } else {
      assert.deepEqual([l, rho, c, r], [m.conductivity, m.density, m.specificHeat, "–"].map(String), m.id);
    }
    assert.equal(cls, m.materialClass);
    assert.equal(state, sourceConfirmation(m.source));
    // Piped output is never cut; only a leading "from memory", which the state column says, is left out.
    assert.ok(m.source.replace(/\s+/g, " ").includes(source!), `${m.id}: ${source}`);
    assert.ok(source!.length >= m.source.length - "from memory ()".length, `${m.id}: ${source}`);
  }
  assert.match(
    out.trimEnd().split("\n").at(-1)!,
    new RegExp(`^${LIBRARY_MATERIALS.length} of \\d+ built-in`),
  );
});

Deno.test("materials --format json gives every entry with SI units in the keys and the full source", async () => {
  const { code, out } = await run(["materials", "--format", "json"]);
  assert.equal(code, 0);
  const listed = JSON.parse(out) as Record<string, unknown>[];
  assert.equal(listed.length, LIBRARY_MATERIALS.length);
  for (const [i, m] of LIBRARY_MATERIALS.entries()) {
    const massive = !isResistiveLibraryMaterial(m);
    assert.deepEqual(listed[i], {
      id: m.id,
      name: m.name,
      class: m.materialClass,
      kind: massive ? "massive" : "resistive",
      conductivity_W_per_mK: massive ? m.conductivity : null,
      density_kg_per_m3: massive ? m.density : null,
      specificHeat_J_per_kgK: massive ? m.specificHeat : null,
      resistance_m2K_per_W: massive ? null : m.resistance,
      source: m.source,
      sourceConfirmation: sourceConfirmation(m.source),
    });
  }
});

Deno.test("materials --class lists one class; an unknown class exits 2 naming every class", async () => {
  const wool = await run(["materials", "--class", "mineral-wool"]);
  assert.equal(wool.code, 0);
  assert.deepEqual(
    rows(wool.out).map((r) => r[0]),
    LIBRARY_MATERIALS.filter((m) => m.materialClass === "mineral-wool").map((m) => m.id),
  );
  assert.ok(rows(wool.out).length >= 2, "the library holds several mineral wools");
  const air = await run(["materials", "--class", "air-layer", "--format", "json"]);
  assert.ok((JSON.parse(air.out) as { kind: string }[]).every((r) => r.kind === "resistive"));
  const unknown = await run(["materials", "--class", "mineralwool"]);
  assert.equal(unknown.code, 2);
  assert.equal(unknown.out, "");
  assert.match(unknown.err, /unknown class "mineralwool"/);
  for (const c of MATERIAL_CLASSES) assert.ok(unknown.err.includes(c.id), c.id);
  assert.ok(!/\n\s+at /.test(unknown.err), "no stack trace");
});

Deno.test("materials --search matches the id or the name, case-insensitively", async () => {
  // "Glass-wool" is in the names of mineral-wool-12 and mineral-wool-25, not in any id.
  const byName = await run(["materials", "--search", "GLASS-WOOL"]);
  assert.equal(byName.code, 0);
  assert.deepEqual(rows(byName.out).map((r) => r[0]), ["mineral-wool-12", "mineral-wool-25"]);
  // "perforated" is in an id and a name; "osb" in an id and (as "OSB") a name: each entry once.
  assert.deepEqual(rows((await run(["materials", "--search", "osb"])).out).map((r) => r[0]), ["osb-650"]);
  const both = await run(["materials", "--search", "board", "--class", "polystyrene"]);
  assert.deepEqual(rows(both.out).map((r) => r[0]), ["eps-20", "xps-35"]);
});

Deno.test("materials with no match says so on one line and exits 1", async () => {
  const none = await run(["materials", "--search", "render-thin-coat"]);
  assert.equal(none.code, 1);
  assert.equal(none.out, "");
  assert.equal(
    none.err,
    'fluxnote materials: no built-in material with "render-thin-coat" in its id or name\n',
  );
  const json = await run(["materials", "--search", "unobtainium", "--class", "steel", "--format", "json"]);
  assert.equal(json.code, 1);
  assert.deepEqual(JSON.parse(json.out), []);
  assert.match(json.err, /of class "steel" and with "unobtainium"/);
});

Deno.test("materials is in the help, with its own --help, and refuses arguments and bad formats", async () => {
  assert.match((await run(["help"])).out, /^ {2}materials \[--class <class>\]/m);
  const help = await run(["materials", "--help"]);
  assert.equal(help.code, 0);
  assert.ok(help.out.startsWith("usage: fluxnote materials"));
  for (const args of [["materials", "extra"], ["materials", "--format", "csv"], ["materials", "--class"]]) {
    const result = await run(args);
    assert.equal(result.code, 2, args.join(" "));
    assert.ok(result.err.includes("usage: fluxnote materials"), args.join(" "));
  }
});

Deno.test("source state reads the library's words: from memory, unconfirmed, else confirmed", () => {
  // Wordings the library and project sources use (src/materials/library*.ts, README "Summary and issue").
  assert.equal(
    sourceConfirmation('from memory (believed ISO 10456:2007, Table 3, row "steel")'),
    "from memory",
  );
  assert.equal(sourceConfirmation("conductivity: Berge Table 14.15; density from memory"), "from memory");
  assert.equal(sourceConfirmation("manufacturer's data sheet, not yet confirmed"), "unconfirmed");
  assert.equal(sourceConfirmation("supplier value, to be confirmed"), "unconfirmed");
  assert.equal(sourceConfirmation('CIBSE Guide A, Table 3.36, row "metals — zinc"'), "confirmed");
  // The listing and the package's open items must agree on every library entry.
  for (const m of LIBRARY_MATERIALS) {
    assert.equal(sourceConfirmation(m.source) !== "confirmed", UNCONFIRMED_SOURCE.test(m.source), m.id);
  }
  const states = new Set(LIBRARY_MATERIALS.map((m) => sourceConfirmation(m.source)));
  assert.ok(states.has("confirmed") && states.has("from memory"), "the library holds both states today");
});

Deno.test("materials on a terminal cuts names and sources to its width, never an id", () => {
  const listing = listLibraryMaterials({});
  assert.ok(listing.ok);
  const width = 160;
  const lines = listingTextLines(listing.rows, LIBRARY_MATERIALS.length, width);
  for (const line of lines.slice(0, -1)) assert.ok([...line].length <= width, line);
  for (const [i, m] of LIBRARY_MATERIALS.entries()) assert.ok(lines[i + 2]!.startsWith(`${m.id} `), m.id);
  assert.ok(lines.some((l) => l.includes("…")));
  assert.match(lines.at(-1)!, /cut at "…" \(--format json gives them in full\)$/);
  // With room to spare the name stays whole and only the long sources are cut.
  const wool = listLibraryMaterials({ materialClass: "mineral-wool" });
  assert.ok(wool.ok);
  const roomy = listingTextLines(wool.rows, LIBRARY_MATERIALS.length, 170);
  for (const row of wool.rows) assert.ok(roomy.some((l) => l.includes(`  ${row.name}  `)), row.name);
  assert.ok(roomy.every((l) => [...l].length <= 170));
  const uncut = listingTextLines(listing.rows, LIBRARY_MATERIALS.length);
  assert.ok(!uncut.some((l) => l.includes("…")) && !uncut.at(-1)!.includes("cut"));
});

Deno.test("an unknown material's hint points to the materials command", async () => {
  const dir = await Deno.makeTempDir();
  try {
    await Deno.writeTextFile(`${dir}/project.md`, "---\ntitle: t\ndate: 2026-01-01\n---\n");
    await Deno.writeTextFile(
      `${dir}/walls.md`,
      "```construction\nid: W\nlayers:\n  - { material: render-thin-coat, thickness: 8 mm }\n```\n",
    );
    const result = await run(["check", dir]);
    assert.equal(result.code, 1);
    assert.match(result.err, /Unknown material "render-thin-coat"[^]*`fluxnote materials` lists them/);
  } finally {
    await Deno.remove(dir, { recursive: true });
  }
});
