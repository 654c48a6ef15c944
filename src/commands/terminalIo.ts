import { htmlTerminalSafe, terminalSafe } from "../project/displayText.ts";
import type { CommandIo, StyledPart, Tone } from "./commandIo.ts";

export type { StyledPart, Tone };

/** How a part of a status line reads: a failure, something to look at, all well, or plain. */
/** ANSI SGR colours by tone (red, yellow, green); "plain" has none. */
const SGR: Record<Tone, string> = { bad: "\u001b[31m", warn: "\u001b[33m", good: "\u001b[32m", plain: "" };
const RESET = "\u001b[0m";

/** The text of styled parts, with colour codes only when `colour` is true; the text itself is made safe. */
export function styledLine(parts: readonly StyledPart[], colour: boolean): string {
  return parts.map((p) => {
    const text = terminalSafe(p.text);
    const code = colour && p.tone !== undefined ? SGR[p.tone] : "";
    return code === "" ? text : `${code}${text}${RESET}`;
  }).join("");
}

/** Writes one styled line through `io` (plain text when it has no styled writer). */
export function writeStyled(io: CommandIo, parts: readonly StyledPart[]): void {
  if (io.styled !== undefined) io.styled(parts);
  else io.stdout(parts.map((p) => p.text).join(""));
}

/**
 * Wraps a command's output so that no control or bidi character reaches the terminal raw: messages and
 * text output are escaped (`\u001b`); JSON output stays valid (the characters it leaves raw can only be
 * inside strings, where the escape means the same character); an HTML document gets character
 * references, which a browser reads as the same characters. Colour codes are added only by `styled`,
 * around text already made safe, and only when `io.colour` is true.
 */
export function terminalIo(io: CommandIo): CommandIo {
  const colour = io.colour === true;
  return {
    stdout: (line) => io.stdout(/^<!doctype html/i.test(line) ? htmlTerminalSafe(line) : terminalSafe(line)),
    stderr: (line) => io.stderr(terminalSafe(line)),
    colour,
    styled: (parts) => io.stdout(styledLine(parts, colour)),
  };
}

/**
 * A line writer for a standard stream: writes every byte (a pipe may take a write in parts) and, once
 * the reader has gone (broken pipe, e.g. `fluxnote check x | head -1`), drops the rest quietly.
 */
export function streamWriter(stream: { writeSync(bytes: Uint8Array): number }): (line: string) => void {
  const encoder = new TextEncoder();
  let gone = false;
  return (line) => {
    if (gone) return;
    let bytes = encoder.encode(`${line}\n`);
    try {
      while (bytes.length > 0) bytes = bytes.subarray(stream.writeSync(bytes));
    } catch (cause) {
      if (!(cause instanceof Deno.errors.BrokenPipe)) throw cause;
      gone = true;
    }
  };
}
