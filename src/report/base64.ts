/** Base64 (RFC 4648 §4, standard alphabet, padded) for embedding input bytes in the package. */

const ALPHABET = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/";

function sextet(index: number): string {
  return ALPHABET.charAt(index & 63);
}

/** Encodes bytes as base64, broken into lines of `lineLength` characters (0 = one line). */
export function encodeBase64(bytes: Uint8Array, lineLength = 76): string {
  let out = "";
  for (let i = 0; i < bytes.length; i += 3) {
    const a = bytes[i] ?? 0;
    const b = bytes[i + 1] ?? 0;
    const c = bytes[i + 2] ?? 0;
    const triple = (a << 16) | (b << 8) | c;
    out += sextet(triple >> 18) + sextet(triple >> 12);
    out += i + 1 < bytes.length ? sextet(triple >> 6) : "=";
    out += i + 2 < bytes.length ? sextet(triple) : "=";
  }
  if (lineLength <= 0) return out;
  const lines: string[] = [];
  for (let i = 0; i < out.length; i += lineLength) lines.push(out.slice(i, i + lineLength));
  return lines.join("\n");
}
