import { formatValue } from "@/lib/plots";
import { AbsorptionPlot, BandBarsPlot, FrequencyResponsePlot, Heatmap, ModeSpectrumPlot, PlanMarker } from "@/components/plots";
import { SAMPLE_SEATS, SAMPLE_SUBWOOFER, type sampleData } from "./sample-data";

/** Every plot with the sample room's data: the gallery page and the static preview render this. */
export function PlotGallery({ data, fallbackWidth }: { data: ReturnType<typeof sampleData>; fallbackWidth?: number }) {
  const d = data;
  const fs = Math.round(d.schroederHz);
  return (
    <div className="grid gap-6">
      <FrequencyResponsePlot fallbackWidth={fallbackWidth}
        title="Modal response at the seats"
        units="dB, relative to the mean of all seats"
        series={d.responses}
        domainHz={[15, 300]}
        shadedBand={{ fromHz: 15, toHz: d.schroederHz, label: "below Schroeder frequency" }}
        markers={[{ value: d.schroederHz, label: `Schroeder ${fs} Hz` }]}
        caption={`Subwoofer near the front-left corner; modal sum with T60 = ${formatValue(d.rt60Seconds, 2)} s. Above about ${fs}\u00a0Hz modes overlap and the room is better described by its decay.`}
      />
      <ModeSpectrumPlot fallbackWidth={fallbackWidth}
        title="Room modes up to 200 Hz"
        modes={d.modes}
        bandwidthHz={d.bandwidthHz}
        domainHz={[20, 200]}
        markers={[{ value: d.schroederHz, label: `Schroeder ${fs} Hz` }]}
        units={`${d.modes.length} modes; bars show each mode's half-power bandwidth (${formatValue(d.bandwidthHz, 1)} Hz)`}
        caption="Bunched stems mean several modes reinforce one another; wide gaps between axial modes are heard as uneven bass."
      />
      <ModeSpectrumPlot fallbackWidth={fallbackWidth} title="Room modes up to 200 Hz, linear axis" modes={d.modes} scale="linear" domainHz={[0, 200]} />
      <BandBarsPlot fallbackWidth={fallbackWidth}
        title="Reverberation time per octave band"
        bandsHz={d.bandsHz}
        scenarios={d.bandScenarios}
        target={d.bandTarget}
        units="RT60 in s, Eyring, 20 °C and 50 % RH"
        caption={`Shaded: the small-room target band 0.2–0.4\u00a0s. Shapes mark each band: circle within, triangle near (within 0.05\u00a0s), cross outside.`}
      />
      <BandBarsPlot fallbackWidth={fallbackWidth} title="Reverberation time per octave band, stepped" bandsHz={d.bandsHz} scenarios={d.bandScenarios} target={d.bandTarget} mode="steps" units="RT60 in s" />
      <AbsorptionPlot fallbackWidth={fallbackWidth}
        title="Absorption of three builds"
        builds={d.absorption}
        units="random incidence, third-octave bands"
        caption="Hollow markers and dotted lines: the porous layer is outside its model's fitted range there, so treat those values as rough."
      />
      <Heatmap fallbackWidth={fallbackWidth}
        title="Bass evenness over the floor"
        lengthM={d.room.lengthM}
        widthM={d.room.widthM}
        xM={d.map.xM}
        yM={d.map.yM}
        values={d.map.values}
        valueTitle="Standard deviation 20–120 Hz"
        valueUnit="dB"
        units="at ear height 1.1 m; lower is more even"
        caption="Seen from above, front wall on the left. Rings: seats; filled square: subwoofer."
      >
        {SAMPLE_SEATS.map((s, i) => (
          <PlanMarker key={s.label} kind="seat" xM={s.position[0]} yM={s.position[1]} label={`S${i + 1}`} />
        ))}
        <PlanMarker kind="subwoofer" xM={SAMPLE_SUBWOOFER[0]} yM={SAMPLE_SUBWOOFER[1]} label="Sub" />
      </Heatmap>
    </div>
  );
}
