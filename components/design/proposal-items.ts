/**
 * From the sizer's proposal (lib/sizer) and the suggested panel set (lib/reflections) to treatment
 * items of a scenario (lib/schemas/workspace TreatmentItemInput without its version): the absorber's
 * spec, count, placements, unit cost and mass. Pure, shared by the design page and its server action.
 */
import { buildQuantities } from "@/lib/build-sheet";
import { POROUS_MATERIALS } from "@/lib/porous";
import type { SuggestedPanelSet } from "@/lib/reflections";
import { DEFAULT_PRICES, type Candidate, type ProposedItem, type SizerLimits } from "@/lib/sizer";
import type { ItemSpec, Placement } from "@/lib/schemas/workspace";

/** A new item as the workspace's add action takes it (the scenario's version is added when sending). */
export interface NewItem {
  name: string;
  spec: ItemSpec;
  count: number;
  placements: Placement[];
  unitCost: number;
  unitMassKg: number | null;
  notes: string;
}

/** The generic material of lib/porous whose typical σ and density range match a fill, else null. */
function materialIdOf(fill: { flowResistivity: number; densityKgM3: number }): string | null {
  const m = POROUS_MATERIALS.find((p) => p.flowResistivity.typical === fill.flowResistivity && fill.densityKgM3 >= p.densityKgM3.min && fill.densityKgM3 <= p.densityKgM3.max);
  return m?.id ?? null;
}

const EDGE_CORNER = { front: "front-ceiling", rear: "rear-ceiling", left: "left-ceiling", right: "right-ceiling" } as const;

function specOf(c: Candidate, roomHeightM: number): ItemSpec {
  switch (c.kind) {
    case "corner-trap":
      return {
        kind: "corner-trap",
        depthM: c.depthM,
        lengthM: c.orientation === "floor-to-ceiling" ? roomHeightM : c.segmentLengthM,
        orientation: c.orientation,
        flowResistivity: c.fill.flowResistivity,
        model: c.fill.model,
        materialId: materialIdOf(c.fill),
      } as ItemSpec;
    case "panel":
      return {
        kind: "porous-panel",
        layers: [{ kind: "porous", thicknessM: c.insulationThicknessM, flowResistivity: c.fill.flowResistivity, model: c.fill.model }, ...(c.airGapM > 0 ? [{ kind: "air" as const, thicknessM: c.airGapM }] : [])],
        materialId: materialIdOf(c.fill),
        widthM: c.faceWidthM,
        heightM: c.faceHeightM,
        exposedSides: false,
      } as ItemSpec;
    case "membrane-trap":
      return c.perforation
        ? { kind: "perforated", openAreaRatio: c.perforation.openAreaRatio, plateThicknessM: c.sheet.thicknessM, holeDiameterM: c.perforation.holeDiameterM, cavityDepthM: c.cavityDepthM, resistanceRatio: c.resistanceRatio, widthM: c.faceWidthM, heightM: c.faceHeightM }
        : { kind: "membrane", massKgM2: Math.round(c.sheet.thicknessM * c.sheet.densityKgM3 * 1000) / 1000, cavityDepthM: c.cavityDepthM, resistanceRatio: c.resistanceRatio, widthM: c.faceWidthM, heightM: c.faceHeightM };
  }
}

/**
 * The proposal's items with their places, in the sizer's own order of filling: free vertical corners in
 * the order the user listed them, wall–ceiling edges longest first in whole segments; wall items are
 * left unplaced (the sizer sizes them by free wall area, the room page places them).
 * @example proposalItems(result.items, catalogue, limits, 2.5)[0].placements // [{ kind: 'corner', corner: 'front-left' }, …]
 */
export function proposalItems(items: readonly ProposedItem[], catalogue: readonly Candidate[], limits: Pick<SizerLimits, "verticalCorners" | "ceilingEdges">, roomHeightM: number): NewItem[] {
  const corners = [...limits.verticalCorners];
  const edges = [...limits.ceilingEdges].map((e, i) => ({ ...e, i, left: e.lengthM })).sort((a, b) => b.lengthM - a.lengthM || a.i - b.i);
  return items.map((it) => {
    const c = catalogue.find((x) => x.id === it.candidateId);
    if (!c) throw new RangeError(`candidate ${it.candidateId} is not in the catalogue`);
    let placements: Placement[] = [];
    if (it.placement === "vertical-corner") placements = corners.splice(0, it.count).map((corner) => ({ kind: "corner", corner }));
    else if (it.placement === "ceiling-edge" && c.kind === "corner-trap" && c.orientation === "wall-ceiling") {
      for (let n = 0; n < it.count; n++) {
        const edge = edges.find((e) => e.left + 1e-9 >= c.segmentLengthM);
        if (!edge) break;
        edge.left -= c.segmentLengthM;
        placements.push({ kind: "corner", corner: EDGE_CORNER[edge.edge] });
      }
    }
    const name = it.name.length > 120 ? `${it.name.slice(0, 117)}…` : it.name;
    return {
      name,
      spec: specOf(c, roomHeightM),
      count: it.count,
      placements,
      unitCost: Math.round(it.unitCost * 100) / 100,
      unitMassKg: Math.round(it.unitWeightKg * 10) / 10,
      notes: `From the bass-trap sizer: ${it.where.join("; ")}.${it.placement === "wall" ? " Place the units on the room page." : ""}`,
    };
  });
}

/**
 * The suggested reflection panels as items, one per surface, each unit placed at its face's centre
 * (lib/reflections gives lower corners); a porous panel of the given layers.
 */
export function panelSetItems(sets: readonly SuggestedPanelSet[], panel: { thicknessM: number; flowResistivity: number; materialId: string | null; unitCost: number; unitMassKg: number | null }): NewItem[] {
  return sets
    .filter((s) => s.count > 0 && s.surface !== "floor")
    .map((s) => ({
      name: `Reflection panels, ${s.surface === "ceiling" ? "ceiling" : `${s.surface} wall`}`,
      spec: {
        kind: "porous-panel",
        layers: [{ kind: "porous", thicknessM: panel.thicknessM, flowResistivity: panel.flowResistivity, model: "miki" }],
        materialId: panel.materialId,
        widthM: s.panel.widthM,
        heightM: s.panel.heightM,
        exposedSides: false,
      } as ItemSpec,
      count: s.count,
      placements: s.placements.map((p) => ({ kind: "surface" as const, surface: p.surface, uM: round(p.uM + p.widthM / 2), vM: round(p.vM + p.heightM / 2) })),
      unitCost: panel.unitCost,
      unitMassKg: panel.unitMassKg,
      notes: `Covers the first reflection points on the ${s.surface}${s.surface === "ceiling" ? "" : " wall"} (${s.columns} × ${s.rows}).`,
    }));
}

const round = (m: number) => Math.round(m * 1000) / 1000;

/**
 * Materials cost and weight of one framed porous panel at the sizer's demo prices (lib/sizer
 * DEFAULT_PRICES, pro rata): the frame in 19 mm lumber as wide as the slab (common practice),
 * 50 mm fabric wrap; lib/build-sheet quantities.
 * @example panelUnitCost(1.2, 0.6, 0.1, 35).weightKg // ≈ 6
 */
export function panelUnitCost(widthM: number, heightM: number, thicknessM: number, densityKgM3: number): { unitCost: number; unitMassKg: number } {
  const q = buildQuantities(
    { kind: "panel", faceWidthM: widthM, faceHeightM: heightM, insulationThicknessM: thicknessM, insulationDensityKgM3: densityKgM3 },
    { lumber: { thicknessM: 0.019, widthM: Math.max(thicknessM, 0.05) }, fabric: { wrapM: 0.05 } },
  );
  const p = DEFAULT_PRICES;
  const cost = q.frameVolumeM3 * p.lumberPerM3 + q.insulationVolumeM3 * p.insulationPerM3 + q.fabricAreaM2 * p.fabricPerM2 + q.screws * p.screwEach + q.cleats * p.cleatEach;
  return { unitCost: Math.round(cost * 100) / 100, unitMassKg: Math.round(q.weightKg * 10) / 10 };
}
