import assert from "node:assert/strict";
import { utf8Length, utf8LengthByLoop } from "../../src/archive/hash.ts";

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

Deno.test("utf8Length() of a long text (the native count) equals TextEncoder and the code-unit loop", () => {
  // Reference: TextEncoder (WHATWG Encoding Standard, UTF-8 encoder; a lone surrogate becomes U+FFFD, 3 bytes).
  // Above 65,536 characters utf8Length takes node:buffer's count; each text here is that long, with every kind of
  // code unit (ASCII, 2- and 3-byte, pairs, lone high and low surrogates, one at each end).
  let s = 9;
  const rand = () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
  const pieces = ["results ", "m²·K/W ", "Σ − ", "\u{1F600}", "\ud800", "\udc00", "\u07ff\u0800", "\u0000"];
  for (const [start, end] of [["", ""], ["\udc00", "\ud800"], ["\ud83d", "\ude00"]] as const) {
    const parts: string[] = [start];
    let length = 0;
    while (length < 70_000) {
      const piece = pieces[Math.floor(rand() * pieces.length)]!;
      parts.push(piece);
      length += piece.length;
    }
    parts.push(end);
    const text = parts.join("");
    assert.ok(text.length > 65_536);
    const expected = new TextEncoder().encode(text).length;
    assert.equal(utf8Length(text), expected);
    assert.equal(utf8LengthByLoop(text), expected);
  }
});
