/** What a command needs from its surroundings (so tests can run it without a terminal). */
export interface CommandIo {
  stdout(line: string): void;
  stderr(line: string): void;
}
