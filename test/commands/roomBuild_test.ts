/**
 * A project with a `room` block is accepted by `check` and `build`: the block is read into the model, shown in the
 * package like every other input block, and followed by the room's computed output (issue 13).
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { runCheck } from "../../src/commands/check.ts";
import { copyTree } from "../hardening/bounded.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

/** A room on the demo's own constructions and scenarios, with each boundary kind, a window and the extensions. */
const ROOM_BLOCK = `\`\`\`room
id: study-room
name: Reading room, first floor
design-day: july-design-day
heating: winter-design
air-temperature: 24 degC
volume: 420 m^3
surfaces:
  - { id: south-wall, construction: EW-2, area: 36 m^2, azimuth: 180 deg, tilt: 90 deg, boundary: outdoor, absorptance: 0.6 }
  - { id: roof, construction: RF-1, area: 120 m^2, tilt: 0 deg, boundary: outdoor, absorptance: 0.85 }
  - { id: floor, construction: EW-3, area: 120 m^2, tilt: 180 deg, boundary: ground, exposed-perimeter: 44 m }
  - { id: corridor-wall, construction: EW-4, area: 20 m^2, tilt: 90 deg, boundary: { adjacent: 28 degC, heating-temperature: 16 degC } }
  - { id: partition, construction: EW-1, area: 30 m^2, tilt: 90 deg, boundary: same-as-room }
windows:
  - { id: south-glazing, in: south-wall, area: 12 m^2, u-value: 1.4 W/(m^2 K), solar-factor: 0.40, frame-fraction: 0.2 }
gains:
  - { name: occupants, sensible: 3000 W, radiant-fraction: 0.6 }
ventilation: { outdoor-air: 400 l/s }
thermal-bridges:
  - { name: "wall–roof junction", psi: 0.06 W/(m K), length: 30 m, source: "invented for the test" }
point-bridges:
  - { name: bracket, chi: 0.1 W/K, count: 4 }
ground: { soil-conductivity: 2.0 W/(m K), temperature: 14 degC, annual-mean-outdoor: 10 degC }
\`\`\``;

function collect(): { io: { stdout(l: string): void; stderr(l: string): void }; text(): string } {
  let text = "";
  return { io: { stdout: (l) => (text += `${l}\n`), stderr: (l) => (text += `${l}\n`) }, text: () => text };
}

Deno.test("check and build accept the demo with a room block, and the package shows the block as written", async () => {
  const dir = await Deno.makeTempDir({ prefix: "fluxnote-room-" });
  try {
    const project = join(dir, "project");
    copyTree(DEMO, project);
    const winter = join(project, "50-winter.md");
    Deno.writeTextFileSync(winter, `${Deno.readTextFileSync(winter)}\n## Reading room\n\n${ROOM_BLOCK}\n`);
    const check = collect();
    assert.equal(await runCheck({ project, format: "text", strict: false }, check.io), 0, check.text());
    assert.match(check.text(), /^0 error\(s\)/m, check.text());
    const build = collect();
    const out = join(dir, "out");
    assert.equal(await runBuild({ project, out }, build.io), 0, build.text());
    const page = Deno.readTextFileSync(join(out, "package.html"));
    // The block's text, escaped as the package escapes all user text (only `"` occurs here).
    const escaped = ROOM_BLOCK.replaceAll("&", "&amp;").replaceAll('"', "&quot;").replaceAll("<", "&lt;");
    assert.ok(page.includes(escaped), "the room block's text is missing from package.html");
    assert.match(page, /room block &quot;study-room&quot;, 50-winter\.md:\d+:1/);
    // The room's computed output follows its block (issue 13): the verdict, not the old "computes no room loads".
    assert.doesNotMatch(page, /This version computes no room loads/);
    assert.match(page, /<div class="room-output" id="rm-study-room">/);
    assert.match(page, /Results of room study-room<\/h4>/);
    assert.match(page, /Peak sensible cooling load \(heat balance\): <strong data-q="verdict-hb">/);
  } finally {
    await Deno.remove(dir, { recursive: true });
  }
});
