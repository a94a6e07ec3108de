"use client";

import { useEffect, useState } from "react";
import { Input } from "@/components/ui/field";
import { feetInchesToMetres, metresToFeetInches, type UnitSystem } from "@/lib/units/length";

const num = (s: string) => (s.trim() === "" ? Number.NaN : Number(s.replace(",", ".")));

/**
 * A length in the person's units: metres, or feet + inches. Reports metres (NaN while the text is not
 * a number). `value` is metres.
 */
export function LengthInput({ id, label, value, units, onChange, invalid }: { id: string; label: string; value: number; units: UnitSystem; onChange: (metres: number) => void; invalid?: boolean }) {
  const [m, setM] = useState(() => String(+value.toFixed(3)));
  const [ft, setFt] = useState(() => String(metresToFeetInches(Math.max(0, value)).feet));
  const [inch, setInch] = useState(() => String(metresToFeetInches(Math.max(0, value)).inches));
  // follow outside changes (a drag on the plan) unless the field holds the same length already
  useEffect(() => {
    const current = units === "metric" ? num(m) : num(ft) * 0.3048 + num(inch || "0") * 0.0254;
    if (Number.isFinite(current) && Math.abs(current - value) < 0.003) return;
    setM(String(+value.toFixed(3)));
    const fi = metresToFeetInches(Math.max(0, value));
    setFt(String(fi.feet));
    setInch(String(fi.inches));
  }, [value]); // eslint-disable-line react-hooks/exhaustive-deps

  if (units === "metric")
    return (
      <div className="relative">
        <Input id={id} value={m} inputMode="decimal" aria-label={`${label} in metres`} aria-invalid={invalid || undefined} className="pr-8" onChange={(e) => { setM(e.target.value); onChange(num(e.target.value)); }} />
        <span className="pointer-events-none absolute right-3 top-2 text-sm text-ink-faint">m</span>
      </div>
    );
  const emit = (f: string, i: string) => {
    const a = num(f), b = num(i || "0");
    onChange(Number.isFinite(a) && Number.isFinite(b) && a >= 0 && b >= 0 ? feetInchesToMetres(a, b) : Number.NaN);
  };
  return (
    <div className="flex gap-1.5" id={id}>
      <div className="relative flex-1">
        <Input value={ft} inputMode="numeric" aria-label={`${label}, feet`} aria-invalid={invalid || undefined} className="pr-6" onChange={(e) => { setFt(e.target.value); emit(e.target.value, inch); }} />
        <span className="pointer-events-none absolute right-2 top-2 text-sm text-ink-faint">ft</span>
      </div>
      <div className="relative flex-1">
        <Input value={inch} inputMode="decimal" aria-label={`${label}, inches`} aria-invalid={invalid || undefined} className="pr-6" onChange={(e) => { setInch(e.target.value); emit(ft, e.target.value); }} />
        <span className="pointer-events-none absolute right-2 top-2 text-sm text-ink-faint">in</span>
      </div>
    </div>
  );
}
