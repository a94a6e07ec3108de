"use client";

import { useQuery } from "@tanstack/react-query";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { BandBarsPlot } from "@/components/plots/band-bars-plot";
import { FrequencyResponsePlot } from "@/components/plots/frequency-response-plot";
import { Card, EmptyState, Notice } from "@/components/ui/card";
import type { Scenario } from "@/db/queries/scenarios";
import { VerdictMark } from "./verdict-mark";

const fmtHz = (f: number) => (f >= 1000 ? `${f / 1000}k` : String(f));
const money = (v: number) => v.toLocaleString("en-GB", { minimumFractionDigits: 2, maximumFractionDigits: 2 });

/**
 * Two or more scenarios side by side: RT per band against each one's target, the modal response at
 * the main seat, cost and count of items. The chosen scenarios live in the URL (`?ids=a,b`).
 */
export function CompareView({ roomId, all, initial, initialIds }: { roomId: string; all: { id: string; name: string; isBaseline: boolean }[]; initial: Scenario[]; initialIds: string[] }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const ids = params.get("ids")?.split(",").filter((id) => all.some((s) => s.id === id)) ?? initialIds;
  const key = [...ids].sort().join(",");
  const { data, isFetching, error } = useQuery({
    queryKey: ["rooms", roomId, "analysis", key],
    queryFn: async () => {
      const res = await fetch(`/api/v1/rooms/${roomId}/analysis?scenarioIds=${encodeURIComponent(ids.join(","))}`, { cache: "no-store" });
      const body = await res.json();
      if (!res.ok) throw new Error(body?.error?.message ?? `answered ${res.status}`);
      return body.scenarios as Scenario[];
    },
    initialData: key === [...initialIds].sort().join(",") ? initial : undefined,
    enabled: ids.length > 0,
  });
  const chosen = (data ?? []).slice().sort((a, b) => all.findIndex((s) => s.id === a.id) - all.findIndex((s) => s.id === b.id));
  const toggle = (id: string) => {
    const next = ids.includes(id) ? ids.filter((x) => x !== id) : [...ids, id];
    const q = new URLSearchParams(params.toString());
    q.set("ids", next.join(","));
    router.replace(`${pathname}?${q.toString()}`, { scroll: false });
  };
  const withReverb = chosen.filter((s) => s.results.reverb);
  const bands = withReverb[0]?.results.reverb?.bandsHz ?? [];
  const mainOf = (s: Scenario) => s.results.lowFrequency?.seats.find((x) => x.isMain) ?? s.results.lowFrequency?.seats[0] ?? null;
  const main = chosen.map(mainOf);
  const freqs = chosen.find((s) => s.results.lowFrequency)?.results.lowFrequency?.frequenciesHz ?? [];

  return (
    <div className="space-y-5">
      <fieldset className="no-print flex flex-wrap items-center gap-2 text-sm">
        <legend className="mb-1 text-sm font-medium text-ink-soft">Scenarios to compare (two or more)</legend>
        {all.map((s) => (
          <label key={s.id} className="inline-flex cursor-pointer items-center gap-1.5 rounded-md border border-paper-line bg-paper-raised px-2.5 py-1 has-[:checked]:border-ink has-[:checked]:bg-paper-sunk">
            <input type="checkbox" checked={ids.includes(s.id)} onChange={() => toggle(s.id)} className="accent-kiln-500" />
            {s.name}
            {s.isBaseline ? " (baseline)" : ""}
          </label>
        ))}
        {isFetching && <span className="text-xs text-ink-faint">Loading…</span>}
      </fieldset>
      {error && <Notice tone="error">{(error as Error).message}</Notice>}
      {ids.length < 2 ? (
        <EmptyState title="Choose at least two scenarios">Tick two or more scenarios above to see them side by side.</EmptyState>
      ) : (
        <>
          <section aria-labelledby="cmp-cost" className="space-y-2">
            <h2 id="cmp-cost" className="text-lg font-semibold">Summary</h2>
            <div className="overflow-x-auto rounded-[10px] border border-paper-line bg-paper-raised">
              <table className="w-full text-sm" data-testid="compare-summary">
                <thead className="bg-paper-sunk/70 text-left text-xs tracking-wide text-ink-soft">
                  <tr>
                    <th className="px-3 py-2 font-medium">Scenario</th>
                    <th className="px-3 py-2 text-right font-medium">Items</th>
                    <th className="px-3 py-2 text-right font-medium">Cost</th>
                    <th className="px-3 py-2 text-right font-medium">Bands within target</th>
                    <th className="px-3 py-2 text-right font-medium">Main seat spread (dB)</th>
                    <th className="px-3 py-2 text-right font-medium">Bass decay used (s)</th>
                  </tr>
                </thead>
                <tbody className="tabular-nums">
                  {chosen.map((s, i) => {
                    const c = s.results.reverb?.comparison ?? [];
                    return (
                      <tr key={s.id} className="border-t border-paper-line/70">
                        <th scope="row" className="px-3 py-2 text-left font-medium">{s.name}</th>
                        <td className="px-3 py-2 text-right">{s.results.items.count}</td>
                        <td className="px-3 py-2 text-right">{money(s.results.items.cost)}</td>
                        <td className="px-3 py-2 text-right">{c.length ? `${c.filter((b) => b.verdict === "within").length} of ${c.length}` : "—"}</td>
                        <td className="px-3 py-2 text-right">{main[i] ? main[i]!.spreadDb.toFixed(1) : "—"}</td>
                        <td className="px-3 py-2 text-right">{s.results.lowFrequency ? s.results.lowFrequency.effectiveRt60S.toFixed(2) : "—"}</td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
          </section>

          {withReverb.length > 0 && (
            <section aria-labelledby="cmp-rt" className="space-y-2">
              <h2 id="cmp-rt" className="text-lg font-semibold">Reverberation time per band</h2>
              <Card className="relative overflow-hidden p-4">
                <BandBarsPlot
                  title="Predicted RT60 per octave band (Eyring)"
                  units="s"
                  bandsHz={bands}
                  scenarios={withReverb.map((s) => ({ label: s.name, values: s.results.reverb!.treated.eyringS, verdicts: s.results.reverb!.comparison.map((c) => c.verdict) }))}
                  target={withReverb[0]!.results.reverb!.comparison.map((c) => ({ lowerS: c.lowerS, upperS: c.upperS, targetS: c.targetS }))}
                  yTitle="RT60 (s)"
                  caption={`Shaded: the target band of “${withReverb[0]!.name}”.`}
                />
              </Card>
              <div className="overflow-x-auto rounded-[10px] border border-paper-line bg-paper-raised">
                <table className="w-full text-sm" data-testid="compare-rt">
                  <thead className="bg-paper-sunk/70 text-left text-xs tracking-wide text-ink-soft">
                    <tr>
                      <th className="px-3 py-2 font-medium">RT60 (s)</th>
                      {bands.map((f) => <th key={f} className="px-3 py-2 text-right font-medium">{fmtHz(f)} Hz</th>)}
                    </tr>
                  </thead>
                  <tbody className="tabular-nums">
                    {withReverb.map((s) => (
                      <tr key={s.id} className="border-t border-paper-line/70">
                        <th scope="row" className="px-3 py-1.5 text-left font-medium">{s.name}</th>
                        {s.results.reverb!.comparison.map((c, i) => (
                          <td key={i} className="px-3 py-1.5 text-right">
                            <span className="inline-flex items-center gap-1.5">{c.predictedS.toFixed(2)} <VerdictMark verdict={c.verdict} withWord={false} /></span>
                          </td>
                        ))}
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            </section>
          )}

          <section aria-labelledby="cmp-seat" className="space-y-2">
            <h2 id="cmp-seat" className="text-lg font-semibold">Bass at the main seat</h2>
            {main.every((m) => !m) ? (
              <EmptyState title="No seat response">The room needs a seat and a source that plays the bass (Room tab).</EmptyState>
            ) : (
              <Card className="relative overflow-hidden p-4">
                <FrequencyResponsePlot
                  title={`Modal response at ${main.find((m) => m)?.name ?? "the main seat"}`}
                  units="dB (relative)"
                  series={chosen.flatMap((s, i) => (main[i] ? [{ label: s.name, frequenciesHz: freqs, levelsDb: main[i]!.levelsDb }] : []))}
                  domainHz={[15, 250]}
                  caption="Low-frequency absorption shortens the bass decay and widens every mode: the peaks drop and the dips fill. The level scale is common to every scenario of the room."
                />
              </Card>
            )}
          </section>
        </>
      )}
    </div>
  );
}
