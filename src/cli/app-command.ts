/**
 * `splicewright app`: the command's options. The server (or the writing of the page as static files) is
 * in app-serve.ts, loaded only when the command runs.
 */
import type { Command } from "commander";
import { InputError } from "../io/input-error.js";
import type { AppOptions } from "./app-serve.js";

interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
}

/** --port: 0 (a free port) to 65535. */
function port(v: string): number {
  if (!/^\d+$/.test(v) || Number(v) > 65535) throw new InputError("--port", `must be a whole number from 0 to 65535, got "${v}"`);
  return Number(v);
}

export function registerApp(program: Command, io: Io, setExit: (code: number) => void): void {
  program
    .command("app")
    .description("the browser workbench: serve it from 127.0.0.1 (the browser does every calculation), or write it as static files")
    .option("--port <n>", "port to listen on (default: a free port)", port)
    .option("--host <address>", "address to listen on; anything but 127.0.0.1 lets other machines reach the page", "127.0.0.1")
    .option("--open", "open the page in the desktop's browser")
    .option("--out <dir>", "write the page as static files into this folder (they work from disk) instead of serving it")
    .option("--force", "let --out overwrite existing files")
    .action(async (opts: AppOptions) => {
      const { runApp } = await import("./app-serve.js");
      setExit(await runApp(opts, io));
    });
}
