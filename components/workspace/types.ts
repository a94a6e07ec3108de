import type { PositionKind } from "@/lib/schemas/workspace";

/** A seat or a source as the workspace screens hold it (m, room coordinates of lib/schemas/workspace.ts). */
export interface PlanPosition {
  id: string;
  kind: PositionKind;
  name: string;
  xM: number;
  yM: number;
  zM: number;
  /** seats: the main listening position */
  isMain: boolean;
  /** sources only */
  delayMs: number;
  polarity: 1 | -1;
  drivesBass: boolean;
}

/** A value grid drawn under the plan (the flatness map): cell centres, m, and a colour per cell. */
export interface PlanHeat {
  xM: readonly number[];
  yM: readonly number[];
  /** index ix * yM.length + iy */
  values: ArrayLike<number>;
  colour: (value: number) => string;
  best?: { xM: number; yM: number };
}

export const KIND_LABEL: Record<PositionKind, string> = { seat: "Seat", "main-speaker": "Main speaker", subwoofer: "Subwoofer" };
