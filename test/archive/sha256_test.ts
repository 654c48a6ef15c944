import * as assert from "node:assert/strict";
import { createHash } from "node:crypto";
import { sha256Hex } from "../../src/archive/hash.ts";
import { sha256HexSmall } from "../../src/archive/sha256.ts";

Deno.test("sha256HexSmall() gives the FIPS 180-4 example digests", () => {
  // FIPS 180-4 / NIST CSRC example values for SHA-256: "abc", the 448-bit message, and the empty message.
  const text = (s: string) => sha256HexSmall(new TextEncoder().encode(s));
  assert.equal(text("abc"), "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  assert.equal(
    text("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq"),
    "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
  );
  assert.equal(text(""), "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
});

Deno.test("sha256Hex() equals node:crypto for every length around the block and size boundaries, bytes and text", () => {
  // Reference: node:crypto's SHA-256 (OpenSSL-compatible implementation in the runtime).
  let seed = 12345;
  const random = (): number => (seed = (seed * 1103515245 + 12345) >>> 0) & 0xff;
  const lengths = [
    ...Array.from({ length: 200 }, (_, i) => i),
    1000,
    4095,
    65535,
    262143,
    262144,
    262145,
    300000,
  ];
  for (const length of lengths) {
    const bytes = Uint8Array.from({ length }, random);
    assert.equal(sha256Hex(bytes), createHash("sha256").update(bytes).digest("hex"), `${length} bytes`);
  }
  for (const text of ["", "λ = 0.035 W/(m K)\n", "x".repeat(70000), "é".repeat(40000)]) {
    assert.equal(sha256Hex(text), createHash("sha256").update(text).digest("hex"), `${text.length} chars`);
  }
});
