"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useState } from "react";
import { toast } from "sonner";
import type { Build } from "@/db/queries/builds";
import type { Scenario } from "@/db/queries/scenarios";
import type { Workspace } from "@/db/queries/workspace";

/** What every save returns to the screen: data, or an expected failure with its code and fields. */
export type SaveResult<T = unknown> = { ok: true; data: T } | { ok: false; code: string; message: string; fields?: Record<string, string[]> };

export const workspaceKey = (roomId: string) => ["rooms", roomId, "workspace"] as const;
export const analysisKey = (roomId: string) => ["rooms", roomId, "analysis"] as const;
export const buildsKey = ["builds"] as const;

async function getJson<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" }, cache: "no-store" });
  const body = await res.json().catch(() => ({}));
  if (!res.ok) throw new Error(body?.error?.message ?? `GET ${url} answered ${res.status}`);
  return body as T;
}

/** The room's workspace (room, surfaces, seats, sources, scenario summaries) through GET /api/v1/rooms/{id}/workspace. */
export function useWorkspaceQuery(roomId: string, initial: Workspace) {
  return useQuery({
    queryKey: workspaceKey(roomId),
    queryFn: async () => (await getJson<{ workspace: Workspace }>(`/api/v1/rooms/${roomId}/workspace`)).workspace,
    initialData: initial,
    staleTime: 15_000,
  });
}

/** Every scenario not archived, with items and stored results, through GET /api/v1/rooms/{id}/analysis. */
export function useScenariosQuery(roomId: string, initial: Scenario[]) {
  return useQuery({
    queryKey: analysisKey(roomId),
    queryFn: async () => (await getJson<{ scenarios: Scenario[] }>(`/api/v1/rooms/${roomId}/analysis`)).scenarios,
    initialData: initial,
    staleTime: 15_000,
  });
}

/** The firm's build library through GET /api/v1/builds. */
export function useBuildsQuery(initial: Build[]) {
  return useQuery({
    queryKey: buildsKey,
    queryFn: async () => (await getJson<{ builds: Build[] }>(`/api/v1/builds`)).builds,
    initialData: initial,
    staleTime: 30_000,
  });
}

/**
 * Runs a save (a server action), then refreshes the room's queries. A stale version (409) raises the
 * conflict banner ("someone else changed this — reload"); other failures show their message.
 */
export function useSaver(roomId: string) {
  const qc = useQueryClient();
  const [conflict, setConflict] = useState(false);
  const refresh = useCallback(async () => {
    await Promise.all([qc.invalidateQueries({ queryKey: workspaceKey(roomId) }), qc.invalidateQueries({ queryKey: analysisKey(roomId) }), qc.invalidateQueries({ queryKey: buildsKey })]);
  }, [qc, roomId]);
  const save = useCallback(
    async <T,>(work: () => Promise<SaveResult<T>>, opts: { success?: string; quiet?: boolean } = {}): Promise<SaveResult<T>> => {
      let result: SaveResult<T>;
      try {
        result = await work();
      } catch {
        result = { ok: false, code: "network", message: "The save did not reach the server. Check the connection and try again." };
      }
      if (result.ok) {
        if (opts.success) toast.success(opts.success);
        await refresh();
      } else if (result.code === "conflict") setConflict(true);
      else if (!opts.quiet) toast.error(result.message);
      return result;
    },
    [refresh],
  );
  const reload = useCallback(async () => {
    await refresh();
    setConflict(false);
  }, [refresh]);
  return { save, conflict, reload, refresh };
}
