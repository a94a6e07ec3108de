import { INK, isOpenMarker, type MarkerShape } from "@/lib/plots";

/** Props of {@link Marker}. */
export interface MarkerProps {
  /** marker path centred on (0, 0), from lib/plots markerPath */
  path: string;
  shape: MarkerShape;
  x: number;
  y: number;
  colour: string;
  /** drawn as an outline on paper (e.g. outside a model's fitted range) */
  hollow?: boolean;
}

/** A data marker: filled with a thin paper rim, hollow, or (× and +) stroked. */
export function Marker({ path, shape, x, y, colour, hollow = false }: MarkerProps) {
  const open = isOpenMarker(shape);
  return (
    <path
      d={path}
      transform={`translate(${Math.round(x * 100) / 100},${Math.round(y * 100) / 100})`}
      fill={open ? "none" : hollow ? INK.raised : colour}
      stroke={open || hollow ? colour : INK.raised}
      strokeWidth={open ? 2 : hollow ? 1.5 : 0.8}
      strokeLinecap="round"
    />
  );
}
