/**
 * Text that is shown to a person: control characters made visible, long values shortened.
 *
 * A project, a weather file or a package can hold any character. Echoed raw to a terminal, ESC (U+001B)
 * starts escape sequences (title change, clear screen, colours), BEL rings, CR moves back over a line, C1
 * controls act like ESC sequences on some terminals and bidi controls reorder what is read. Every line the
 * CLI writes passes through `terminalSafe`; values inside one message go through `oneLine` so that a
 * newline in a value cannot start a line of its own (a fake "REPRODUCED").
 */

/** The bidi controls (Arabic letter mark, LRM/RLM, embeddings, overrides, isolates) and the line/paragraph separators. */
const BIDI = String.raw`\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069`;
/** C0 controls except TAB and LF, DEL, C1 controls, and the bidi controls. */
const UNSAFE = new RegExp(String.raw`[\u0000-\u0008\u000b-\u001f\u007f-\u009f${BIDI}]`, "g");
/** The same, plus TAB and LF. */
const UNSAFE_IN_LINE = new RegExp(String.raw`[\u0000-\u001f\u007f-\u009f${BIDI}]`, "g");

/** Longest value quoted whole in a message, characters. */
export const MAX_QUOTED_VALUE = 200;
/** Longest message or hint kept whole, characters. */
export const MAX_MESSAGE = 2000;

function visible(c: string): string {
  if (c === "\n") return "\\n";
  if (c === "\t") return "\\t";
  if (c === "\r") return "\\r";
  return `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`;
}

/** Makes control and bidi characters visible as `\u001b`-style escapes; keeps line feeds and tabs. */
export function terminalSafe(text: string): string {
  return text.replace(UNSAFE, visible);
}

/** Like `terminalSafe`, and line feeds and tabs become `\n` and `\t`: the text stays on one line. */
export function oneLine(text: string): string {
  return text.replace(UNSAFE_IN_LINE, visible);
}

/**
 * For an HTML document written to stdout: control and bidi characters become numeric character
 * references, which a browser reads back as the same characters (C0 and bidi) while a terminal shows
 * them as text.
 */
export function htmlTerminalSafe(text: string): string {
  return text.replace(UNSAFE, (c) => `&#x${c.charCodeAt(0).toString(16)};`);
}

/** Keeps the first `max` characters of a long value and says how long it was. */
export function shortened(text: string, max: number = MAX_QUOTED_VALUE): string {
  if (text.length <= max) return text;
  // Do not cut a surrogate pair in two.
  const end = /[\ud800-\udbff]/.test(text.charAt(max - 1)) ? max - 1 : max;
  return `${text.slice(0, end)}… (${text.length} characters)`;
}

/** Shortens every `"quoted"` value of a message that is longer than `MAX_QUOTED_VALUE`, then the message. */
export function shortenValues(message: string): string {
  if (message.length <= MAX_QUOTED_VALUE) return message;
  const inner = message.replace(/"([^"]*)"/g, (whole, value: string) => {
    if (value.length <= MAX_QUOTED_VALUE) return whole;
    const kept = shortened(value).slice(0, -` (${value.length} characters)`.length);
    return `"${kept}" (${value.length} characters)`;
  });
  return shortened(inner, MAX_MESSAGE);
}
