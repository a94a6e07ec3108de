import { Circle, G, Line, Path, Rect, Svg, Text } from "@react-pdf/renderer";
import type { BandBarsGeometry } from "@/lib/plots/band-bars-geometry";
import type { CartesianFrame } from "@/lib/plots/cartesian-frame";
import type { FrequencyResponseGeometry } from "@/lib/plots/frequency-response-geometry";
import type { ModeSpectrumGeometry } from "@/lib/plots/mode-spectrum-geometry";
import { markerPath } from "@/lib/plots/markers";
import { INK } from "@/lib/plots/palette";
import type { PlanGeometry } from "../plan";
import { SANS } from "./fonts";
import { C } from "./theme";

/** Width the plots take on the page, pt (their geometry is laid out at 620 px and scaled). */
export const PLOT_PT = 487;

const font = { fontFamily: SANS[0], fontSize: 10.5, fill: C.soft } as const;

/** A plot drawn at the report's plot width, scaled from the geometry's own pixel size. */
function PlotSvg({ g, children }: { g: { width: number; height: number }; children: React.ReactNode }) {
  return (
    <Svg width={PLOT_PT} height={(PLOT_PT * g.height) / g.width} viewBox={`0 0 ${g.width} ${g.height}`}>
      {children}
    </Svg>
  );
}

function Frame({ g, children }: { g: CartesianFrame; children: React.ReactNode }) {
  const { area, xAxis, yAxis, legend } = g;
  return (
    <G>
      <G transform={`translate(${area.x}, ${area.y})`}>
        {yAxis.ticks.map((t, i) => (
          <Line key={`gy${i}`} x1={0} x2={area.width} y1={t.pos} y2={t.pos} stroke={C.line} strokeWidth={0.7} />
        ))}
        {xAxis.ticks.map((t, i) => (
          <Line key={`gx${i}`} x1={t.pos} x2={t.pos} y1={0} y2={area.height} stroke={C.line} strokeWidth={t.major ? 0.7 : 0.35} />
        ))}
        {children}
        <Line x1={0} x2={area.width} y1={area.height} y2={area.height} stroke={C.ink} strokeWidth={0.9} />
        <Line x1={0} x2={0} y1={0} y2={area.height} stroke={C.ink} strokeWidth={0.9} />
        {xAxis.ticks.map((t, i) => (
          <G key={`tx${i}`}>
            <Line x1={t.pos} x2={t.pos} y1={area.height} y2={area.height + (t.major ? 5 : 3)} stroke={C.ink} strokeWidth={0.7} />
            {t.label ? (
              <Text x={t.pos} y={area.height + 17} textAnchor="middle" style={font}>
                {t.label}
              </Text>
            ) : null}
          </G>
        ))}
        {yAxis.ticks.map((t, i) => (
          <G key={`ty${i}`}>
            <Line x1={-5} x2={0} y1={t.pos} y2={t.pos} stroke={C.ink} strokeWidth={0.7} />
            <Text x={-8} y={t.pos + 3.6} textAnchor="end" style={font}>
              {t.label}
            </Text>
          </G>
        ))}
        <Text x={area.width / 2} y={area.height + 33} textAnchor="middle" style={{ ...font, fill: C.ink }}>
          {xAxis.title}
        </Text>
      </G>
      <Text x={0} y={0} transform={`translate(11, ${area.y + area.height / 2}) rotate(-90)`} textAnchor="middle" style={{ ...font, fill: C.ink }}>
        {yAxis.title}
      </Text>
      <G transform={`translate(${legend.x}, ${legend.y})`}>
        {legend.items.map((it, i) => (
          <G key={`lg${i}`} transform={`translate(${it.x}, ${it.y})`}>
            {it.kind === "box" ? (
              <Rect x={0} y={-5} width={26} height={10} fill={it.colour} fillOpacity={it.fillOpacity ?? 1} stroke={it.colour} strokeWidth={0.8} strokeDasharray={it.dash || undefined} />
            ) : it.kind === "marker" && it.marker ? (
              <Path d={markerPath(it.marker, 8)} transform="translate(13, 0)" fill={it.marker === "cross" || it.marker === "plus" ? "none" : it.colour} stroke={it.colour} strokeWidth={1.2} />
            ) : (
              <Line x1={0} x2={26} y1={0} y2={0} stroke={it.colour} strokeWidth={2} strokeDasharray={it.dash || undefined} />
            )}
            <Text x={32} y={3.8} style={{ ...font, fill: C.ink }}>
              {it.label}
            </Text>
          </G>
        ))}
      </G>
    </G>
  );
}

/** A frequency-response plot (modal response, α curve) from lib/plots geometry. */
export function ResponsePlot({ g }: { g: FrequencyResponseGeometry }) {
  return (
    <PlotSvg g={g}>
      <Frame g={g}>
        {g.band ? (
          <G>
            <Rect x={g.band.x0} y={0} width={g.band.x1 - g.band.x0} height={g.area.height} fill={C.tint} />
            <Text x={g.band.labelX} y={g.band.labelY} style={{ ...font, fontSize: 9.5 }}>
              {g.band.label}
            </Text>
          </G>
        ) : null}
        {g.markerLines.map((m, i) => (
          <G key={`m${i}`}>
            <Line x1={m.x} x2={m.x} y1={0} y2={g.area.height} stroke={C.accent} strokeWidth={1} strokeDasharray="3 2" />
            <Text x={m.labelX} y={m.labelY} textAnchor={m.anchor} style={{ ...font, fill: C.accent, fontSize: 9.5 }}>
              {m.label}
            </Text>
          </G>
        ))}
        {g.series.map((se, i) => (
          <G key={`s${i}`}>
            <Path d={se.path} stroke={se.style.colour} strokeWidth={1.7} fill="none" strokeDasharray={se.style.dash || undefined} />
            {se.markers.map((mk, k) => (
              <Path key={k} d={mk.path} transform={`translate(${mk.x}, ${mk.y})`} fill={mk.hollow ? "#ffffff" : mk.colour} stroke={mk.colour} strokeWidth={1} />
            ))}
          </G>
        ))}
      </Frame>
    </PlotSvg>
  );
}

/** RT60 per band: bars for each scenario, the shaded target and verdict shapes. */
export function BandBarsPlot({ g }: { g: BandBarsGeometry }) {
  return (
    <PlotSvg g={g}>
      <Frame g={g}>
        {g.targetArea ? <Path d={g.targetArea} fill={INK.kiln} fillOpacity={0.16} stroke="none" /> : null}
        {g.targetLine ? <Path d={g.targetLine} stroke={C.accent} strokeWidth={1} strokeDasharray="4 3" fill="none" /> : null}
        {g.bars.map((b, i) => (
          <G key={`b${i}`}>
            <Rect x={b.x} y={b.y} width={b.width} height={b.height} fill={g.styles[b.scenario]!.colour} fillOpacity={0.35} stroke={g.styles[b.scenario]!.colour} strokeWidth={0.8} />
            {b.hatch ? <Path d={b.hatch} stroke={g.styles[b.scenario]!.colour} strokeWidth={0.7} fill="none" /> : null}
          </G>
        ))}
        {g.steps.map((st, i) => (
          <Path key={`st${i}`} d={st.path} stroke={g.styles[st.scenario]!.colour} strokeWidth={1.6} fill="none" />
        ))}
        {g.verdictMarkers.map((mk, i) => (
          <Path key={`v${i}`} d={mk.path} transform={`translate(${mk.x}, ${mk.y})`} fill={mk.shape === "cross" ? "none" : mk.colour} stroke={mk.colour} strokeWidth={1.2} />
        ))}
      </Frame>
    </PlotSvg>
  );
}

/** Mode spectrum: three lanes of stems (axial, tangential, oblique). */
export function ModeSpectrumPlot({ g }: { g: ModeSpectrumGeometry }) {
  return (
    <PlotSvg g={g}>
      <G>
        <G transform={`translate(${g.area.x}, ${g.area.y})`}>
          {g.xAxis.ticks.map((t, i) => (
            <Line key={`gx${i}`} x1={t.pos} x2={t.pos} y1={0} y2={g.area.height} stroke={C.line} strokeWidth={t.major ? 0.7 : 0.35} />
          ))}
          {g.lanes.map((l, i) => (
            <G key={`l${i}`}>
              {i > 0 ? <Line x1={0} x2={g.area.width} y1={l.y0} y2={l.y0} stroke={C.line} strokeWidth={0.7} /> : null}
              <Text x={-8} y={(l.y0 + l.y1) / 2 + 3.6} textAnchor="end" style={font}>
                {l.label}
              </Text>
            </G>
          ))}
          {g.stems.map((st, i) => {
            const lane = g.lanes.find((l) => l.kind === st.kind)!;
            return (
              <G key={`st${i}`}>
                {st.bar ? <Rect x={st.bar.x0} y={st.bar.y} width={Math.max(0.5, st.bar.x1 - st.bar.x0)} height={st.bar.height} fill={lane.style.colour} fillOpacity={0.18} /> : null}
                <Line x1={st.x} x2={st.x} y1={st.yTop} y2={st.yBottom} stroke={lane.style.colour} strokeWidth={1.3} strokeDasharray={lane.style.dash || undefined} />
                <Path d={lane.markerPath} transform={`translate(${st.x}, ${st.yTop})`} fill={lane.style.colour} stroke={lane.style.colour} strokeWidth={0.8} />
              </G>
            );
          })}
          {g.markerLines.map((m, i) => (
            <G key={`m${i}`}>
              <Line x1={m.x} x2={m.x} y1={0} y2={g.area.height} stroke={C.accent} strokeWidth={1} strokeDasharray="3 2" />
              <Text x={m.labelX} y={m.labelY} textAnchor={m.anchor} style={{ ...font, fill: C.accent, fontSize: 9.5 }}>
                {m.label}
              </Text>
            </G>
          ))}
          <Line x1={0} x2={g.area.width} y1={g.area.height} y2={g.area.height} stroke={C.ink} strokeWidth={0.9} />
          {g.xAxis.ticks.map((t, i) => (
            <G key={`tx${i}`}>
              <Line x1={t.pos} x2={t.pos} y1={g.area.height} y2={g.area.height + (t.major ? 5 : 3)} stroke={C.ink} strokeWidth={0.7} />
              {t.label ? (
                <Text x={t.pos} y={g.area.height + 17} textAnchor="middle" style={font}>
                  {t.label}
                </Text>
              ) : null}
            </G>
          ))}
          <Text x={g.area.width / 2} y={g.area.height + 33} textAnchor="middle" style={{ ...font, fill: C.ink }}>
            {g.xAxis.title}
          </Text>
        </G>
      </G>
    </PlotSvg>
  );
}

/** The plan of the room with seats, sources and treatment. */
export function PlanDrawing({ g }: { g: PlanGeometry }) {
  const lab = { fontFamily: SANS[0], fontSize: 7, fill: C.soft } as const;
  return (
    <Svg width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`}>
      <Rect x={g.room.x} y={g.room.y} width={g.room.width} height={g.room.height} fill={C.tint} stroke={C.ink} strokeWidth={1.6} />
      {g.items
        .filter((i) => i.kind === "floor" || i.kind === "ceiling" || i.kind === "edge")
        .map((i, k) => (
          <Path key={`a${k}`} d={i.path} fill={C.accentSoft} fillOpacity={0.5} stroke={C.accent} strokeWidth={0.8} strokeDasharray={i.kind === "floor" ? undefined : "3 2"} />
        ))}
      {g.items
        .filter((i) => i.kind === "wall" || i.kind === "corner")
        .map((i, k) => (
          <Path key={`w${k}`} d={i.path} fill={C.accent} stroke={C.accent} strokeWidth={0.6} />
        ))}
      {g.items.map((i, k) => (
        <Text key={`il${k}`} x={i.labelX} y={i.labelY} textAnchor="middle" style={{ ...lab, fill: C.accent, fontSize: 7.5 }}>
          {i.label}
        </Text>
      ))}
      {g.sources.map((src, k) =>
        src.kind === "subwoofer" ? (
          <G key={`src${k}`}>
            <Rect x={src.x - 5} y={src.y - 5} width={10} height={10} fill={C.ink} />
            <Text x={src.x} y={src.y + 13} textAnchor="middle" style={lab}>
              {src.label}
            </Text>
          </G>
        ) : (
          <G key={`src${k}`}>
            <Path d={`M${src.x},${src.y + 5.5}L${src.x - 5.5},${src.y - 4}L${src.x + 5.5},${src.y - 4}Z`} fill={C.ink} />
            <Text x={src.x} y={src.y + 14} textAnchor="middle" style={lab}>
              {src.label}
            </Text>
          </G>
        ),
      )}
      {g.seats.map((seat, k) => (
        <G key={`seat${k}`}>
          <Circle cx={seat.x} cy={seat.y} r={4.2} fill={seat.isMain ? C.ink : "#ffffff"} stroke={C.ink} strokeWidth={1.1} />
          <Text x={seat.x} y={seat.y + 12} textAnchor="middle" style={lab}>
            {seat.label}
          </Text>
        </G>
      ))}
      <Text x={g.frontLabel.x} y={g.frontLabel.y} textAnchor="middle" style={{ ...lab, fontSize: 7.5, fill: C.ink }}>
        {g.frontLabel.text}
      </Text>
      <Text x={g.widthLabel.x} y={g.widthLabel.y} textAnchor="middle" style={{ ...lab, fontSize: 8, fill: C.ink }}>
        {g.widthLabel.text}
      </Text>
      <Text x={0} y={0} transform={`translate(${g.lengthLabel.x}, ${g.lengthLabel.y}) rotate(-90)`} textAnchor="middle" style={{ ...lab, fontSize: 8, fill: C.ink }}>
        {g.lengthLabel.text}
      </Text>
    </Svg>
  );
}
