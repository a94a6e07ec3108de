// buildReportModel: every printed figure is the lib/analysis result, formatted once; pure shaping.
import { describe, expect, it } from "vitest";
import { bandLabel, buildReportModel, fixed, money, peakAndDip, planGeometry, signed, withUnit } from "@/lib/report";
import { BASELINE, PANELS_AND_TRAPS, ROOM, reportInput } from "./fixture";

describe("format helpers", () => {
  it("fixed uses a real minus sign and never prints −0", () => {
    expect(fixed(-0.123, 2)).toBe("\u22120.12");
    expect(fixed(-0.001, 2)).toBe("0.00");
    expect(fixed(null, 2)).toBe("—");
    expect(fixed(Number.NaN, 1)).toBe("—");
  });
  it("withUnit, signed, money, bandLabel", () => {
    expect(withUnit(0.4, 2, "s")).toBe("0.40\u00a0s");
    expect(signed(1.23, 1)).toBe("+1.2");
    expect(signed(-0.04, 1)).toBe("0.0");
    expect(money(1070)).toBe("1,070.00");
    expect(money(1234567.891)).toBe("1,234,567.89");
    expect(bandLabel(63)).toBe("63\u00a0Hz");
    expect(bandLabel(2000)).toBe("2\u00a0kHz");
  });
});

describe("peakAndDip", () => {
  it("finds the peak and dip relative to the band mean", () => {
    const f = [10, 20, 30, 40, 50];
    const l = [100, 0, 6, -6, 0]; // 10 Hz is outside the band
    const r = peakAndDip(f, l, 15, 60)!;
    expect(r.peakHz).toBe(30);
    expect(r.dipHz).toBe(40);
    expect(r.peakDb).toBeCloseTo(6, 12);
    expect(r.dipDb).toBeCloseTo(-6, 12);
  });
  it("is undefined with fewer than three points in the band, and ignores the −300 dB floor", () => {
    expect(peakAndDip([10, 20], [0, 1], 0, 100)).toBeUndefined();
    expect(peakAndDip([10, 20, 30], [0, -300, 1], 0, 100)).toBeUndefined();
  });
});

describe("buildReportModel", () => {
  const m = buildReportModel(reportInput());
  const R = PANELS_AND_TRAPS.results;

  it("prints the treated and untreated Eyring times of the recommendation, per band, to 0.01 s", () => {
    R.reverb!.bandsHz.forEach((f, i) => {
      expect(m.figures[`rt.after.${f}`]).toBe(withUnit(R.reverb!.treated.eyringS[i]!, 2, "s"));
      expect(m.figures[`rt.before.${f}`]).toBe(withUnit(R.reverb!.untreated.eyringS[i]!, 2, "s"));
    });
    expect(m.decay!.table.rows).toHaveLength(8);
  });

  it("takes the bass spread before from the baseline and after from the recommendation (main seat)", () => {
    const main = R.lowFrequency!.seats.find((s) => s.isMain)!;
    expect(m.figures["lf.spreadAfter"]).toBe(withUnit(main.spreadDb, 1, "dB"));
    expect(m.figures["lf.spreadBefore"]).toBe(withUnit(BASELINE.results.lowFrequency!.seats.find((s) => s.id === main.id)!.spreadDb, 1, "dB"));
  });

  it("prints the Schroeder frequency, volume and total cost from the results", () => {
    expect(m.figures["lf.schroeder"]).toBe(withUnit(R.modes.schroederHz!, 0, "Hz"));
    expect(m.figures["room.volume"]).toBe(withUnit(R.room.volumeM3, 1, "m³"));
    expect(m.figures["costs.total"]).toBe(money(R.items.cost));
    expect(m.costs.table.rows.at(-1)![6]).toBe(money(R.items.cost));
  });

  it("rates the porous panel build by ISO 11654 and ASTM C423 and draws its α curve", () => {
    const panel = m.treatment.builds.find((b) => b.name === "Wall panel")!;
    expect(panel.rating).not.toBeNull();
    expect(Number(panel.rating!.alphaW)).toBeGreaterThan(0);
    expect(panel.alphaPlot!.series[0]!.path.startsWith("M")).toBe(true);
    const trap = m.treatment.builds.find((b) => b.name === "Corner trap")!;
    expect(trap.rating).toBeNull();
    expect(trap.absorption.rows[0]).toHaveLength(9);
  });

  it("writes the summary in plain words with the same figures", () => {
    const text = [...m.summary.problems, ...m.summary.recommendation].join(" ");
    expect(text).toContain(m.figures["summary.worstBefore"]!);
    expect(text).toContain(m.figures["lf.spreadAfter"]!);
    expect(text).toContain("Panels and corner traps");
  });

  it("keeps the general cautions and names items in the specific ones once per message", () => {
    expect(m.cautions.general.map((c) => c.title)).toEqual(["Mineral and glass wool", "Fire", "Heavy traps and panels", "Behind the walls", "Loud test signals"]);
    expect(new Set(m.cautions.specific).size).toBe(m.cautions.specific.length);
    expect(m.disclaimer).toMatch(/licensed professionals/);
  });

  it("marks a draft and leaves the signature out", () => {
    const d = buildReportModel(reportInput({ status: "draft", signature: null }));
    expect(d.draft).toBe(true);
    expect(d.signature).toBeNull();
    expect(d.footer).toMatch(/DRAFT/);
  });

  it("throws a RangeError without scenarios", () => {
    expect(() => buildReportModel(reportInput({ scenarios: [] }))).toThrow(RangeError);
  });

  it("is pure: the same input gives the same model", () => {
    expect(JSON.stringify(buildReportModel(reportInput()))).toBe(JSON.stringify(m));
  });
});

describe("planGeometry", () => {
  it("fits the box, keeps the aspect ratio and puts every seat inside the room", () => {
    const g = planGeometry(ROOM, PANELS_AND_TRAPS.analysis.items, 440, 330);
    expect(g.width).toBeLessThanOrEqual(440.01);
    expect(g.height).toBeLessThanOrEqual(330.01);
    expect(g.room.height / g.room.width).toBeCloseTo(ROOM.lengthM / ROOM.widthM, 2);
    for (const s of g.seats) {
      expect(s.x).toBeGreaterThan(g.room.x);
      expect(s.x).toBeLessThan(g.room.x + g.room.width);
      expect(s.y).toBeGreaterThan(g.room.y);
      expect(s.y).toBeLessThan(g.room.y + g.room.height);
    }
    // 4 traps + 6 panels placed
    expect(g.items).toHaveLength(10);
  });
  it("refuses a box too small to draw", () => {
    expect(() => planGeometry(ROOM, [], 50, 300)).toThrow(RangeError);
  });
});
