/**
 * Faults of the surroundings — a file that cannot be read or written, a read-only or full disk, a busy
 * port, a permission the run was not given — described in one line that names the path and the
 * operation. They are not faults in fluxnote and not errors in the project: the CLI prints the line and
 * exits 1 (README, "Exit codes").
 */

/** What the operating system's operation name in a Deno error message means, as a verb phrase. */
const OPERATIONS: Record<string, string> = {
  open: "open",
  readfile: "read",
  writefile: "write",
  write: "write",
  read: "read",
  mkdir: "create the folder",
  mkdtemp: "create a folder in",
  rename: "move",
  remove: "remove",
  stat: "look at",
  lstat: "look at",
  realpath: "resolve",
  readdir: "list the folder",
  copy: "copy",
  chmod: "set the permissions of",
  symlink: "link",
  link: "link",
  truncate: "truncate",
  watch: "watch",
};

/** errno values whose Deno error class is the generic Error, by number (Linux). */
const OS_ERRORS: Record<string, string> = {
  "28": "the disk is full (no space left on the device)",
  "30": "the file system is read-only",
  "122": "the disk quota is exceeded",
  "5": "an input/output error occurred",
  "36": "the name is too long",
  "40": "there are too many levels of symbolic links",
};

function reasonOf(cause: Error, osError: string | undefined): string {
  if (osError !== undefined && OS_ERRORS[osError] !== undefined) return OS_ERRORS[osError];
  if (cause instanceof Deno.errors.PermissionDenied) return "permission denied";
  if (cause instanceof Deno.errors.NotFound) return "it does not exist";
  if (cause instanceof Deno.errors.AlreadyExists) return "it already exists";
  if (cause instanceof Deno.errors.IsADirectory) return "it is a folder, not a file";
  if (cause instanceof Deno.errors.NotADirectory) return "a part of the path is a file, not a folder";
  if (cause instanceof Deno.errors.BrokenPipe) return "the reader went away (broken pipe)";
  if (cause instanceof Deno.errors.AddrInUse) return "the address is in use";
  // The operating system's own words, without the "(os error N)" and the operation.
  return cause.message.replace(/\s*\(os error \d+\).*$/s, "").toLowerCase();
}

/** True for errors that come from the operating system or from a permission the run was not given. */
export function isEnvironmentFault(cause: unknown): cause is Error {
  if (!(cause instanceof Error)) return false;
  return cause instanceof PathFault || cause instanceof Deno.errors.NotCapable ||
    cause instanceof Deno.errors.PermissionDenied ||
    cause instanceof Deno.errors.NotFound || cause instanceof Deno.errors.AlreadyExists ||
    cause instanceof Deno.errors.IsADirectory || cause instanceof Deno.errors.NotADirectory ||
    cause instanceof Deno.errors.BrokenPipe || cause instanceof Deno.errors.AddrInUse ||
    cause instanceof Deno.errors.AddrNotAvailable || cause instanceof Deno.errors.WriteZero ||
    cause instanceof Deno.errors.UnexpectedEof || cause instanceof Deno.errors.Busy ||
    cause instanceof Deno.errors.FilesystemLoop || /\(os error \d+\)/.test(cause.message);
}

/** One line for an environment fault: what could not be done, to which path, and why. */
export function describeEnvironmentFault(cause: Error): string {
  if (cause instanceof PathFault) return cause.message;
  if (cause instanceof Deno.errors.NotCapable) {
    // "Requires write access to "/x", run again with the --allow-write flag"
    const m = /^Requires (\w+) access to "?([^",]*)"?,.*(--allow-[a-z-]+)/.exec(cause.message);
    if (m === null) return `not allowed: ${cause.message}`;
    const access = ({ read: "read", write: "write", net: "connect to", env: "read the variable" } as Record<
      string,
      string
    >)[m[1] ?? ""] ?? "use";
    return `not allowed to ${access} "${m[2]}": this run was not given ${m[3]} for it`;
  }
  const m = /\(os error (\d+)\)(?::\s*(\w+)\s+'([^']*)'(?:\s*->\s*'([^']*)')?)?/.exec(cause.message);
  const reason = reasonOf(cause, m?.[1]);
  const operation = m?.[2];
  const path = m?.[3];
  if (operation === undefined || path === undefined) return reason;
  const verb = OPERATIONS[operation] ?? operation;
  if (operation === "mkdir" && cause instanceof Deno.errors.AlreadyExists) {
    return `cannot create the folder "${path}": a file of that name is in the way`;
  }
  const target = m?.[4] === undefined ? "" : ` to "${m[4]}"`;
  return `cannot ${verb} "${path}"${target}: ${reason}`;
}

/** An operating-system error raised without a path (e.g. by `Deno.makeTempDir`), with the path it concerns. */
export class PathFault extends Error {
  constructor(readonly operation: string, readonly path: string, override readonly cause: Error) {
    super(`cannot ${operation} "${path}": ${reasonOf(cause, /\(os error (\d+)\)/.exec(cause.message)?.[1])}`);
    this.name = "PathFault";
  }
}

/** A `.catch` handler that names `path` in an operating-system error that does not. */
export function faultAt(operation: string, path: string): (cause: unknown) => never {
  return (cause) => {
    throw cause instanceof Error && isEnvironmentFault(cause) ? new PathFault(operation, path, cause) : cause;
  };
}
