"use client";

import { INK, OKABE_ITO } from "@/lib/plots";
import type { SeatReflection, SuggestedPanelSet, Zone } from "@/lib/reflections";
import { useElementWidth } from "@/components/plots";

type SurfaceId = "front" | "rear" | "left" | "right" | "floor" | "ceiling";
type Dims = { lengthM: number; widthM: number; heightM: number };
type Rect = { x: number; y: number; w: number; h: number };

/**
 * The room's six surfaces unfolded into one sheet, each seen from inside: the floor plan in the middle
 * (x to the right from the front wall, y downward from the left wall, as the room plan draws it), the
 * four walls folded out round it with the floor edge against the floor, and the ceiling beyond the rear
 * wall. Returns the sheet rectangle of a surface rectangle (u, v in the surface's own frame), in metres.
 */
export function netRect(room: Dims, surface: SurfaceId, uMin: number, uMax: number, vMin: number, vMax: number): Rect {
  const { lengthM: L, widthM: W, heightM: H } = room;
  const pts: [number, number][] = [
    [uMin, vMin],
    [uMax, vMax],
  ].map(([u, v]) => {
    switch (surface) {
      case "floor":
        return [H + u!, H + v!];
      case "left":
        return [H + u!, H - v!];
      case "right":
        return [H + u!, H + W + v!];
      case "front":
        return [H - v!, H + u!];
      case "rear":
        return [H + L + v!, H + u!];
      case "ceiling":
        return [H + L + H + (L - u!), H + v!];
    }
  }) as [number, number][];
  const [a, b] = pts as [[number, number], [number, number]];
  return { x: Math.min(a[0], b[0]), y: Math.min(a[1], b[1]), w: Math.abs(a[0] - b[0]), h: Math.abs(a[1] - b[1]) };
}

const SURFACE_TITLE: Record<SurfaceId, string> = { floor: "Floor plan", left: "Left wall", right: "Right wall", front: "Front wall", rear: "Rear wall", ceiling: "Ceiling" };
const SPEAKER_STYLE = [
  { colour: OKABE_ITO.blue, shape: "circle" },
  { colour: OKABE_ITO.vermillion, shape: "triangle" },
  { colour: OKABE_ITO.bluishGreen, shape: "square" },
  { colour: OKABE_ITO.reddishPurple, shape: "diamond" },
] as const;

function Mark({ x, y, shape, colour, r = 3.2 }: { x: number; y: number; shape: string; colour: string; r?: number }) {
  if (shape === "triangle") return <path d={`M${x},${y - r * 1.2} L${x + r * 1.1},${y + r * 0.8} L${x - r * 1.1},${y + r * 0.8} Z`} fill={colour} stroke={INK.raised} strokeWidth={0.6} />;
  if (shape === "square") return <rect x={x - r} y={y - r} width={2 * r} height={2 * r} fill={colour} stroke={INK.raised} strokeWidth={0.6} />;
  if (shape === "diamond") return <path d={`M${x},${y - r * 1.3} L${x + r * 1.3},${y} L${x},${y + r * 1.3} L${x - r * 1.3},${y} Z`} fill={colour} stroke={INK.raised} strokeWidth={0.6} />;
  return <circle cx={x} cy={y} r={r} fill={colour} stroke={INK.raised} strokeWidth={0.6} />;
}

export interface RoomNetProps {
  room: Dims;
  points: readonly SeatReflection[];
  zones: readonly Zone[];
  panels: readonly SuggestedPanelSet[];
  openings: readonly { surface: SurfaceId; uM: number; vM: number; widthM: number; heightM: number; label: string }[];
  speakers: readonly { id: string; xM: number; yM: number }[];
  seats: readonly { id: string; xM: number; yM: number; isMain: boolean }[];
  problemPanelIds: ReadonlySet<string>;
}

/** Reflection points, zones and the suggested panels on the unfolded room (SVG; a grey print still reads). */
export function RoomNet(props: RoomNetProps) {
  const [ref, width] = useElementWidth<HTMLDivElement>(900);
  const { room } = props;
  const sheetW = 2 * (room.lengthM + room.heightM);
  const sheetH = 2 * room.heightM + room.widthM;
  const pad = 14;
  const s = Math.max(20, (width - 2 * pad) / sheetW);
  const X = (m: number) => pad + m * s;
  const Y = (m: number) => pad + m * s;
  const R = (r: Rect) => ({ x: X(r.x), y: Y(r.y), width: r.w * s, height: r.h * s });
  const speakerIds = [...new Set(props.points.map((p) => p.speakerId))];
  const full = (id: SurfaceId) => {
    const ext = id === "front" || id === "rear" ? [room.widthM, room.heightM] : id === "left" || id === "right" ? [room.lengthM, room.heightM] : [room.lengthM, room.widthM];
    return netRect(room, id, 0, ext[0]!, 0, ext[1]!);
  };
  return (
    <div ref={ref} className="w-full">
      <svg width={width} height={sheetH * s + 2 * pad + 26} viewBox={`0 0 ${width} ${sheetH * s + 2 * pad + 26}`} role="img" aria-label={`Unfolded room with ${props.points.length} first reflection points, ${props.zones.length} zones and ${props.panels.reduce((n, p) => n + p.count, 0)} suggested panels`} className="block h-auto max-w-full font-sans" data-testid="room-net">
        <defs>
          <pattern id="net-opening" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1="0" y1="0" x2="0" y2="6" stroke={INK.faint} strokeWidth="1" />
          </pattern>
        </defs>
        {(["floor", "left", "right", "front", "rear", "ceiling"] as const).map((id) => {
          const r = R(full(id));
          return (
            <g key={id}>
              <rect {...r} fill={id === "floor" ? INK.sunk : INK.raised} stroke={INK.soft} strokeWidth={1} />
              <text x={r.x + 4} y={r.y + 12} fontSize={11} fill={INK.soft} fontWeight={600}>
                {SURFACE_TITLE[id]}
              </text>
            </g>
          );
        })}
        {props.openings.map((o, i) => {
          const r = R(netRect(room, o.surface, o.uM, o.uM + o.widthM, o.vM, o.vM + o.heightM));
          return (
            <g key={`o${i}`}>
              <rect {...r} fill="url(#net-opening)" stroke={INK.faint} strokeWidth={1} />
              <text x={r.x + r.width / 2} y={r.y + r.height / 2} fontSize={10} textAnchor="middle" fill={INK.soft}>
                {o.label || "opening"}
              </text>
            </g>
          );
        })}
        {props.zones.map((z, i) => (
          <rect key={`z${i}`} {...R(netRect(room, z.surface, z.uMinM, z.uMaxM, z.vMinM, z.vMaxM))} fill={INK.kiln} fillOpacity={0.1} stroke={INK.kiln} strokeWidth={1.2} strokeDasharray="5 3" />
        ))}
        {props.panels.flatMap((set) =>
          set.placements.map((p) => {
            const bad = props.problemPanelIds.has(p.id);
            return <rect key={p.id} {...R(netRect(room, p.surface, p.uM, p.uM + p.widthM, p.vM, p.vM + p.heightM))} fill={OKABE_ITO.bluishGreen} fillOpacity={0.18} stroke={bad ? OKABE_ITO.vermillion : OKABE_ITO.bluishGreen} strokeWidth={bad ? 2.2 : 1.2} strokeDasharray={bad ? "2 2" : undefined} data-panel={p.id} />;
          }),
        )}
        {props.points.map((p, i) => {
          const r = netRect(room, p.surface, p.u, p.u, p.v, p.v);
          const st = SPEAKER_STYLE[speakerIds.indexOf(p.speakerId) % SPEAKER_STYLE.length]!;
          return <Mark key={`p${i}`} x={X(r.x)} y={Y(r.y)} shape={st.shape} colour={st.colour} />;
        })}
        {props.speakers.map((sp, i) => {
          const r = netRect(room, "floor", sp.xM, sp.xM, sp.yM, sp.yM);
          const st = SPEAKER_STYLE[Math.max(0, speakerIds.indexOf(sp.id)) % SPEAKER_STYLE.length]!;
          return (
            <g key={`s${i}`}>
              <rect x={X(r.x) - 6} y={Y(r.y) - 6} width={12} height={12} fill={INK.ink} />
              <rect x={X(r.x) - 3} y={Y(r.y) - 3} width={6} height={6} fill={st.colour} />
            </g>
          );
        })}
        {props.seats.map((seat) => {
          const r = netRect(room, "floor", seat.xM, seat.xM, seat.yM, seat.yM);
          return <circle key={seat.id} cx={X(r.x)} cy={Y(r.y)} r={5} fill={seat.isMain ? INK.ink : INK.raised} stroke={INK.ink} strokeWidth={1.5} />;
        })}
        <g transform={`translate(${pad}, ${sheetH * s + pad + 16})`} fontSize={11} fill={INK.soft}>
          {speakerIds.map((id, i) => {
            const st = SPEAKER_STYLE[i % SPEAKER_STYLE.length]!;
            return (
              <g key={id} transform={`translate(${i * 190}, 0)`}>
                <Mark x={5} y={-4} shape={st.shape} colour={st.colour} />
                <text x={14} y={0}>
                  points from {id}
                </text>
              </g>
            );
          })}
          <g transform={`translate(${speakerIds.length * 190}, 0)`}>
            <rect x={0} y={-10} width={12} height={8} fill={INK.kiln} fillOpacity={0.1} stroke={INK.kiln} strokeDasharray="3 2" />
            <text x={16} y={0}>zone</text>
            <rect x={60} y={-10} width={12} height={8} fill={OKABE_ITO.bluishGreen} fillOpacity={0.18} stroke={OKABE_ITO.bluishGreen} />
            <text x={76} y={0}>suggested panel</text>
            <circle cx={186} cy={-5} r={4} fill={INK.ink} />
            <text x={194} y={0}>main seat</text>
            <rect x={256} y={-10} width={12} height={8} fill="url(#net-opening)" stroke={INK.faint} />
            <text x={272} y={0}>door / window</text>
          </g>
        </g>
      </svg>
    </div>
  );
}
