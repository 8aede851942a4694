/**
 * HiGHS in a Web Worker: one solve per worker, as the CLI runs one per worker thread. The build puts
 * the package's own browser-ready script (highs/build/highs.js, unchanged) and its WebAssembly, as
 * base64, in front of this code, so the worker needs no network and no file access (file:// pages).
 */
import { highsAnswerOf, highsOptions } from "../schedule/run.js";

interface HighsModule {
  solve(lp: string, options: object): { Status: string; ObjectiveValue: number; Columns?: Record<string, unknown> };
  version?: { string?: string };
}
interface WorkerScope {
  postMessage(message: unknown): void;
  onmessage: ((e: MessageEvent<{ lp: string; timeLimit_s: number }>) => void) | null;
  /** The loader highs.js defines (Emscripten's module factory). */
  Module: (settings: object) => Promise<HighsModule>;
  /** The WebAssembly, base64, set by the build. */
  HIGHS_WASM_BASE64: string;
}
const scope = self as unknown as WorkerScope;

function wasmBytes(): Uint8Array<ArrayBuffer> {
  const text = atob(scope.HIGHS_WASM_BASE64);
  const bytes = new Uint8Array(new ArrayBuffer(text.length));
  for (let i = 0; i < text.length; i++) bytes[i] = text.charCodeAt(i);
  return bytes;
}

scope.onmessage = async (e) => {
  const { lp, timeLimit_s } = e.data;
  try {
    const bytes = wasmBytes();
    const highs = await scope.Module({
      instantiateWasm(imports: WebAssembly.Imports, done: (instance: WebAssembly.Instance) => void) {
        void WebAssembly.instantiate(bytes, imports).then((r) => done(r.instance));
        return {};
      },
    });
    const r = highs.solve(lp, highsOptions(timeLimit_s));
    scope.postMessage({ ok: true, answer: highsAnswerOf(r, highs.version?.string ?? "unknown") });
  } catch (err) {
    scope.postMessage({ ok: false, message: err instanceof Error ? err.message : String(err) });
  }
};
