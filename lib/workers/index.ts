/** lib/workers — pure jobs that the browser runs in Web Workers (the worker entries sit beside them). */
export { runFlatnessJob, FLATNESS_BAND_HZ, FLATNESS_MAX_MODE_HZ, FLATNESS_POINTS, type FlatnessJobInput, type FlatnessJobResult, type FlatnessMode } from "./flatness-job";
export type { FlatnessWorkerApi } from "./flatness.worker";
