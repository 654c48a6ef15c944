/**
 * A place in a project file: path relative to the project (POSIX), 1-based line and column. Line 0 means
 * the file or folder as a whole (e.g. a project folder that does not exist), printed without line and column.
 */
export interface Position {
  readonly file: string;
  readonly line: number;
  readonly col: number;
}

/** Formats a position as `file:line:col`, or `file` for line 0 (the file or folder as a whole). */
export function formatPosition(at: Position): string {
  return at.line === 0 ? at.file : `${at.file}:${at.line}:${at.col}`;
}

/** Parses the `path:line:col` of an assumption back into a position (the path may contain colons). */
export function parsePosition(text: string): Position {
  const last = text.lastIndexOf(":");
  const middle = last > 0 ? text.lastIndexOf(":", last - 1) : -1;
  const line = Number(text.slice(middle + 1, last));
  const col = Number(text.slice(last + 1));
  if (middle <= 0 || !Number.isInteger(line) || !Number.isInteger(col)) {
    return { file: text, line: 1, col: 1 };
  }
  return { file: text.slice(0, middle), line, col };
}

/** A value together with the place in the project where it was written. */
export interface Located<T> {
  readonly value: T;
  readonly at: Position;
}
