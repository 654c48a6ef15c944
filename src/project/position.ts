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

/** A value together with the place in the project where it was written. */
export interface Located<T> {
  readonly value: T;
  readonly at: Position;
}
