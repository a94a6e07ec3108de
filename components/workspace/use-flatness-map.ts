"use client";

import { proxy, wrap, type Remote } from "comlink";
import { useCallback, useEffect, useRef, useState } from "react";
import type { FlatnessJobInput, FlatnessJobResult, FlatnessWorkerApi } from "@/lib/workers";

export type FlatnessState =
  | { status: "idle" }
  | { status: "running"; progress: number }
  | { status: "done"; result: FlatnessJobResult }
  | { status: "cancelled"; previous: FlatnessJobResult | null }
  | { status: "error"; message: string };

/**
 * Runs the flatness map in a Web Worker (lib/workers/flatness.worker.ts through comlink) whenever
 * `input` changes (a short pause first, so a drag does not start a map per pixel). Cancel terminates
 * the worker; the next run starts a fresh one.
 */
export function useFlatnessMap(input: FlatnessJobInput | null, key: string) {
  const [state, setState] = useState<FlatnessState>({ status: "idle" });
  const worker = useRef<Worker | null>(null);
  const last = useRef<FlatnessJobResult | null>(null);
  const run = useRef(0);

  const stop = useCallback(() => {
    worker.current?.terminate();
    worker.current = null;
  }, []);

  const start = useCallback(
    (job: FlatnessJobInput) => {
      stop();
      const id = ++run.current;
      const w = new Worker(new URL("../../lib/workers/flatness.worker.ts", import.meta.url), { type: "module" });
      worker.current = w;
      // a worker that cannot load or throws outside a call never answers comlink: say so
      w.onerror = (ev) => {
        if (run.current !== id) return;
        ev.preventDefault?.();
        setState({ status: "error", message: ev.message || "the computation could not start in this browser" });
        w.terminate();
      };
      const api: Remote<FlatnessWorkerApi> = wrap<FlatnessWorkerApi>(w);
      setState({ status: "running", progress: 0 });
      // progress arrives on its own message port and can land after the result: ignore it then
      let finished = false;
      api
        .run(
          job,
          proxy((f: number) => {
            if (run.current === id && !finished) setState({ status: "running", progress: f });
          }),
        )
        .then((result) => {
          finished = true;
          if (run.current !== id) return;
          last.current = result;
          setState({ status: "done", result });
          w.terminate();
          if (worker.current === w) worker.current = null;
        })
        .catch((e: unknown) => {
          finished = true;
          if (run.current !== id) return;
          setState({ status: "error", message: e instanceof Error ? e.message : String(e) });
          w.terminate();
        });
    },
    [stop],
  );

  const cancel = useCallback(() => {
    run.current++;
    stop();
    setState({ status: "cancelled", previous: last.current });
  }, [stop]);

  const inputRef = useRef(input);
  inputRef.current = input;
  useEffect(() => {
    if (!inputRef.current) {
      stop();
      setState({ status: "idle" });
      return;
    }
    const t = setTimeout(() => inputRef.current && start(inputRef.current), 150);
    return () => clearTimeout(t);
  }, [key, start, stop]);

  useEffect(() => () => stop(), [stop]);

  const restart = useCallback(() => {
    if (inputRef.current) start(inputRef.current);
  }, [start]);

  return { state, cancel, restart, last: last.current };
}
