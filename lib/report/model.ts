import type { ItemResult, ScenarioResults } from "@/lib/analysis";
import { absorptionSpectrum, porousMaterial, rateLayers } from "@/lib/porous";
import { bandBarsGeometry, type BandBarsGeometry } from "@/lib/plots/band-bars-geometry";
import { frequencyResponseGeometry, type FrequencyResponseGeometry } from "@/lib/plots/frequency-response-geometry";
import { modeSpectrumGeometry, type ModeSpectrumGeometry } from "@/lib/plots/mode-spectrum-geometry";
import { airDensity, bandSet, compareToTarget, speedOfSound, type BandComparison } from "@/lib/reverb";
import { SURFACE_LABEL, type ItemSpec, type Placement, type SurfaceFinish } from "@/lib/schemas/workspace";
import { FINISHES } from "@/lib/reverb";
import { bandLabel, fixed, longDate, longDateTime, money, signed, withUnit } from "./format";
import { planGeometry, type PlanGeometry } from "./plan";
import type { ReportInput, ReportScenarioInput } from "./types";
import { CAUTIONS, DISCLAIMER, METHODS } from "./texts";

/** A table: header cells and rows of text cells; `numeric` marks right-aligned columns. */
export interface ReportTable {
  columns: string[];
  numeric: boolean[];
  rows: string[][];
}

export interface BuildSheetEntry {
  /** the item numbers (1-based) that share this build */
  index: number;
  indices: number[];
  title: string;
  name: string;
  description: string;
  rating: { alphaW: string; absorptionClass: string; nrc: string; saa: string; indicators: string } | null;
  alphaPlot: FrequencyResponseGeometry | null;
  absorption: ReportTable;
  limits: string[];
}

/** The report, shaped for the PDF: text and figures already formatted, plots as geometry. */
export interface ReportModel {
  paperSize: ReportInput["paperSize"];
  draft: boolean;
  title: string;
  number: string;
  revisionLabel: string;
  dateLabel: string;
  firmName: string;
  footer: string;
  cover: [string, string][];
  summary: { intro: string; problems: string[]; recommendation: string[]; note: string | null };
  room: { facts: ReportTable; surfaces: ReportTable; positions: ReportTable; plan: PlanGeometry; planLegend: string };
  photos: NonNullable<ReportInput["photos"]>;
  lowFrequency: {
    facts: [string, string][];
    verdicts: string[];
    spectrum: ModeSpectrumGeometry;
    modes: ReportTable;
    responses: { seatName: string; geometry: FrequencyResponseGeometry; caption: string }[];
    seats: ReportTable;
    notes: string[];
  } | null;
  decay: { plot: BandBarsGeometry; table: ReportTable; verdictLine: string; notes: string[] } | null;
  scenarios: ReportTable;
  treatment: { items: ReportTable; builds: BuildSheetEntry[]; empty: boolean };
  costs: { table: ReportTable; total: string; currencyNote: string };
  cautions: { general: { title: string; text: string }[]; specific: string[] };
  disclaimer: string;
  methods: { title: string; text: string }[];
  engineVersion: string;
  signature: { signerName: string; dateLabel: string; subject: string; fingerprint: string; verifyUrl: string; statement: string } | null;
  /** the key figures, by name, exactly as printed (tests compare them with the screens) */
  figures: Record<string, string>;
}

const PLOT_WIDTH = 620;

const KIND_LABEL: Record<ItemSpec["kind"], string> = {
  "porous-panel": "porous panel",
  "corner-trap": "corner trap",
  membrane: "membrane absorber",
  perforated: "perforated-panel absorber",
};

function finishLabel(f: SurfaceFinish): string {
  if (f.kind === "custom") return f.description ? `custom α (${f.description})` : "custom α per band";
  return FINISHES.find((x) => x.id === f.finishId)?.name ?? f.finishId;
}

function placementLabel(p: Placement): string {
  if (p.kind === "corner") return `${p.corner.replace("-", " ")} corner`;
  return `${SURFACE_LABEL[p.surface].split(" (")[0]} at u ${fixed(p.uM, 2)} m, v ${fixed(p.vM, 2)} m`;
}

function describeSpec(spec: ItemSpec): string {
  switch (spec.kind) {
    case "porous-panel": {
      const layers = spec.layers
        .map((l) => (l.kind === "porous" ? `${fixed(l.thicknessM * 1000, 0)} mm porous, σ ${fixed(l.flowResistivity, 0)} Pa·s/m² (${l.model === "miki" ? "Miki" : "Delany–Bazley"})` : l.kind === "air" ? `${fixed(l.thicknessM * 1000, 0)} mm air gap` : `facing ${fixed(l.flowResistance, 0)} Pa·s/m`))
        .join(" + ");
      return `${fixed(spec.widthM, 2)} × ${fixed(spec.heightM, 2)} m face; ${layers}; rigid wall behind`;
    }
    case "corner-trap":
      return `${spec.orientation === "floor-to-ceiling" ? "floor-to-ceiling" : "wall–ceiling"} corner trap, ${fixed(spec.depthM * 1000, 0)} mm deep, ${fixed(spec.lengthM, 2)} m long, fill σ ${fixed(spec.flowResistivity, 0)} Pa·s/m²`;
    case "membrane":
      return `${fixed(spec.widthM, 2)} × ${fixed(spec.heightM, 2)} m membrane, ${fixed(spec.massKgM2, 1)} kg/m² over a ${fixed(spec.cavityDepthM * 1000, 0)} mm cavity`;
    case "perforated":
      return `${fixed(spec.widthM, 2)} × ${fixed(spec.heightM, 2)} m perforated panel, ${fixed(spec.openAreaRatio * 100, 1)} % open, ${fixed(spec.holeDiameterM * 1000, 1)} mm holes in ${fixed(spec.plateThicknessM * 1000, 1)} mm plate, ${fixed(spec.cavityDepthM * 1000, 0)} mm cavity`;
  }
}

/** Peak and dip of a level curve inside a band, relative to its mean there, dB. */
export function peakAndDip(frequenciesHz: readonly number[], levelsDb: readonly number[], lowHz: number, highHz: number): { peakHz: number; peakDb: number; dipHz: number; dipDb: number } | undefined {
  const idx = frequenciesHz.map((f, i) => (f >= lowHz && f <= highHz && Number.isFinite(levelsDb[i]!) && levelsDb[i]! > -200 ? i : -1)).filter((i) => i >= 0);
  if (idx.length < 3) return undefined;
  const mean = idx.reduce((s, i) => s + levelsDb[i]!, 0) / idx.length;
  let peak = idx[0]!, dip = idx[0]!;
  for (const i of idx) {
    if (levelsDb[i]! > levelsDb[peak]!) peak = i;
    if (levelsDb[i]! < levelsDb[dip]!) dip = i;
  }
  return { peakHz: frequenciesHz[peak]!, peakDb: levelsDb[peak]! - mean, dipHz: frequenciesHz[dip]!, dipDb: levelsDb[dip]! - mean };
}

/** First letter capitalised, full stop at the end. */
const sentence = (t: string) => {
  const u = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?)]$/.test(u) ? u : `${u}.`;
};

const roundHz = (f: number) => (f < 100 ? Math.round(f) : Math.round(f / 5) * 5);

/** Verdicts of the untreated room against the recommended scenario's target bands (lib/reverb compareToTarget). */
function beforeComparison(rec: ScenarioResults): BandComparison[] | undefined {
  if (!rec.reverb) return undefined;
  const bands = rec.reverb.comparison.map((c, i) => ({ frequencyHz: rec.reverb!.bandsHz[i]!, targetS: c.targetS, lowerS: c.lowerS, upperS: c.upperS }));
  return compareToTarget(rec.reverb.untreated.eyringS, bands);
}

function mainSeats(results: ScenarioResults): string[] {
  const lf = results.lowFrequency;
  if (!lf || lf.seats.length === 0) return [];
  const main = lf.seats.find((s) => s.isMain) ?? lf.seats[0]!;
  const worst = [...lf.seats].sort((a, b) => b.spreadDb - a.spreadDb)[0]!;
  return worst.id === main.id ? [main.id] : [main.id, worst.id];
}

function alphaCurve(spec: ItemSpec, temperatureC: number): { plot: FrequencyResponseGeometry; rating: BuildSheetEntry["rating"] } | null {
  if (spec.kind !== "porous-panel") return null;
  const air = { densityKgM3: airDensity(temperatureC), speedOfSound: speedOfSound(temperatureC) };
  const { nominalHz, exactHz } = bandSet("third-octave");
  const keep = nominalHz.map((f, i) => (f >= 50 && f <= 5000 ? i : -1)).filter((i) => i >= 0);
  const spectrum = absorptionSpectrum(spec.layers, { frequenciesHz: keep.map((i) => exactHz[i]!), incidence: "random", air });
  const rating = rateLayers(spec.layers, air);
  const plot = frequencyResponseGeometry(
    {
      series: [{ label: "Random incidence", frequenciesHz: spectrum.map((p) => p.frequencyHz), levelsDb: spectrum.map((p) => p.alpha) }],
      domainHz: [50, 5000],
      levelDomainDb: [0, 1.2],
      yTitle: "Absorption coefficient",
    },
    { width: PLOT_WIDTH, areaHeight: 120 },
  );
  return {
    plot,
    rating: {
      alphaW: fixed(rating.iso11654.alphaW, 2),
      absorptionClass: rating.iso11654.absorptionClass,
      indicators: rating.iso11654.indicators,
      nrc: fixed(rating.nrc, 2),
      saa: fixed(rating.saa, 2),
    },
  };
}

function itemTable(s: ReportScenarioInput): ReportTable {
  return {
    columns: ["No.", "Item", "Kind", "Count", "Where"],
    numeric: [true, false, false, true, false],
    rows: s.analysis.items.map((item, i) => [
      String(i + 1),
      item.name,
      KIND_LABEL[item.spec.kind],
      String(item.count),
      item.placements.length === 0 ? "to be placed" : [...new Set(item.placements.map(placementLabel))].slice(0, 3).join("; ") + (item.placements.length > 3 ? `; +${item.placements.length - 3} more` : ""),
    ]),
  };
}

/**
 * Shapes the report from its inputs: every figure is taken from the lib/analysis results of the
 * scenarios (the same results the screens show) and formatted once here; plots are lib/plots geometry.
 * Pure: the same input gives the same model.
 */
export function buildReportModel(input: ReportInput): ReportModel {
  if (input.scenarios.length === 0) throw new RangeError("scenarios must hold at least one scenario (the last is the recommendation)");
  const rec = input.scenarios[input.scenarios.length - 1]!;
  const R = rec.results;
  const B = input.before.results;
  const room = input.room;
  const figures: Record<string, string> = {};
  const fig = (k: string, v: string) => ((figures[k] = v), v);

  const volume = fig("room.volume", withUnit(R.room.volumeM3, 1, "m³"));
  const dims = `${fixed(room.lengthM, 2)} × ${fixed(room.widthM, 2)} × ${fixed(room.heightM, 2)} m`;
  fig("room.dimensions", dims);

  // ---- summary in plain words
  const problems: string[] = [];
  const recommendation: string[] = [];
  const before = beforeComparison(R);
  if (R.reverb && before) {
    const worst = before.reduce((w, b, i) => (Math.abs(b.excessS) > Math.abs(before[w]!.excessS) ? i : w), 0);
    const wb = before[worst]!;
    const f = R.reverb.bandsHz[worst]!;
    const outside = before.filter((b) => b.verdict !== "within").length;
    if (outside > 0) {
      problems.push(
        `Sound lingers ${wb.excessS > 0 ? "too long" : "too briefly"} in ${outside} of ${before.length} frequency bands. The worst is around ${bandLabel(f)}: ${withUnit(wb.predictedS, 2, "s")} where this room should be between ${fixed(wb.lowerS, 2)} and ${withUnit(wb.upperS, 2, "s")}.`,
      );
    } else problems.push(`The decay of sound is already within the target in every band (${fixed(before[0]!.lowerS, 2)}–${withUnit(before[0]!.upperS, 2, "s")}).`);
    fig("summary.worstBand", bandLabel(f));
    fig("summary.worstBefore", withUnit(wb.predictedS, 2, "s"));
    fig("summary.worstAfter", withUnit(R.reverb.treated.eyringS[worst]!, 2, "s"));
    const within = R.reverb.comparison.filter((c) => c.verdict === "within").length;
    fig("summary.bandsWithin", `${within} of ${R.reverb.comparison.length}`);
    recommendation.push(
      `With it, ${within} of ${R.reverb.comparison.length} bands fall within the target; at ${bandLabel(f)} the time goes from ${withUnit(wb.predictedS, 2, "s")} to ${withUnit(R.reverb.treated.eyringS[worst]!, 2, "s")}.`,
    );
  }
  const seatIds = mainSeats(R);
  const mainId = seatIds[0];
  const bSeat = B.lowFrequency?.seats.find((s) => s.id === mainId);
  const rSeat = R.lowFrequency?.seats.find((s) => s.id === mainId);
  if (bSeat && B.lowFrequency) {
    const band = B.lowFrequency.spreadBandHz;
    const pd = peakAndDip(B.lowFrequency.frequenciesHz, bSeat.levelsDb, band.lowHz, band.highHz);
    if (pd) {
      problems.push(
        `At the main seat (${bSeat.name}) the bass swells around ${roundHz(pd.peakHz)} Hz, about ${withUnit(pd.peakDb, 1, "dB")} above its average, and thins out near ${roundHz(pd.dipHz)} Hz (${withUnit(pd.dipDb, 1, "dB")}).`,
      );
      fig("summary.peakHz", `${roundHz(pd.peakHz)} Hz`);
    }
    fig("lf.spreadBefore", withUnit(bSeat.spreadDb, 1, "dB"));
    if (rSeat) {
      fig("lf.spreadAfter", withUnit(rSeat.spreadDb, 1, "dB"));
      recommendation.push(
        `The unevenness of the bass at ${bSeat.name} (how far the level strays from its average between ${band.lowHz} and ${band.highHz} Hz) goes from ${withUnit(bSeat.spreadDb, 1, "dB")} to ${withUnit(rSeat.spreadDb, 1, "dB")}.`,
      );
    }
  }
  if (R.modes.schroederHz !== null) {
    fig("lf.schroeder", withUnit(R.modes.schroederHz, 0, "Hz"));
    problems.push(`Below about ${withUnit(Math.round(R.modes.schroederHz), 0, "Hz")} the room behaves as a set of resonances rather than an even space, so the bass differs from seat to seat.`);
  }
  const itemWords = rec.analysis.items.map((i) => `${i.count} × ${i.name}`).join(", ");
  recommendation.unshift(
    rec.analysis.items.length === 0
      ? `We recommend keeping the room as it is (“${rec.name}”).`
      : `We recommend “${rec.name}”: ${itemWords}. The materials cost about ${money(R.items.cost)}.`,
  );
  fig("costs.total", money(R.items.cost));
  const intro = `This report looks at how ${room.name} (${dims}, ${volume}) sounds today and what the recommended treatment changes. The figures come from a calculation of the room as described on ${longDate(input.issuedAt)}; a measurement after the work confirms them.`;

  // ---- room
  const facts: ReportTable = {
    columns: ["Quantity", "Value"],
    numeric: [false, true],
    rows: [
      ["Length × width × height", dims],
      ["Volume", volume],
      ["Surface area", fig("room.area", withUnit(R.room.surfaceAreaM2, 1, "m²"))],
      ["Air", `${fixed(room.temperatureC, 1)} °C, ${fixed(room.humidityPct, 0)} % RH`],
      ["Speed of sound", fig("room.c", withUnit(R.room.speedOfSound, 1, "m/s"))],
    ],
  };
  const surfaces: ReportTable = {
    columns: ["Surface", "Finish", "Openings"],
    numeric: [false, false, false],
    rows: room.surfaces.map((s) => [
      SURFACE_LABEL[s.surface],
      finishLabel(s.finish),
      s.openings.length === 0 ? "—" : s.openings.map((o) => `${o.label || o.kind} ${fixed(o.widthM, 2)} × ${fixed(o.heightM, 2)} m`).join("; "),
    ]),
  };
  const positions: ReportTable = {
    columns: ["Plan", "Position", "Kind", "x (m)", "y (m)", "z (m)", "Notes"],
    numeric: [false, false, false, true, true, true, false],
    rows: [
      ...room.seats.map((s, i) => [`S${i + 1}`, s.name, s.isMain ? "seat (main)" : "seat", fixed(s.xM, 2), fixed(s.yM, 2), fixed(s.zM, 2), ""]),
      ...room.sources.map((s, i) => [
        `${s.kind === "subwoofer" ? "W" : "M"}${room.sources.slice(0, i + 1).filter((x) => x.kind === s.kind).length}`,
        s.name,
        s.kind === "subwoofer" ? "subwoofer" : "main speaker",
        fixed(s.xM, 2),
        fixed(s.yM, 2),
        fixed(s.zM, 2),
        [s.delayMs ? `delay ${fixed(s.delayMs, 1)} ms` : "", s.polarity === -1 ? "polarity inverted" : "", s.drivesBass ? "plays the bass" : ""].filter(Boolean).join(", "),
      ]),
    ],
  };
  const plan = planGeometry(room, rec.analysis.items, 400, 300);

  // ---- low frequency
  let lowFrequency: ReportModel["lowFrequency"] = null;
  {
    const m = R.modes;
    const spectrum = modeSpectrumGeometry(
      {
        modes: m.table.filter((x) => x.frequencyHz <= m.maxFrequencyHz),
        domainHz: [20, m.maxFrequencyHz],
        bandwidthHz: m.bandwidthHz,
        markers: m.schroederHz !== null && m.schroederHz <= m.maxFrequencyHz ? [{ value: m.schroederHz, label: `Schroeder ${Math.round(m.schroederHz)} Hz` }] : [],
      },
      { width: PLOT_WIDTH },
    );
    const modeRows = m.table.filter((x) => x.frequencyHz <= 120).slice(0, 24);
    fig("lf.firstMode", withUnit(m.table[0]?.frequencyHz ?? null, 1, "Hz"));
    fig("lf.modesTotal", String(m.counts.total));
    const responses: NonNullable<ReportModel["lowFrequency"]>["responses"] = [];
    for (const id of seatIds) {
      const b = B.lowFrequency?.seats.find((s) => s.id === id);
      const a = R.lowFrequency?.seats.find((s) => s.id === id);
      if (!b || !a || !B.lowFrequency || !R.lowFrequency) continue;
      const geometry = frequencyResponseGeometry(
        {
          series: [
            { label: `Before (${input.before.name})`, frequenciesHz: B.lowFrequency.frequenciesHz, levelsDb: b.levelsDb },
            { label: `After (${rec.name})`, frequenciesHz: R.lowFrequency.frequenciesHz, levelsDb: a.levelsDb },
          ],
          domainHz: [15, 250],
          shadedBand: m.schroederHz !== null ? { fromHz: m.schroederHz, toHz: 250, label: "above Schroeder" } : undefined,
          yTitle: "Level (dB, relative)",
        },
        { width: PLOT_WIDTH, areaHeight: 150 },
      );
      responses.push({ seatName: a.name, geometry, caption: `Modal response at ${a.name}: spread ${withUnit(b.spreadDb, 1, "dB")} before, ${withUnit(a.spreadDb, 1, "dB")} after (${R.lowFrequency.spreadBandHz.lowHz}–${R.lowFrequency.spreadBandHz.highHz} Hz).` });
    }
    const seats: ReportTable = {
      columns: ["Seat", `Spread before (dB)`, `Spread after (dB)`, "Change (dB)"],
      numeric: [false, true, true, true],
      rows: (R.lowFrequency?.seats ?? []).map((a) => {
        const b = B.lowFrequency?.seats.find((s) => s.id === a.id);
        return [a.isMain ? `${a.name} (main)` : a.name, fixed(b?.spreadDb ?? null, 1), fixed(a.spreadDb, 1), b ? signed(a.spreadDb - b.spreadDb, 1) : "—"];
      }),
    };
    lowFrequency = {
      facts: [
        ["Lowest mode", figures["lf.firstMode"]!],
        ["Modes up to " + m.maxFrequencyHz + " Hz", `${m.counts.total} (${m.counts.axial} axial, ${m.counts.tangential} tangential, ${m.counts.oblique} oblique)`],
        ["Schroeder frequency", m.schroederHz === null ? "—" : withUnit(m.schroederHz, 0, "Hz")],
        ["Modal bandwidth", withUnit(m.bandwidthHz, 1, "Hz")],
        ["RT60 used in the modal sum", R.lowFrequency ? `${withUnit(R.lowFrequency.effectiveRt60S, 2, "s")} after, ${withUnit(B.lowFrequency?.effectiveRt60S ?? null, 2, "s")} before` : "—"],
      ],
      verdicts: [
        `${m.table.filter((x) => x.coincident).length} of ${m.counts.total} modes up to ${m.maxFrequencyHz} Hz lie within one modal bandwidth (${withUnit(m.bandwidthHz, 1, "Hz")}) of a neighbour and add up to stronger peaks; ${m.table.filter((x) => x.wideGapBelow).length} leave a wide gap below them.`,
        `Spacing (Bonello): ${m.bonello.verdict}`,
        `Proportions: ${m.ratio.verdict}`,
      ],
      spectrum,
      modes: {
        columns: ["Mode (nx, ny, nz)", "Kind", "Frequency (Hz)", "Flag"],
        numeric: [false, false, true, false],
        rows: modeRows.map((x) => [`${x.nx}, ${x.ny}, ${x.nz}`, x.kind, fixed(x.frequencyHz, 1), [x.coincident ? "coincides" : "", x.wideGapBelow ? "wide gap below" : ""].filter(Boolean).join(", ") || "—"]),
      },
      responses,
      seats,
      notes: [R.lowFrequency?.note ?? "", ...R.notes.filter((n) => /seat|modal|source/i.test(n))].filter(Boolean).map(sentence),
    };
  }

  // ---- decay
  let decay: ReportModel["decay"] = null;
  if (R.reverb && before) {
    const rv = R.reverb;
    rv.bandsHz.forEach((f, i) => {
      fig(`rt.before.${f}`, withUnit(rv.untreated.eyringS[i]!, 2, "s"));
      fig(`rt.after.${f}`, withUnit(rv.treated.eyringS[i]!, 2, "s"));
    });
    const plot = bandBarsGeometry(
      {
        bandsHz: rv.bandsHz,
        scenarios: [
          { label: `Before (${input.before.name})`, values: rv.untreated.eyringS, verdicts: before.map((b) => b.verdict) },
          { label: `After (${rec.name})`, values: rv.treated.eyringS, verdicts: rv.comparison.map((c) => c.verdict) },
        ],
        target: rv.comparison.map((c) => ({ lowerS: c.lowerS, upperS: c.upperS, targetS: c.targetS })),
        yTitle: "RT60, Eyring (s)",
      },
      { width: PLOT_WIDTH, areaHeight: 200 },
    );
    const verdictWord = { within: "within", near: "near", outside: "outside" } as const;
    const table: ReportTable = {
      columns: ["Band", "Before (s)", "After (s)", "Target (s)", "Added (m²)", "Verdict after"],
      numeric: [false, true, true, true, true, false],
      rows: rv.bandsHz.map((f, i) => [
        bandLabel(f),
        fixed(rv.untreated.eyringS[i]!, 2),
        fixed(rv.treated.eyringS[i]!, 2),
        `${fixed(rv.comparison[i]!.lowerS, 2)}–${fixed(rv.comparison[i]!.upperS, 2)}`,
        fixed(rv.addedM2[i]!, 2),
        verdictWord[rv.comparison[i]!.verdict],
      ]),
    };
    const t = rv.target;
    const targetWords = t.kind === "listening-room" ? "the listening-room target (ITU-R BS.1116 / EBU Tech 3276) for this volume" : `a flat small-room band of ${fixed(t.lowerS ?? 0.2, 2)}–${withUnit(t.upperS ?? 0.4, 2, "s")}`;
    decay = {
      plot,
      table,
      verdictLine: `Target: ${targetWords}. Eyring times at the octave-band centres; ${figures["summary.bandsWithin"] ?? "—"} bands within the target after treatment.`,
      notes: rv.notes.map(sentence),
    };
  }

  // ---- scenarios compared
  const scenarioRows = [input.before, ...input.scenarios.filter((s) => s.id !== input.before.id)];
  const scenarios: ReportTable = {
    columns: ["Scenario", "Items", "Cost", "RT 125 Hz (s)", "RT 500 Hz (s)", "Bass spread, main seat (dB)"],
    numeric: [false, true, true, true, true, true],
    rows: scenarioRows.map((s) => {
      const r = s.results;
      const i125 = r.reverb?.bandsHz.indexOf(125) ?? -1, i500 = r.reverb?.bandsHz.indexOf(500) ?? -1;
      const seat = r.lowFrequency?.seats.find((x) => x.id === mainId);
      return [
        s.id === rec.id ? `${s.name} (recommended)` : s.name,
        String(r.items.count),
        money(r.items.cost),
        i125 >= 0 ? fixed(r.reverb!.treated.eyringS[i125]!, 2) : "—",
        i500 >= 0 ? fixed(r.reverb!.treated.eyringS[i500]!, 2) : "—",
        fixed(seat?.spreadDb ?? null, 1),
      ];
    }),
  };

  // ---- treatment plan and builds
  // Items built the same way share one entry (one α curve), with a row of absorption per item.
  const groups: { key: string; items: { item: (typeof rec.analysis.items)[number]; index: number }[] }[] = [];
  rec.analysis.items.forEach((item, i) => {
    const key = JSON.stringify(item.spec);
    const g = groups.find((x) => x.key === key);
    if (g) g.items.push({ item, index: i + 1 });
    else groups.push({ key, items: [{ item, index: i + 1 }] });
  });
  const builds: BuildSheetEntry[] = groups.map((group) => {
    const item = group.items[0]!.item;
    const res: ItemResult | undefined = R.items.byItem.find((b) => b.id === item.id);
    const curve = alphaCurve(item.spec, room.temperatureC);
    const bands = R.reverb?.bandsHz ?? [63, 125, 250, 500, 1000, 2000, 4000, 8000];
    const indices = group.items.map((x) => x.index);
    return {
      index: indices[0]!,
      indices,
      title: group.items.length === 1 ? `${indices[0]}. ${item.name}` : `${indices.join(", ")}. ${group.items.map((x) => x.item.name).join(" · ")} (one build)`,
      name: item.name,
      description: describeSpec(item.spec),
      rating: curve?.rating ?? null,
      alphaPlot: curve?.plot ?? null,
      absorption: {
        columns: ["", ...bands.map((f) => bandLabel(f))],
        numeric: [false, ...bands.map(() => true)],
        rows: group.items.flatMap(({ item: it, index }) => {
          const r = R.items.byItem.find((b) => b.id === it.id);
          return r ? [[`${index}: all ${it.count} (m²)`, ...r.absorptionM2.map((a) => fixed(a, 2))]] : [];
        }),
      },
      limits: [
        ...(res?.limits ?? []).map(sentence),
        ...(res && res.withinModelRange.some((w) => !w) ? ["Outside the porous model's fitted range in some bands: treat those values as rough."] : []),
        ...(res?.estimate ? ["A resonator estimate with an assumed internal resistance: check by measurement."] : []),
        ...(res?.resonanceHz ? [`Resonance about ${withUnit(res.resonanceHz, 0, "Hz")}.`] : []),
      ],
    };
  });
  builds.forEach((b) => b.rating && fig(`build.${b.index}.alphaW`, b.rating.alphaW));

  // ---- costs
  const costRows = rec.analysis.items.map((item, i) => {
    const res = R.items.byItem.find((b) => b.id === item.id);
    const material = "materialId" in item.spec && item.spec.materialId ? porousMaterial(item.spec.materialId)?.name ?? "—" : "—";
    return [String(i + 1), item.name, material, String(item.count), money(item.unitCost), item.unitMassKg === null ? "—" : fixed(item.unitMassKg * item.count, 1), money(res?.cost ?? item.count * item.unitCost)];
  });
  const totalMass = rec.analysis.items.every((i) => i.unitMassKg !== null) ? rec.analysis.items.reduce((s, i) => s + (i.unitMassKg ?? 0) * i.count, 0) : null;
  const costs = {
    table: {
      columns: ["No.", "Item", "Fill material", "Count", "Unit cost", "Total mass (kg)", "Cost"],
      numeric: [true, false, false, true, true, true, true],
      rows: [...costRows, ["", "Total", "", String(R.items.count), "", fixed(totalMass, 1), money(R.items.cost)]],
    },
    total: money(R.items.cost),
    currencyNote: "Costs are in the firm's currency as entered for each item (materials; labour is quoted separately).",
  };

  // One line per distinct caution, naming every item it concerns.
  const byMessage = new Map<string, string[]>();
  for (const c of R.cautions) {
    const who = c.itemId ? (rec.analysis.items.find((i) => i.id === c.itemId)?.name ?? "Item") : "";
    const list = byMessage.get(c.message) ?? [];
    if (who && !list.includes(who)) list.push(who);
    byMessage.set(c.message, list);
  }
  const specific = [...byMessage].map(([message, who]) => (who.length ? `${who.join(", ")}: ${message}` : message));

  const revisionLabel = `Revision ${input.revision}`;
  return {
    paperSize: input.paperSize,
    draft: input.status === "draft",
    title: `Room acoustics report — ${room.name}`,
    number: input.number,
    revisionLabel,
    dateLabel: longDate(input.issuedAt),
    firmName: input.firm.name,
    footer: `${input.firm.name} · ${input.number} · ${revisionLabel}${input.status === "draft" ? " · DRAFT, not issued" : ""}`,
    cover: [
      ["Client", input.project.clientName],
      ["Project", input.project.name],
      ["Site", input.project.siteAddress || "—"],
      ["Room", room.name],
      ["Report", `${input.number}, ${revisionLabel.toLowerCase()}`],
      ["Date", longDate(input.issuedAt)],
      ["Engineer", input.engineerName],
      ["Prepared by", input.firm.name + (input.firm.contactEmail ? ` · ${input.firm.contactEmail}` : "")],
    ],
    summary: { intro, problems, recommendation, note: input.note.trim() || null },
    room: { facts, surfaces, positions, plan, planLegend: "Seen from above, front wall at the top. Circles S: seats (filled: main seat). Triangles M: main speakers. Squares W: subwoofers (see the table of seats and sources). Numbered shapes: treatment items of the recommended scenario (wall bars, corner triangles, dashed: on the ceiling)." },
    photos: input.photos ?? [],
    lowFrequency,
    decay,
    scenarios,
    treatment: { items: itemTable(rec), builds, empty: rec.analysis.items.length === 0 },
    costs,
    cautions: { general: CAUTIONS, specific },
    disclaimer: DISCLAIMER,
    methods: METHODS,
    engineVersion: R.engineVersion,
    signature: input.signature
      ? {
          signerName: input.signature.signerName,
          dateLabel: longDateTime(input.issuedAt),
          subject: input.signature.certificateSubject,
          fingerprint: input.signature.certificateFingerprint,
          verifyUrl: input.signature.verifyUrl,
          statement: `This report is digitally signed (PKCS#7, SHA-256). The signature covers every page; any change to the file breaks it. To check a copy, open ${input.signature.verifyUrl} and upload the PDF, or enter the report number ${input.number} and the file's SHA-256.`,
        }
      : null,
    figures,
  };
}
