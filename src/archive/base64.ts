/** Base64 (RFC 4648 §4, standard alphabet, padded) for embedding input bytes in the package. */

const ALPHABET = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/";

/**
 * Encodes bytes as base64, broken into lines of `lineLength` characters (0 = one line). The ASCII output is written
 * into one byte buffer and decoded once, so a 64 MB input costs about its encoded size, not a rope of small strings.
 */
export function encodeBase64(bytes: Uint8Array, lineLength = 76): string {
  const encodedLength = Math.ceil(bytes.length / 3) * 4;
  const breaks = lineLength > 0 && encodedLength > 0 ? Math.ceil(encodedLength / lineLength) - 1 : 0;
  const out = new Uint8Array(encodedLength + breaks);
  const codes = Uint8Array.from(ALPHABET, (c) => c.charCodeAt(0));
  const pad = "=".charCodeAt(0);
  const newline = "\n".charCodeAt(0);
  let written = 0;
  let column = 0;
  const put = (code: number) => {
    if (lineLength > 0 && column === lineLength) {
      out[written++] = newline;
      column = 0;
    }
    out[written++] = code;
    column++;
  };
  for (let i = 0; i < bytes.length; i += 3) {
    const a = bytes[i] ?? 0;
    const b = bytes[i + 1] ?? 0;
    const c = bytes[i + 2] ?? 0;
    const triple = (a << 16) | (b << 8) | c;
    put(codes[(triple >> 18) & 63]!);
    put(codes[(triple >> 12) & 63]!);
    put(i + 1 < bytes.length ? codes[(triple >> 6) & 63]! : pad);
    put(i + 2 < bytes.length ? codes[triple & 63]! : pad);
  }
  return new TextDecoder("latin1").decode(out.subarray(0, written));
}
