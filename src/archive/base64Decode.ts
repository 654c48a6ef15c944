const ALPHABET = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/";
const VALUES = new Map([...ALPHABET].map((ch, i) => [ch, i]));

/** Decodes standard padded base64 (RFC 4648 §4), ignoring line breaks; undefined on any other character. */
export function decodeBase64(text: string): Uint8Array | undefined {
  const clean = text.replace(/[\r\n ]/g, "");
  if (clean.length % 4 !== 0) return undefined;
  const padding = clean.endsWith("==") ? 2 : clean.endsWith("=") ? 1 : 0;
  const out = new Uint8Array((clean.length / 4) * 3 - padding);
  let o = 0;
  for (let i = 0; i < clean.length; i += 4) {
    let triple = 0;
    for (let j = 0; j < 4; j++) {
      const ch = clean[i + j]!;
      const v = ch === "=" && i + j >= clean.length - padding ? 0 : VALUES.get(ch);
      if (v === undefined) return undefined;
      triple = (triple << 6) | v;
    }
    if (o < out.length) out[o++] = (triple >> 16) & 255;
    if (o < out.length) out[o++] = (triple >> 8) & 255;
    if (o < out.length) out[o++] = triple & 255;
  }
  return out;
}
