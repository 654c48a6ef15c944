/** A project file's text prepared for parsing; the exact bytes are hashed elsewhere. */
export interface SourceText {
  readonly path: string;
  /** Text with a leading BOM removed and CRLF/CR line ends turned into LF. */
  readonly text: string;
}

export type DecodeResult =
  | { readonly ok: true; readonly source: SourceText }
  | { readonly ok: false; readonly line: number; readonly message: string; readonly hint: string };

const decoder = new TextDecoder("utf-8", { fatal: true, ignoreBOM: true });

/** Decodes a file's bytes as strict UTF-8 and normalises line ends so BOM/CRLF files parse like LF files. */
export function decodeSource(path: string, bytes: Uint8Array): DecodeResult {
  const nul = bytes.indexOf(0);
  if (nul >= 0) {
    return {
      ok: false,
      line: lineOfByte(bytes, nul),
      message: `Cannot read "${path}" as text: it contains a NUL byte (binary file?)`,
      hint:
        "project files must be UTF-8 Markdown text; remove the file or rename it so it does not end in .md",
    };
  }
  let text: string;
  try {
    text = decoder.decode(bytes);
  } catch {
    return {
      ok: false,
      line: lineOfFirstInvalidUtf8(bytes),
      message: `Cannot read "${path}": it is not valid UTF-8`,
      hint: "save the file as UTF-8 (most editors offer this under 'Save with encoding')",
    };
  }
  if (text.startsWith("\uFEFF")) text = text.slice(1);
  text = text.replace(/\r\n?/g, "\n");
  return { ok: true, source: { path, text } };
}

function lineOfByte(bytes: Uint8Array, index: number): number {
  let line = 1;
  for (let i = 0; i < index; i++) if (bytes[i] === 0x0a) line++;
  return line;
}

function lineOfFirstInvalidUtf8(bytes: Uint8Array): number {
  let start = 0;
  for (let i = 0; i <= bytes.length; i++) {
    if (i === bytes.length || bytes[i] === 0x0a) {
      try {
        decoder.decode(bytes.subarray(start, i));
      } catch {
        return lineOfByte(bytes, start);
      }
      start = i + 1;
    }
  }
  return 1;
}
