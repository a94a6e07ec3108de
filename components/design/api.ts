"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import type { PlacementProblem, SeatReflection, SuggestedPanelSet, Zone } from "@/lib/reflections";
import type { SizerResult } from "@/lib/sizer";

/** A JSON POST to our API; an error answer becomes an Error with the server's message and fields. */
async function post<T>(url: string, body: unknown): Promise<T & { elapsedMs: number }> {
  const t0 = performance.now();
  const res = await fetch(url, { method: "POST", headers: { "content-type": "application/json", accept: "application/json" }, body: JSON.stringify(body), cache: "no-store" });
  const json = await res.json();
  if (!res.ok) {
    const e = new Error(json?.error?.message ?? `The server answered ${res.status}`) as Error & { fields?: Record<string, string[]> };
    e.fields = json?.error?.fields;
    throw e;
  }
  return { ...(json as T), elapsedMs: Math.round(performance.now() - t0) };
}

/** A value that follows `value` after it has stayed still for `ms`. */
export function useDebounced<T>(value: T, ms = 250): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

export type SizerAnswer = { proposal: SizerResult; elapsedMs: number };

/** POST /api/v1/sizer for the request, live (the previous answer stays while the next one computes). */
export function useSizer(request: unknown, enabled = true) {
  return useQuery({
    queryKey: ["design", "sizer", request],
    queryFn: () => post<{ proposal: SizerResult }>("/api/v1/sizer", request),
    placeholderData: keepPreviousData,
    enabled,
    retry: false,
  });
}

export type ReflectionsAnswer = { points: SeatReflection[]; zones: Zone[]; panels: SuggestedPanelSet[]; problems: PlacementProblem[]; elapsedMs: number };

/** POST /api/v1/reflections for the request. */
export function useReflections(request: unknown) {
  return useQuery({
    queryKey: ["design", "reflections", request],
    queryFn: () => post<Omit<ReflectionsAnswer, "elapsedMs">>("/api/v1/reflections", request),
    placeholderData: keepPreviousData,
    retry: false,
  });
}
