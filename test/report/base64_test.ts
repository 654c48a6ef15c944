import assert from "node:assert/strict";
import fc from "fast-check";
import { encodeBase64 } from "../../src/archive/base64.ts";

Deno.test("encodeBase64() matches the RFC 4648 §10 test vectors", () => {
  // Source: RFC 4648 section 10, "Test Vectors" (from memory).
  const vectors: [string, string][] = [
    ["", ""],
    ["f", "Zg=="],
    ["fo", "Zm8="],
    ["foo", "Zm9v"],
    ["foob", "Zm9vYg=="],
    ["fooba", "Zm9vYmE="],
    ["foobar", "Zm9vYmFy"],
  ];
  for (const [text, expected] of vectors) {
    assert.equal(encodeBase64(new TextEncoder().encode(text), 0), expected);
  }
});

Deno.test("encodeBase64() agrees with the platform's atob for any bytes (property)", () => {
  // Independent oracle: the web-standard atob decoder of the runtime.
  fc.assert(
    fc.property(fc.uint8Array({ maxLength: 300 }), (bytes) => {
      const decoded = atob(encodeBase64(bytes).replace(/\n/g, ""));
      assert.deepEqual(Uint8Array.from(decoded, (c) => c.charCodeAt(0)), bytes);
    }),
    { seed: 7, numRuns: 200 },
  );
});

Deno.test("encodeBase64() breaks lines at 76 characters", () => {
  // 76 characters per line: RFC 2045 §6.8 (MIME) line length, from memory.
  const lines = encodeBase64(new Uint8Array(200)).split("\n");
  assert.equal(lines[0]?.length, 76);
  assert.ok(lines.every((l) => l.length <= 76));
});
