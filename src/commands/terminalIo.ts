import { htmlTerminalSafe, terminalSafe } from "../project/displayText.ts";
import type { CommandIo } from "./commandIo.ts";

/**
 * Wraps a command's output so that no control or bidi character reaches the terminal raw: messages and
 * text output are escaped (`\u001b`); JSON output stays valid (the characters it leaves raw can only be
 * inside strings, where the escape means the same character); an HTML document gets character
 * references, which a browser reads as the same characters.
 */
export function terminalIo(io: CommandIo): CommandIo {
  return {
    stdout: (line) => io.stdout(/^<!doctype html/i.test(line) ? htmlTerminalSafe(line) : terminalSafe(line)),
    stderr: (line) => io.stderr(terminalSafe(line)),
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
