"use client";

import { BandBarsPlot, FrequencyResponsePlot } from "@/components/plots";
import { Notice } from "@/components/ui/card";
import { VerdictMark } from "@/components/workspace/verdict-mark";
import type { SizerResult } from "@/lib/sizer";

const fmtHz = (f: number) => (f >= 1000 ? `${f / 1000}k` : String(f));
const mm = (m: number) => `${Math.round(m * 1000)} mm`;
const money = (x: number) => x.toLocaleString("en-GB", { minimumFractionDigits: 0, maximumFractionDigits: 0 });
const PLACE: Record<string, string> = { "vertical-corner": "corner", "ceiling-edge": "wall–ceiling edge", wall: "wall" };

/** The sizer's proposal: the set, RT per band before/after vs target, the bass at the main seat, why, and the low-frequency caveat. */
export function SizerResultView({ result, elapsedMs }: { result: SizerResult; elapsedMs: number }) {
  const sized = result.bands.filter((b) => b.sized);
  const worst = sized.reduce((w, b) => (b.missingM2 > (w?.missingM2 ?? 0) ? b : w), undefined as (typeof sized)[number] | undefined);
  const nearlyReached = !result.reached && worst !== undefined && worst.missingM2 < 0.05;
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-base font-medium" data-testid="sizer-verdict">
          {result.items.length === 0
            ? "Nothing within these limits helps the low end."
            : result.reached
              ? `${result.totals.count} item${result.totals.count === 1 ? "" : "s"} bring 63–250 Hz to the target.`
              : nearlyReached
                ? `${result.totals.count} items bring 63–250 Hz to the target, short by under 0.05 m² at ${worst!.nominalHz} Hz — within the rounding of these estimates.`
              : `${result.totals.count} item${result.totals.count === 1 ? "" : "s"} get as close as these limits allow; the target is not reached.`}
        </p>
        <span className="text-xs text-ink-faint" data-testid="sizer-elapsed">
          computed in {elapsedMs} ms · {result.search.combinations.toLocaleString("en-GB")} combinations searched
        </span>
      </div>
      {result.items.length > 0 && (
        <div className="overflow-x-auto">
          <table className="w-full text-sm" data-testid="sizer-items">
            <thead className="text-left text-xs uppercase tracking-wide text-ink-faint">
              <tr>
                <th className="py-1 pr-3 font-medium">Build</th>
                <th className="py-1 pr-3 text-right font-medium">Count</th>
                <th className="py-1 pr-3 font-medium">Where</th>
                <th className="py-1 pr-3 text-right font-medium">Stands out</th>
                <th className="py-1 pr-3 text-right font-medium">Weight</th>
                <th className="py-1 text-right font-medium">Materials</th>
              </tr>
            </thead>
            <tbody>
              {result.items.map((it) => (
                <tr key={it.candidateId} className="border-t border-paper-line align-top">
                  <td className="py-1.5 pr-3">{it.name}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{it.count}</td>
                  <td className="py-1.5 pr-3 text-ink-soft">
                    <span className="sr-only">{PLACE[it.placement]}: </span>
                    {it.where.join("; ")}
                  </td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{mm(it.projectionM)}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{it.weightKg.toFixed(0)} kg</td>
                  <td className="py-1.5 text-right tabular-nums">{money(it.cost)}</td>
                </tr>
              ))}
              <tr className="border-t border-ink/30 font-medium">
                <td className="py-1.5 pr-3">Total</td>
                <td className="py-1.5 pr-3 text-right tabular-nums">{result.totals.count}</td>
                <td className="py-1.5 pr-3 text-ink-soft">{result.totals.wallAreaM2 > 0 ? `${result.totals.wallAreaM2.toFixed(1)} m² of wall` : ""}</td>
                <td className="py-1.5 pr-3 text-right tabular-nums">{mm(result.totals.maxProjectionM)}</td>
                <td className="py-1.5 pr-3 text-right tabular-nums">{result.totals.weightKg.toFixed(0)} kg</td>
                <td className="py-1.5 text-right tabular-nums">{money(result.totals.cost)}</td>
              </tr>
            </tbody>
          </table>
          <p className="mt-1 text-xs text-ink-faint">Materials at the demo prices, pro rata; the build sheet prices whole boards and slabs from the firm&apos;s price list.</p>
        </div>
      )}

      <section aria-labelledby="why-title" className="space-y-1.5">
        <h3 id="why-title" className="text-base font-semibold">Why this set</h3>
        <ul className="list-disc space-y-1 pl-5 text-sm" data-testid="sizer-reasons">
          {result.reasons.map((r, i) => (
            <li key={i}>{r}</li>
          ))}
        </ul>
      </section>

      <div className="grid gap-5 lg:grid-cols-2">
        <div className="space-y-2">
          <BandBarsPlot
            title="Reverberation time per octave band, before and after"
            units="s"
            bandsHz={result.bands.map((b) => b.nominalHz)}
            scenarios={[
              { label: "Before", values: result.bands.map((b) => b.beforeS), verdicts: result.bands.map((b) => b.verdictBefore) },
              { label: "With the proposal", values: result.bands.map((b) => b.afterS), verdicts: result.bands.map((b) => b.verdictAfter) },
            ]}
            target={result.bands.map((b) => ({ lowerS: b.lowerS, upperS: b.upperS, targetS: b.targetS }))}
            yTitle="RT60 (s)"
            caption="Shaded: the scenario's target band. Eyring formula with the room's finishes, its air and the scenario's items; the sizer sizes 63, 125 and 250 Hz."
          />
          <Notice tone="caution">
            <span data-testid="sizer-caveat">{result.caveat}</span>
          </Notice>
        </div>
        {result.modal ? (
          <FrequencyResponsePlot
            title="Bass at the main seat, before and after"
            units="dB"
            series={[
              { label: `Before (spread ${result.modal.beforeSpreadDb.toFixed(1)} dB)`, frequenciesHz: result.modal.frequenciesHz, levelsDb: result.modal.beforeDb },
              { label: `With the proposal (spread ${result.modal.afterSpreadDb.toFixed(1)} dB)`, frequenciesHz: result.modal.frequenciesHz, levelsDb: result.modal.afterDb },
            ]}
            shadedBand={{ fromHz: result.modal.frequenciesHz[0]!, toHz: Math.min(result.schroederFrequencyHz, result.modal.frequenciesHz[result.modal.frequenciesHz.length - 1]!), label: "below the Schroeder frequency" }}
            yTitle="Level (dB)"
            caption={`Modal sum from the bass source to the main seat. ${result.modal.note}.`}
          />
        ) : (
          <Notice>Place a seat and a bass source in the room to see the effect at the main seat.</Notice>
        )}
      </div>

      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="sizer-bands">
          <caption className="mb-1 text-left text-xs text-ink-faint">Per octave band: RT60 before and after against the target, and the absorption area the sized bands need.</caption>
          <thead className="text-right text-xs uppercase tracking-wide text-ink-faint">
            <tr>
              <th className="py-1 pr-3 text-left font-medium">Band</th>
              <th className="py-1 pr-3 font-medium">Before</th>
              <th className="py-1 pr-3 font-medium">After</th>
              <th className="py-1 pr-3 font-medium">Target (allowed)</th>
              <th className="py-1 pr-3 font-medium">Needed</th>
              <th className="py-1 font-medium">Added</th>
            </tr>
          </thead>
          <tbody>
            {result.bands.map((b) => (
              <tr key={b.nominalHz} className={`border-t border-paper-line text-right tabular-nums ${b.sized ? "" : "text-ink-soft"}`}>
                <td className="py-1 pr-3 text-left">{fmtHz(b.nominalHz)} Hz{b.sized ? " •" : ""}</td>
                <td className="py-1 pr-3">
                  {b.beforeS.toFixed(2)} s <VerdictMark verdict={b.verdictBefore} />
                </td>
                <td className="py-1 pr-3">
                  {b.afterS.toFixed(2)} s <VerdictMark verdict={b.verdictAfter} />
                </td>
                <td className="py-1 pr-3">
                  {b.targetS.toFixed(2)} s ({b.lowerS.toFixed(2)}–{b.upperS.toFixed(2)})
                </td>
                <td className="py-1 pr-3">{b.sized ? `${b.neededM2.toFixed(1)} m²` : "—"}</td>
                <td className="py-1">{b.addedM2.toFixed(1)} m²</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-1 text-xs text-ink-faint">• sized band. Sized bands below about {Math.round(result.schroederFrequencyHz)} Hz are estimates (see the note beside the plot).</p>
      </div>
      {sized.length > 0 && result.notes.length > 0 && (
        <details className="text-xs text-ink-soft">
          <summary className="cursor-pointer">Method notes</summary>
          <ul className="mt-1 list-disc space-y-0.5 pl-5">
            <li>{result.search.method}</li>
            {result.notes.map((n, i) => (
              <li key={i}>{n}</li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}
