import { formatDiagnostic } from "../project/diagnostic.ts";
import { oneLine, shortened } from "../project/displayText.ts";
import { escapeHtml } from "../report/page/html.ts";
import type { CommandIo } from "./commandIo.ts";
import { loadProject } from "./loadProject.ts";
import { produceOutputs } from "./produce.ts";

/** The state of a live preview: the last good package and the latest build's messages. */
interface PreviewState {
  page: string | undefined;
  resultsJson: string | undefined;
  errors: string[];
  builds: number;
}

export interface ServeOptions {
  readonly project: string;
  readonly port: number;
  /** Seconds between browser reloads (HTTP Refresh header); 0 turns reloading off. */
  readonly refreshS?: number;
  /** Stops the server when aborted (tests). */
  readonly signal?: AbortSignal;
  /** Called once the server listens, with its port. */
  readonly onListen?: (port: number) => void;
  /** Test hook: computes and renders a loaded project (defaults to `produceOutputs`). */
  readonly produce?: typeof produceOutputs;
}

/** Shown in the page and on stderr when a rebuild fails in fluxnote itself; the server keeps running. */
function faultMessage(cause: unknown): string {
  const text = cause instanceof Error ? `${cause.name}: ${cause.message}` : String(cause);
  return `fluxnote could not build the preview: ${oneLine(shortened(text, 500))} ` +
    "(a fault in fluxnote, not in your project; the last good package is kept)";
}

/** Builds the project in memory and serves the package on 127.0.0.1, rebuilding when a file changes. */
export async function runServe(options: ServeOptions, io: CommandIo): Promise<number> {
  const state: PreviewState = { page: undefined, resultsJson: undefined, errors: [], builds: 0 };
  const produce = options.produce ?? produceOutputs;
  const rebuild = async () => {
    state.builds++;
    try {
      const produced = produce(await loadProject(options.project));
      if (produced.ok) {
        state.page = produced.outputs.page;
        state.resultsJson = produced.outputs.resultsJsonText;
        state.errors = [];
        io.stderr(`build ${state.builds}: ok`);
      } else {
        state.errors = produced.diagnostics.filter((d) => d.severity === "error").map(formatDiagnostic);
        io.stderr(`build ${state.builds}: ${state.errors.length} error(s); showing the last good package`);
      }
    } catch (cause) {
      // Whatever happens in one rebuild (a file removed midway, a fault in the renderer), the preview
      // reports it in the page and keeps serving; the next change triggers the next rebuild.
      state.errors = [faultMessage(cause)];
      io.stderr(`build ${state.builds}: ${state.errors[0]}`);
    }
  };
  await rebuild();
  const refresh = options.refreshS ?? 2;
  let watcher: Deno.FsWatcher;
  try {
    watcher = Deno.watchFs(options.project, { recursive: true });
  } catch (cause) {
    if (!(cause instanceof Deno.errors.NotFound || cause instanceof Deno.errors.NotADirectory)) throw cause;
    io.stderr(`fluxnote serve: cannot watch "${options.project}": it does not exist or is not a folder`);
    return 1;
  }
  let server: Deno.HttpServer;
  let listeningPort = options.port;
  try {
    server = Deno.serve(
      {
        hostname: "127.0.0.1",
        port: options.port,
        ...(options.signal === undefined ? {} : { signal: options.signal }),
        onListen: ({ port }) => {
          listeningPort = port;
          io.stdout(
            `preview of ${options.project} at http://127.0.0.1:${port}/ (rebuilds on change; Ctrl-C stops)`,
          );
          options.onListen?.(port);
        },
      },
      (request) =>
        allowedHost(request.headers.get("host"), listeningPort)
          ? respond(new URL(request.url).pathname, state, refresh)
          : misdirected(),
    );
  } catch (cause) {
    watcher.close();
    if (!(cause instanceof Deno.errors.AddrInUse)) throw cause;
    io.stderr(`fluxnote serve: port ${options.port} on 127.0.0.1 is in use; choose another with --port`);
    return 1;
  }
  options.signal?.addEventListener("abort", () => watcher.close());
  let timer: ReturnType<typeof setTimeout> | undefined;
  (async () => {
    for await (const event of watcher) {
      if (event.paths.every((p) => p.includes("/out/") || p.includes("/.out."))) continue;
      clearTimeout(timer);
      timer = setTimeout(() => void rebuild(), 200);
    }
  })().catch(() => {});
  await server.finished;
  clearTimeout(timer);
  return 0;
}

/**
 * Only the names of the address the server listens on are answered: a page on another site that
 * points its own host name at 127.0.0.1 (DNS rebinding) sends its name in `Host` and is refused.
 */
export function allowedHost(host: string | null, port: number): boolean {
  if (host === null) return false;
  const names = ["127.0.0.1", "localhost"];
  return names.some((name) => host.toLowerCase() === `${name}:${port}` || (port === 80 && host === name));
}

function misdirected(): Response {
  return new Response("this preview answers only http://127.0.0.1:<port>/ and http://localhost:<port>/\n", {
    status: 421,
    headers: { "content-type": "text/plain; charset=utf-8", "cache-control": "no-store" },
  });
}

function respond(path: string, state: PreviewState, refreshS: number): Response {
  const headers: Record<string, string> = {
    "content-type": "text/html; charset=utf-8",
    "cache-control": "no-store",
    "x-content-type-options": "nosniff",
    "content-security-policy": "default-src 'none'; img-src data:; style-src 'unsafe-inline'",
  };
  if (refreshS > 0) headers.refresh = String(refreshS);
  if (path === "/results.json" && state.resultsJson !== undefined) {
    return new Response(state.resultsJson, {
      headers: { ...headers, "content-type": "application/json; charset=utf-8" },
    });
  }
  if (path !== "/" && path !== "/package.html") return new Response("not found\n", { status: 404, headers });
  if (state.errors.length > 0 || state.page === undefined) {
    const list = state.errors.map((e) => `<li><pre>${escapeHtml(e)}</pre></li>`).join("");
    const note = state.page === undefined
      ? ""
      : '<p><a href="/package.html?last-good">Show the last good package</a></p>';
    const body =
      `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>fluxnote preview: errors</title></head>` +
      `<body><h1>The project has errors</h1><p>Fix them and save; this page reloads by itself.</p><ul>${list}</ul>${note}</body></html>`;
    if (path === "/package.html" && state.page !== undefined) return new Response(state.page, { headers });
    return new Response(body, { status: 200, headers });
  }
  return new Response(state.page, { headers });
}
