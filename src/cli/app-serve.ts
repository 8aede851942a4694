/**
 * `splicewright app`, the work: serves the built page (dist/web) from 127.0.0.1, or writes it as static
 * files with --out. The server only serves files: every calculation runs in the browser, in the same
 * core the CLI runs. Loaded only when the command runs (app-command.ts holds its options).
 */
import { spawn } from "node:child_process";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import { isIP } from "node:net";
import { extname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { InputError } from "../io/input-error.js";
import { writeFileSet } from "./files.js";

interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
}

/** The built page, beside the compiled CLI. */
export const WEB_ROOT = fileURLToPath(new URL("../web/", import.meta.url));

const CONTENT_TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".svg": "image/svg+xml",
  ".png": "image/png",
  ".json": "application/json",
  ".txt": "text/plain; charset=utf-8",
};

/** Workers are made from Blob URLs and HiGHS is WebAssembly; nothing is fetched from elsewhere. */
const SECURITY_HEADERS: Record<string, string> = {
  "Content-Security-Policy": "default-src 'self'; script-src 'self' 'wasm-unsafe-eval'; worker-src blob:; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; connect-src 'none'; object-src 'none'; base-uri 'none'; form-action 'none'",
  "X-Content-Type-Options": "nosniff",
  "Cache-Control": "no-store",
  "Referrer-Policy": "no-referrer",
};

/** The page's files by name (one flat folder), or an InputError when the page is not built. */
export function webFiles(root: string = WEB_ROOT): string[] {
  if (!existsSync(join(root, "index.html"))) throw new InputError("app", `the workbench page is not built (${join(root, "index.html")} is missing): run npm run build`);
  return readdirSync(root, { withFileTypes: true }).filter((d) => d.isFile()).map((d) => d.name).sort();
}

const LOOPBACK = new Set(["127.0.0.1", "::1", "localhost"]);

function addressUrl(host: string, p: number): string {
  return `http://${isIP(host) === 6 ? `[${host}]` : host}:${p}/`;
}

/** Serve only the page's own files, by exact name; anything else is 404, any method but GET/HEAD 405. */
function handler(root: string, names: ReadonlySet<string>) {
  return (req: IncomingMessage, res: ServerResponse) => {
    if (req.method !== "GET" && req.method !== "HEAD") {
      res.writeHead(405, { Allow: "GET, HEAD", "Content-Type": "text/plain; charset=utf-8" }).end("method not allowed\n");
      return;
    }
    let name: string;
    try {
      const path = new URL(req.url ?? "/", "http://host").pathname;
      name = path === "/" ? "index.html" : decodeURIComponent(path.slice(1));
    } catch {
      name = "";
    }
    if (!names.has(name)) {
      res.writeHead(404, { "Content-Type": "text/plain; charset=utf-8", ...SECURITY_HEADERS }).end("not found\n");
      return;
    }
    const body = readFileSync(join(root, name));
    res.writeHead(200, { "Content-Type": CONTENT_TYPES[extname(name)] ?? "application/octet-stream", "Content-Length": body.length, ...SECURITY_HEADERS });
    res.end(req.method === "HEAD" ? undefined : body);
  };
}

/** Open the address in the desktop's browser (only with --open). */
function openBrowser(url: string, io: Io): void {
  const [cmd, args] = process.platform === "darwin" ? ["open", [url]] : process.platform === "win32" ? ["cmd", ["/c", "start", "", url]] : ["xdg-open", [url]];
  try {
    const child = spawn(cmd, args, { detached: true, stdio: "ignore" });
    child.on("error", () => io.err(`could not open a browser (${cmd}): open ${url} yourself`));
    child.unref();
  } catch {
    io.err(`could not open a browser (${cmd}): open ${url} yourself`);
  }
}

function serve(root: string, names: string[], host: string, p: number, open: boolean, io: Io): Promise<void> {
  return new Promise((resolve, reject) => {
    const server = createServer(handler(root, new Set(names)));
    server.once("error", (e: NodeJS.ErrnoException) => {
      if (e.code === "EADDRINUSE") reject(new InputError("--port", `${p} is in use (leave --port out for a free port)`));
      else if (e.code === "EACCES") reject(new InputError("--port", `${p} needs privileges this user lacks`));
      else reject(new InputError("--host", `cannot listen on ${host} (${e.code ?? e.message})`));
    });
    server.listen(p, host, () => {
      const stop = () => {
        process.off("SIGINT", stop);
        process.off("SIGTERM", stop);
        server.close(() => resolve());
        server.closeAllConnections();
      };
      process.on("SIGINT", stop);
      process.on("SIGTERM", stop);
      const bound = server.address();
      const url = addressUrl(host, typeof bound === "object" && bound ? bound.port : p);
      io.err("The server only serves the page's files; every calculation runs in the browser. Ctrl+C stops it.");
      if (!LOOPBACK.has(host)) io.err(`Listening on ${host}: other machines that reach this one can open the page.`);
      io.out(`splicewright workbench: ${url}`);
      if (open) openBrowser(url, io);
    });
  });
}

export interface AppOptions {
  port?: number;
  host: string;
  open?: boolean;
  out?: string;
  force?: boolean;
}

/** Write the page as files (--out), or serve it until Ctrl+C; the exit code is 0. */
export async function runApp(opts: AppOptions, io: Io): Promise<number> {
  const names = webFiles();
  if (opts.out !== undefined) {
    if (opts.port !== undefined || opts.open || opts.host !== "127.0.0.1") throw new InputError("--out", "writes files; --port, --host and --open are for serving");
    const files = names.map((n) => ({ path: join(opts.out!, n), content: readFileSync(join(WEB_ROOT, n), "utf8") }));
    await writeFileSet(files, opts.force ?? false);
    for (const f of files) io.out(`wrote ${f.path}`);
    io.err(`open ${join(opts.out, "index.html")} in a browser`);
    return 0;
  }
  await serve(WEB_ROOT, names, opts.host, opts.port ?? 0, opts.open ?? false, io);
  return 0;
}
