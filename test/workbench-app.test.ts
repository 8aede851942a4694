/**
 * `splicewright app`: the static files it writes are the built page, written safely; the server listens
 * on 127.0.0.1 only, serves nothing but the page's own files (GET and HEAD), and computes nothing.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { request } from "node:http";
import { createServer, type AddressInfo } from "node:net";
import { networkInterfaces, tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BIN, cli, ROOT } from "./helpers/cli.js";

const WEB = join(ROOT, "dist", "web");

describe("splicewright app --out", () => {
  it("writes the built page's files, byte for byte, and names each", () => {
    const dir = join(mkdtempSync(join(tmpdir(), "splicewright-app-")), "page");
    const r = cli(["app", "--out", dir]);
    expect(r.code, r.stderr).toBe(0);
    const names = readdirSync(WEB).sort();
    expect(names).toEqual(expect.arrayContaining(["index.html", "app.js", "app.css", "highs-worker.js"]));
    expect(readdirSync(dir).sort()).toEqual(names);
    for (const n of names) expect(readFileSync(join(dir, n)).equals(readFileSync(join(WEB, n))), n).toBe(true);
    expect(r.stdout.trim().split("\n")).toEqual(names.map((n) => `wrote ${join(dir, n)}`));
  });

  it("the page is classic scripts only (file:// refuses modules) and loads nothing from elsewhere", () => {
    const html = readFileSync(join(WEB, "index.html"), "utf8");
    expect(html).not.toMatch(/type="module"/);
    expect(html).not.toMatch(/(src|href)="(https?:)?\/\//);
    expect(readFileSync(join(WEB, "app.js"), "utf8")).not.toMatch(/\bimport\s*\(|^import\s|^export\s/m);
  });

  it("never overwrites without --force, and writes nothing when one file is in the way", () => {
    const dir = mkdtempSync(join(tmpdir(), "splicewright-app-"));
    writeFileSync(join(dir, "app.css"), "mine");
    const r = cli(["app", "--out", dir]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toBe(`splicewright: error: ${join(dir, "app.css")}: already exists (use --force to overwrite)`);
    expect(readdirSync(dir)).toEqual(["app.css"]);
    expect(readFileSync(join(dir, "app.css"), "utf8")).toBe("mine");
    expect(cli(["app", "--out", dir, "--force"]).code).toBe(0);
    expect(readFileSync(join(dir, "app.css")).equals(readFileSync(join(WEB, "app.css")))).toBe(true);
  });

  it("--out with serving options is one line, exit 2", () => {
    const r = cli(["app", "--out", join(tmpdir(), "never-written"), "--port", "8000"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toBe("splicewright: error: --out: writes files; --port, --host and --open are for serving");
    expect(existsSync(join(tmpdir(), "never-written"))).toBe(false);
  });

  it("a bad --port is one line, exit 2", () => {
    const r = cli(["app", "--port", "http"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toBe('splicewright: error: --port: must be a whole number from 0 to 65535, got "http"');
  });
});

/** Start `splicewright app` and read the address it prints. */
function startApp(args: string[] = []): Promise<{ child: ChildProcess; url: string; stderr: () => string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [BIN, "app", ...args], { stdio: ["ignore", "pipe", "pipe"] });
    let out = "";
    let err = "";
    const ready = () => {
      const m = /splicewright workbench: (http:\/\/\S+)/.exec(out);
      if (m && err.includes("Ctrl+C")) resolve({ child, url: m[1]!, stderr: () => err });
    };
    child.stdout!.on("data", (d: Buffer) => {
      out += d.toString();
      ready();
    });
    child.stderr!.on("data", (d: Buffer) => {
      err += d.toString();
      ready();
    });
    child.on("exit", (code) => reject(new Error(`app exited ${code}: ${err}`)));
  });
}

function fetchRaw(url: string, method = "GET", path?: string): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: Buffer }> {
  return new Promise((resolve, reject) => {
    const u = new URL(url);
    const req = request({ host: u.hostname, port: u.port, method, path: path ?? u.pathname }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
    });
    req.on("error", reject);
    req.end();
  });
}

describe("splicewright app (serving)", () => {
  let app: Awaited<ReturnType<typeof startApp>>;
  beforeAll(async () => {
    app = await startApp();
  });
  afterAll(() => {
    app?.child.kill("SIGTERM");
  });

  it("listens on 127.0.0.1 on a free port, prints the address and opens nothing", () => {
    expect(app.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/$/);
    expect(app.stderr()).toMatch(/every calculation runs in the browser/);
    expect(app.stderr()).not.toMatch(/other machines/);
  });

  it("serves the page's files as they are, with their types; HEAD too", async () => {
    const index = await fetchRaw(app.url);
    expect(index.status).toBe(200);
    expect(index.headers["content-type"]).toBe("text/html; charset=utf-8");
    expect(index.body.equals(readFileSync(join(WEB, "index.html")))).toBe(true);
    expect(String(index.headers["content-security-policy"])).toContain("default-src 'self'");
    const js = await fetchRaw(`${app.url}app.js`);
    expect(js.status).toBe(200);
    expect(js.headers["content-type"]).toBe("text/javascript; charset=utf-8");
    expect(js.body.equals(readFileSync(join(WEB, "app.js")))).toBe(true);
    const head = await fetchRaw(`${app.url}app.css`, "HEAD");
    expect(head.status).toBe(200);
    expect(head.body.length).toBe(0);
    expect(Number(head.headers["content-length"])).toBe(readFileSync(join(WEB, "app.css")).length);
  });

  it("serves nothing else: other paths 404, escapes from the folder 404, other methods 405", async () => {
    expect((await fetchRaw(app.url, "GET", "/package.json")).status).toBe(404);
    expect((await fetchRaw(app.url, "GET", "/../package.json")).status).toBe(404);
    expect((await fetchRaw(app.url, "GET", "/%2e%2e/%2e%2e/package.json")).status).toBe(404);
    expect((await fetchRaw(app.url, "GET", "/..%2fpackage.json")).status).toBe(404);
    const post = await fetchRaw(app.url, "POST");
    expect(post.status).toBe(405);
    expect(post.headers.allow).toBe("GET, HEAD");
    expect((await fetchRaw(app.url, "PUT", "/index.html")).status).toBe(405);
  });

  it("is not reachable on the machine's other addresses", async () => {
    const port = Number(new URL(app.url).port);
    const other = Object.values(networkInterfaces()).flat().find((a) => a && a.family === "IPv4" && !a.internal);
    if (!other) {
      console.warn("no non-loopback IPv4 address on this machine: the reachability check is skipped");
      return;
    }
    await expect(fetchRaw(`http://${other.address}:${port}/`)).rejects.toThrow(/ECONNREFUSED/);
  });

  it("a port in use is one line, exit 2", async () => {
    const blocker = createServer().listen(0, "127.0.0.1");
    await new Promise((r) => blocker.once("listening", r));
    const port = (blocker.address() as AddressInfo).port;
    try {
      const r = cli(["app", "--port", String(port)]);
      expect(r.code).toBe(2);
      expect(r.stderr.trim()).toBe(`splicewright: error: --port: ${port} is in use (leave --port out for a free port)`);
    } finally {
      blocker.close();
    }
  });

  it("stops cleanly on SIGTERM", async () => {
    const other = await startApp();
    const exited = new Promise<number | null>((r) => other.child.on("exit", (code) => r(code)));
    other.child.kill("SIGTERM");
    expect(await exited).toBe(0);
  });
});
