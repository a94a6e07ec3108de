/// <reference lib="webworker" />
/**
 * Web Worker entry of the flatness map (comlink). The page starts it with
 * `new Worker(new URL("@/lib/workers/flatness.worker.ts", import.meta.url), { type: "module" })`,
 * wraps it with comlink and calls `run(input, proxy(onProgress))`. Cancel terminates the worker: the
 * map is one synchronous computation, so a message could not reach it before it ends.
 */
import { expose, transfer } from "comlink";
import { runFlatnessJob, type FlatnessJobInput, type FlatnessJobResult } from "./flatness-job";

const api = {
  run(input: FlatnessJobInput, onProgress?: (fraction: number) => void): FlatnessJobResult {
    let last = 0;
    const result = runFlatnessJob(input, (f) => {
      // at most ~50 progress messages per map
      if (onProgress && (f - last >= 0.02 || f === 1)) {
        last = f;
        void onProgress(f);
      }
    });
    return transfer(result, [result.stdDevDb.buffer as ArrayBuffer]);
  },
};

export type FlatnessWorkerApi = typeof api;
expose(api);
