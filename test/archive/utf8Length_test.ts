import assert from "node:assert/strict";
import { utf8Length } from "../../src/archive/hash.ts";

Deno.test("utf8Length() counts the bytes TextEncoder writes, lone surrogates as U+FFFD", () => {
  // Reference: TextEncoder (WHATWG Encoding Standard, UTF-8 encoder; a lone surrogate becomes U+FFFD, 3 bytes).
  const texts = [
    "",
    "abc",
    "m²·K/W",
    "°C",
    "\u{1F600}",
    "\ud800",
    "x\udc00",
    "a\ud800\udc00b",
    "€",
    "\u07ff\u0800",
  ];
  let s = 5;
  const rand = () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
  for (let i = 0; i < 500; i++) {
    texts.push(
      String.fromCharCode(...Array.from({ length: 1 + Math.floor(rand() * 20) }, () => rand() * 0x10000)),
    );
  }
  for (const text of texts) {
    assert.equal(utf8Length(text), new TextEncoder().encode(text).length, JSON.stringify(text));
  }
});
