/** A place in a project file: path relative to the project (POSIX), 1-based line and column. */
export interface Position {
  readonly file: string;
  readonly line: number;
  readonly col: number;
}

/** Formats a position as `file:line:col`. */
export function formatPosition(at: Position): string {
  return `${at.file}:${at.line}:${at.col}`;
}

/** A value together with the place in the project where it was written. */
export interface Located<T> {
  readonly value: T;
  readonly at: Position;
}
