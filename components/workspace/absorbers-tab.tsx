"use client";

import type { Build } from "@/db/queries/builds";
import type { UnitSystem } from "@/lib/units/length";
import { LayerDesigner, type LibraryBuild } from "./layer-designer";
import type { WorkspaceActions } from "./room-workspace";

/** The Absorbers tab: the layer designer beside the firm's library. */
export function AbsorbersTab({ units, builds, canSave, actions }: { units: UnitSystem; builds: Build[]; canSave: boolean; actions: WorkspaceActions }) {
  const library: LibraryBuild[] = builds.map((b) => ({
    id: b.id,
    name: b.name,
    kind: b.kind,
    layers: b.spec.kind === "porous-panel" ? b.spec.layers : null,
    materialId: b.spec.kind === "porous-panel" || b.spec.kind === "corner-trap" ? b.spec.materialId : null,
    notes: b.notes,
  }));
  return (
    <LayerDesigner
      units={units}
      canSave={canSave}
      builds={library}
      onSave={async (input) => {
        const r = await actions.saveBuild(input);
        return r.ok ? { ok: true } : { ok: false, message: r.message, fields: r.fields };
      }}
    />
  );
}
