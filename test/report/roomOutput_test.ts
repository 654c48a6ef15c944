/**
 * The package shows each room's output where its block sits (issue 13): the demo's reading room, built in SI and
 * in IP, is read back from package.html and compared with its own results.json — the peaks as results.json holds
 * them (formatted to three significant figures), both radiant time series adding to 1 as printed, the heating
 * table adding to its subtotals and total as printed, IP figures converted by the exact unit definitions, the
 * room in the contents, the summary, the cautions and Appendix E.
 */
import assert from "node:assert/strict";
import { cp } from "node:fs/promises";
import { dirname, join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import type { RoomResults } from "../../src/scenarios/room/roomTypes.ts";
import { formatSig, MINUS, THIN_SPACE } from "../../src/report/page/format.ts";
import { demoPackage } from "./demoBuild.ts";
import { parseDocument } from "./dom.ts";

/** Watts in one International Table Btu per hour: 1055.05585262 J / 3600 s (NIST SP 811, Appendix B). */
const W_PER_BTU_H = 1055.05585262 / 3600;
/** Kelvin per degree Fahrenheit (difference), exactly 5/9 (NIST SP 811, Appendix B). */
const K_PER_DELTA_F = 5 / 9;

interface Built {
  readonly doc: Document;
  readonly room: RoomResults;
}

async function built(units: "SI" | "IP"): Promise<Built> {
  const path = await demoPackage(units);
  const results = JSON.parse(await Deno.readTextFile(join(dirname(path), "results.json")));
  return { doc: parseDocument(await Deno.readTextFile(path)), room: results.rooms["reading-room"] };
}

function output(doc: Document): Element {
  const el = doc.querySelector("#rm-reading-room");
  assert.ok(el !== null, "the reading room's output (#rm-reading-room) is in the package");
  return el;
}

function texts(root: ParentNode, q: string): string[] {
  return Array.from(root.querySelectorAll(`[data-q="${q}"]`)).map((e) => (e.textContent ?? "").trim());
}

function text(root: ParentNode, q: string): string {
  const all = texts(root, q);
  assert.equal(all.length, 1, `one [data-q="${q}"]`);
  return all[0]!;
}

/** A printed number back to a JS number (U+2212 minus). */
const num = (s: string) => Number(s.replace(MINUS, "-").replace(/[^\d.\-]/g, ""));

const sum = (xs: readonly number[]) => xs.reduce((a, x) => a + x, 0);

Deno.test("the demo package shows the reading room's peak loads and heat loss as results.json holds them", async () => {
  const { doc, room } = await built("SI");
  const out = output(doc);
  const w = (v: number) => `${formatSig(v, 3)}${THIN_SPACE}W`;
  const cl = room.coolingLoad;
  assert.equal(text(out, "verdict-hb"), w(cl.heatBalancePeak.load));
  assert.equal(text(out, "verdict-hb-time"), `${String(cl.heatBalancePeak.time_h).padStart(2, "0")}:00`);
  assert.equal(text(out, "verdict-rts"), w(cl.rtsMethodPeak.load));
  assert.equal(text(out, "verdict-difference"), `+${formatSig(cl.peakDifference * 100, 2)} %`);
  assert.equal(text(out, "verdict-latent"), w(Math.max(...cl.latent)));
  assert.equal(text(out, "verdict-heat-loss"), w(room.heating!.total));
  assert.equal(text(out, "verdict-h"), `${formatSig(room.heatLossCoefficient!, 3)}${THIN_SPACE}W/K`);
  assert.equal(text(out, "hb-peak"), formatSig(cl.heatBalancePeak.load, 3));
  assert.equal(text(out, "rts-peak"), formatSig(cl.rtsMethodPeak.load, 3));
  // The split by source at the peak adds to the heat balance peak (both printed to the watt).
  assert.equal(num(text(out, "by-source-total")), Math.round(cl.heatBalancePeak.load));
  // The summary on page 1 carries the same line.
  const summary = doc.querySelector("table.summary-rooms");
  assert.ok(summary !== null, "the summary has a rooms table");
  assert.match(text(summary, "summary-hb"), new RegExp(`^${w(cl.heatBalancePeak.load)} at 15:00$`));
  assert.ok(text(summary, "summary-heat-loss").startsWith(w(room.heating!.total)));
});

Deno.test("both radiant time series of the room add to 1 as printed, 24 shares each", async () => {
  const { doc, room } = await built("SI");
  const out = output(doc);
  for (const series of ["nonsolar", "solar"] as const) {
    const shown = texts(out, `rts-${series}`);
    assert.equal(shown.length, 24);
    // Each share is printed to three significant figures: the printed 24 add to 1 within half a unit of the last
    // printed place of each.
    const rounding = sum(shown.map((s) => 0.5 * 10 ** -(s.split(".")[1]?.length ?? 0)));
    assert.ok(
      Math.abs(sum(shown.map(num)) - 1) <= rounding,
      `${series}: ${sum(shown.map(num))} ± ${rounding}`,
    );
    assert.equal(text(out, `rts-sum-${series}`), "1.00");
    // Printed in two halves side by side (rows j and j + 12): the row order interleaves the hours.
    const byHour = [...shown.filter((_, k) => k % 2 === 0), ...shown.filter((_, k) => k % 2 === 1)];
    assert.deepEqual(
      byHour.map(num),
      room.coolingLoad.radiantTimeSeries[series].map((r) => Number(r.toPrecision(3))),
    );
  }
});

for (const units of ["SI", "IP"] as const) {
  Deno.test(`the room's heating table adds to its subtotals and its total as printed (${units})`, async () => {
    const { doc, room } = await built(units);
    const table = output(doc).querySelector("table.room-heat-loss");
    assert.ok(table !== null);
    const lines = texts(table, "phi").map(num);
    const subtotals = texts(table, "subtotal").map(num);
    const total = num(text(table, "heat-loss-total"));
    assert.equal(lines.length, room.heating!.lines.length);
    assert.equal(subtotals.length, new Set(room.heating!.lines.map((l) => l.group)).size);
    // Whole units, each rounded: a hand sum differs from the rounded total by at most half a unit per line.
    assert.ok(Math.abs(sum(lines) - total) <= 0.5 * lines.length, `${sum(lines)} against ${total}`);
    assert.ok(Math.abs(sum(subtotals) - total) <= 0.5 * subtotals.length);
    const factor = units === "SI" ? 1 : W_PER_BTU_H;
    assert.equal(total, Math.round(room.heating!.total / factor));
  });
}

Deno.test("an IP package prints the room's loads in Btu/h, H in Btu/(h·°F) and temperatures in °F", async () => {
  const { doc, room } = await built("IP");
  const out = output(doc);
  const cl = room.coolingLoad;
  const btu = (v: number) => `${formatSig(v / W_PER_BTU_H, 3)}${THIN_SPACE}Btu/h`;
  assert.equal(text(out, "verdict-hb"), btu(cl.heatBalancePeak.load));
  assert.equal(text(out, "verdict-rts"), btu(cl.rtsMethodPeak.load));
  assert.equal(text(out, "verdict-heat-loss"), btu(room.heating!.total));
  assert.equal(
    text(out, "verdict-h"),
    `${formatSig(room.heatLossCoefficient! / (W_PER_BTU_H / K_PER_DELTA_F), 3)}${THIN_SPACE}Btu/(h·°F)`,
  );
  // 400 l/s = 0.4 m³/s = 847.6 cfm (1 ft = 0.3048 m exactly); 24 °C = 75.2 °F.
  const conditions = out.querySelector(".room-conditions")?.textContent ?? "";
  assert.match(conditions, /848\u2009cfm/);
  assert.match(conditions, /75\.2\u2009°F/);
  // No SI unit is left in the tables (the method notes keep a formula's SI units, as every note does).
  for (const table of Array.from(out.querySelectorAll("table"))) {
    assert.doesNotMatch(
      table.textContent ?? "",
      /\d\u2009(W|W\/K|m²|°C|l\/s|W\/\(m²·K\))(?![\w/])/,
      table.className,
    );
  }
  // The method notes convert a value with an SI unit; the inside convection note gives each of its three.
  const convection = Array.from(out.querySelectorAll(".room-notes li")).map((li) => li.textContent ?? "")
    .find((t) => t.startsWith("Inside convection h_c"));
  assert.ok(convection !== undefined);
  assert.equal(convection.match(/Btu\/\(h·ft²·°F\)/g)?.length, 3, convection);
  assert.doesNotMatch(convection, /W\/\(m²/);
  const ground = num(text(out, "ground-u"));
  assert.equal(
    ground,
    Number(formatSig(room.ground.floor!.U / (W_PER_BTU_H / 0.3048 ** 2 / K_PER_DELTA_F), 3)),
  );
});

Deno.test("the contents list the room and its heat loss, and the cautions and Appendix E carry the room", async () => {
  const { doc, room } = await built("SI");
  const links = Array.from(doc.querySelectorAll("nav.contents a")).map((a) =>
    `${a.getAttribute("href")} ${(a.textContent ?? "").trim()}`
  );
  assert.ok(links.includes("#rm-reading-room Results of room reading-room"), links.join("\n"));
  assert.ok(links.includes("#rm-reading-room-heat-loss Design heat loss of reading-room"));
  assert.ok(doc.querySelector("#rm-reading-room-heat-loss") !== null);
  const caution = doc.querySelector("#s-8 li.caution-room")?.textContent ?? "";
  assert.match(caution, /a design load is not a system size/);
  assert.match(caution, /codes that apply where the building stands, and the review of a person qualified/);
  const hourly = doc.querySelector("#e-rm-reading-room");
  assert.ok(hourly !== null, "Appendix E has the room's part");
  const hb = texts(hourly, "hb").map(num);
  const rts = texts(hourly, "rts").map(num);
  const difference = texts(hourly, "difference").map(num);
  assert.equal(hb.length, 24);
  assert.deepEqual(rts, room.coolingLoad.rtsMethod.map((v) => Math.round(v)));
  assert.equal(hb[15], Math.round(room.coolingLoad.heatBalancePeak.load));
  for (let h = 0; h < 24; h++) assert.ok(Math.abs(rts[h]! - hb[h]! - difference[h]!) <= 1.5);
  assert.doesNotMatch(doc.body.textContent ?? "", /This version computes no room loads/);
});

Deno.test("a room on a 5 min design day without a heating scenario: peaks at their step, hours sampled, no heat loss", async () => {
  const root = await Deno.makeTempDir({ prefix: "fluxnote-room-output-" });
  try {
    const project = join(root, "demo");
    await cp(new URL("../../projects/demo/", import.meta.url).pathname, project, { recursive: true });
    const day = join(project, "40-scenarios.md");
    await Deno.writeTextFile(
      day,
      (await Deno.readTextFile(day)).replace("\ntimestep: 1 h\n", "\ntimestep: 5 min\n"),
    );
    const roomFile = join(project, "60-reading-room.md");
    const roomText = await Deno.readTextFile(roomFile);
    assert.ok(roomText.includes("\nheating: winter-design\n"));
    await Deno.writeTextFile(roomFile, roomText.replace("\nheating: winter-design\n", "\n"));
    const out = join(root, "out");
    assert.equal(await runBuild({ project, out }, { stdout: () => {}, stderr: () => {} }), 0);
    const room: RoomResults =
      JSON.parse(await Deno.readTextFile(join(out, "results.json"))).rooms["reading-room"];
    const doc = parseDocument(await Deno.readTextFile(join(out, "package.html")));
    assert.equal(room.timestep_h, 5 / 60);
    assert.equal(room.heating, undefined);
    const o = output(doc);
    assert.equal(
      text(o, "verdict-hb"),
      `${formatSig(room.coolingLoad.heatBalancePeak.load, 3)}${THIN_SPACE}W`,
    );
    assert.match(o.textContent ?? "", /No heating scenario named: no design heat loss/);
    assert.equal(o.querySelector("table.room-heat-loss"), null);
    const links = Array.from(doc.querySelectorAll("nav.contents a")).map((a) => a.getAttribute("href"));
    assert.ok(links.includes("#rm-reading-room"));
    assert.ok(!links.includes("#rm-reading-room-heat-loss"));
    // Appendix E prints the heat balance at the full hours: step 12·h of the 5 min series.
    const hb = texts(doc.querySelector("#e-rm-reading-room")!, "hb").map(num);
    assert.deepEqual(
      hb,
      Array.from({ length: 24 }, (_, h) => Math.round(room.coolingLoad.heatBalance[12 * h]!)),
    );
  } finally {
    await Deno.remove(root, { recursive: true });
  }
});
