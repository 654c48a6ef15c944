import assert from "node:assert/strict";
import { locate, sourceLines } from "../../src/diff/locate.ts";

const TEXT = [
  "# Walls", //                                          line 1
  "", //                                                 line 2
  "```construction", //                                  line 3
  "id: W-9", //                                          line 4
  "layers:", //                                          line 5
  "  - { name: lining, thickness: 13 mm }", //           line 6
  "  - material: brick-t", //                            line 7
  "    thickness: 102 mm", //                            line 8
  "name: Test wall", //                                  line 9
  "```", //                                              line 10
  "name: outside the block", //                          line 11
].join("\n");

const lines = sourceLines([{ path: "w.md", text: TEXT }]);
const field = (key: string) => ({ key, value: 1, unit: "" });

Deno.test("locate() prefers a key at the block's own indentation over one inside a layer", () => {
  assert.equal(locate(lines, { file: "w.md", line: 4, col: 1 }, field("name"), false), "w.md:9:1");
});

Deno.test("locate() finds a key inside a one-line list item", () => {
  const col = "  - { name: lining, thickness: 13 mm }".indexOf("thickness") + 1; // 21, 1-based
  assert.equal(locate(lines, { file: "w.md", line: 6, col: 5 }, field("thickness"), true), `w.md:6:${col}`);
});

Deno.test("locate() follows a list item written as an indented block", () => {
  assert.equal(locate(lines, { file: "w.md", line: 7, col: 5 }, field("thickness"), true), "w.md:8:5");
});

Deno.test("locate() falls back to the item's own place when the key is not written", () => {
  assert.equal(locate(lines, { file: "w.md", line: 6, col: 5 }, field("density"), true), "w.md:6:5");
  assert.equal(locate(lines, { file: "w.md", line: 4, col: 1 }, field("heat-flow"), false), "w.md:4:1");
  assert.equal(locate(lines, { file: "gone.md", line: 4, col: 1 }, field("name"), false), "gone.md:4:1");
  assert.equal(
    locate(lines, { file: "(built-in library)", line: 1, col: 1 }, field("name"), false),
    "(built-in library)",
  );
});
