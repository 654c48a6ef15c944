/** How a part of a status line is coloured on a terminal (red, yellow, green, none). */
export type Tone = "bad" | "warn" | "good" | "plain";

/** A piece of a terminal line with its tone. */
export interface StyledPart {
  readonly text: string;
  readonly tone?: Tone;
}

/** What a command needs from its surroundings (so tests can run it without a terminal). */
export interface CommandIo {
  stdout(line: string): void;
  stderr(line: string): void;
  /** True when stdout is a terminal that takes colour (and NO_COLOR is not set). */
  readonly colour?: boolean;
  /** One stdout line of parts, each coloured by its tone when `colour` is on (see terminalIo). */
  styled?(parts: readonly StyledPart[]): void;
}
