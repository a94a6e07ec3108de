"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition, type ReactNode } from "react";
import { toast } from "sonner";
import { savePriceListAction } from "@/app/(app)/settings/prices/actions";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Input, Select } from "@/components/ui/field";
import { SLAB_PRESETS, type PriceListValues } from "@/lib/schemas/build-sheet";

type Errors = Record<string, string[]>;
const toMm = (m: number) => Math.round(m * 10_000) / 10;
const fromMm = (s: string) => (s.trim() === "" ? NaN : Number(s) / 1000);
const num = (s: string) => (s.trim() === "" ? NaN : Number(s));

function Row({ label, error, children, hint }: { label: string; error?: string[]; children: ReactNode; hint?: string }) {
  return (
    <label className="block space-y-1 text-sm">
      <span className="font-medium">{label}</span>
      {children}
      {hint && !error && <span className="block text-xs text-ink-faint">{hint}</span>}
      {error && (
        <span role="alert" className="block text-xs font-medium text-outside">
          {error[0]}
        </span>
      )}
    </label>
  );
}

/** The owner's price list: lumber section and stock boards, kerf, slabs of the standard size by thickness, fabric, face sheets, fixings. */
export function PriceListForm({ initial, version: initialVersion, updatedAt }: { initial: PriceListValues; version: number; updatedAt: string | null }) {
  const router = useRouter();
  const [v, setV] = useState<PriceListValues>(initial);
  const [version, setVersion] = useState(initialVersion);
  const [errors, setErrors] = useState<Errors>({});
  const [message, setMessage] = useState<string | null>(null);
  const [pending, start] = useTransition();
  const e = (k: string) => errors[k];
  const c = v.currency || "—";

  const save = () =>
    start(async () => {
      const r = await savePriceListAction({ ...v, version });
      if (r.ok) {
        setErrors({});
        setMessage(null);
        setVersion(r.data.version);
        toast.success("Price list saved");
        router.refresh();
      } else {
        setErrors(r.fields ?? {});
        setMessage(r.message);
      }
    });

  return (
    <form
      className="space-y-5"
      onSubmit={(ev) => {
        ev.preventDefault();
        save();
      }}
      aria-label="Price list"
    >
      <Card className="grid gap-4 sm:grid-cols-3">
        <Row label="Currency" error={e("currency")} hint="Three letters, e.g. EUR">
          <Input value={v.currency} maxLength={3} onChange={(x) => setV({ ...v, currency: x.target.value.toUpperCase() })} aria-invalid={!!e("currency")} />
        </Row>
        <Row label="Saw kerf (mm)" error={e("kerfM")} hint="Lost at each cut">
          <Input type="number" step={0.5} min={0} value={Number.isFinite(v.kerfM) ? toMm(v.kerfM) : ""} onChange={(x) => setV({ ...v, kerfM: fromMm(x.target.value) })} aria-invalid={!!e("kerfM")} />
        </Row>
      </Card>

      <Card className="space-y-3">
        <h2 className="text-base font-semibold">Frame lumber</h2>
        <div className="grid gap-4 sm:grid-cols-4">
          <Row label="Section thickness (mm)" error={e("lumber.thicknessM")}>
            <Input type="number" step={1} value={Number.isFinite(v.lumber.thicknessM) ? toMm(v.lumber.thicknessM) : ""} onChange={(x) => setV({ ...v, lumber: { ...v.lumber, thicknessM: fromMm(x.target.value) } })} />
          </Row>
          <Row label="Section width (mm)" error={e("lumber.widthM")} hint="Frames deeper than this are built to a drawing">
            <Input type="number" step={1} value={Number.isFinite(v.lumber.widthM) ? toMm(v.lumber.widthM) : ""} onChange={(x) => setV({ ...v, lumber: { ...v.lumber, widthM: fromMm(x.target.value) } })} />
          </Row>
          <Row label="Wood density (kg/m³)" error={e("lumber.densityKgM3")}>
            <Input type="number" step={10} value={Number.isFinite(v.lumber.densityKgM3) ? v.lumber.densityKgM3 : ""} onChange={(x) => setV({ ...v, lumber: { ...v.lumber, densityKgM3: num(x.target.value) } })} />
          </Row>
          <Row label="Priced" error={e("lumber.basis")}>
            <Select value={v.lumber.basis} onChange={(x) => setV({ ...v, lumber: { ...v.lumber, basis: x.target.value as "per-metre" | "per-board" } })}>
              <option value="per-board">per board</option>
              <option value="per-metre">per metre</option>
            </Select>
          </Row>
        </div>
        {v.lumber.basis === "per-metre" && (
          <Row label={`Price per metre (${c})`} error={e("lumber.pricePerM")}>
            <Input type="number" step={0.01} className="max-w-40" value={Number.isFinite(v.lumber.pricePerM) ? v.lumber.pricePerM : ""} onChange={(x) => setV({ ...v, lumber: { ...v.lumber, pricePerM: num(x.target.value) } })} />
          </Row>
        )}
        <fieldset className="space-y-2">
          <legend className="text-sm font-medium">Stock board lengths</legend>
          {v.lumber.boards.map((b, i) => (
            <div key={i} className="flex flex-wrap items-start gap-2">
              <Input type="number" step={100} className="w-32" aria-label={`Board ${i + 1} length, mm`} value={Number.isFinite(b.lengthM) ? toMm(b.lengthM) : ""} onChange={(x) => setV({ ...v, lumber: { ...v.lumber, boards: v.lumber.boards.map((y, k) => (k === i ? { ...y, lengthM: fromMm(x.target.value) } : y)) } })} />
              <span className="py-2 text-sm text-ink-soft">mm</span>
              {v.lumber.basis === "per-board" && (
                <>
                  <Input type="number" step={0.01} className="w-28" aria-label={`Board ${i + 1} price`} value={Number.isFinite(b.price) ? b.price : ""} onChange={(x) => setV({ ...v, lumber: { ...v.lumber, boards: v.lumber.boards.map((y, k) => (k === i ? { ...y, price: num(x.target.value) } : y)) } })} />
                  <span className="py-2 text-sm text-ink-soft">{c} each</span>
                </>
              )}
              {v.lumber.boards.length > 1 && (
                <Button type="button" variant="ghost" onClick={() => setV({ ...v, lumber: { ...v.lumber, boards: v.lumber.boards.filter((_, k) => k !== i) } })}>
                  Remove
                </Button>
              )}
              {(e(`lumber.boards.${i}.lengthM`) ?? e(`lumber.boards.${i}.price`)) && <span className="w-full text-xs text-outside">{(e(`lumber.boards.${i}.lengthM`) ?? e(`lumber.boards.${i}.price`))![0]}</span>}
            </div>
          ))}
          {v.lumber.boards.length < 10 && (
            <Button type="button" variant="secondary" onClick={() => setV({ ...v, lumber: { ...v.lumber, boards: [...v.lumber.boards, { lengthM: 3.6, price: 0 }] } })}>
              Add a length
            </Button>
          )}
        </fieldset>
      </Card>

      <Card className="space-y-3">
        <h2 className="text-base font-semibold">Insulation slabs</h2>
        <div className="grid gap-4 sm:grid-cols-3">
          <Row label="Standard size">
            <Select
              value={v.slab.standard}
              onChange={(x) => {
                const std = x.target.value as "metric" | "imperial";
                setV({ ...v, slab: { ...v.slab, standard: std, lengthM: SLAB_PRESETS[std].lengthM, widthM: SLAB_PRESETS[std].widthM } });
              }}
            >
              <option value="metric">{SLAB_PRESETS.metric.label}</option>
              <option value="imperial">{SLAB_PRESETS.imperial.label}</option>
            </Select>
          </Row>
          <Row label="Length (mm)" error={e("slab.lengthM")}>
            <Input type="number" step={1} value={Number.isFinite(v.slab.lengthM) ? toMm(v.slab.lengthM) : ""} onChange={(x) => setV({ ...v, slab: { ...v.slab, lengthM: fromMm(x.target.value) } })} />
          </Row>
          <Row label="Width (mm)" error={e("slab.widthM")}>
            <Input type="number" step={1} value={Number.isFinite(v.slab.widthM) ? toMm(v.slab.widthM) : ""} onChange={(x) => setV({ ...v, slab: { ...v.slab, widthM: fromMm(x.target.value) } })} />
          </Row>
        </div>
        <fieldset className="space-y-2">
          <legend className="text-sm font-medium">Thicknesses and prices per slab</legend>
          {v.slab.prices.map((p, i) => (
            <div key={i} className="flex flex-wrap items-start gap-2">
              <Input type="number" step={5} className="w-28" aria-label={`Slab ${i + 1} thickness, mm`} value={Number.isFinite(p.thicknessM) ? toMm(p.thicknessM) : ""} onChange={(x) => setV({ ...v, slab: { ...v.slab, prices: v.slab.prices.map((y, k) => (k === i ? { ...y, thicknessM: fromMm(x.target.value) } : y)) } })} />
              <span className="py-2 text-sm text-ink-soft">mm at</span>
              <Input type="number" step={0.01} className="w-28" aria-label={`Slab ${i + 1} price`} value={Number.isFinite(p.price) ? p.price : ""} onChange={(x) => setV({ ...v, slab: { ...v.slab, prices: v.slab.prices.map((y, k) => (k === i ? { ...y, price: num(x.target.value) } : y)) } })} />
              <span className="py-2 text-sm text-ink-soft">{c} a slab</span>
              {v.slab.prices.length > 1 && (
                <Button type="button" variant="ghost" onClick={() => setV({ ...v, slab: { ...v.slab, prices: v.slab.prices.filter((_, k) => k !== i) } })}>
                  Remove
                </Button>
              )}
              {(e(`slab.prices.${i}.thicknessM`) ?? e(`slab.prices.${i}.price`)) && <span className="w-full text-xs text-outside">{(e(`slab.prices.${i}.thicknessM`) ?? e(`slab.prices.${i}.price`))![0]}</span>}
            </div>
          ))}
          {v.slab.prices.length < 10 && (
            <Button type="button" variant="secondary" onClick={() => setV({ ...v, slab: { ...v.slab, prices: [...v.slab.prices, { thicknessM: 0.075, price: 0 }] } })}>
              Add a thickness
            </Button>
          )}
          <p className="text-xs text-ink-faint">A build sheet uses the thickest listed slab that makes every fill whole layers.</p>
        </fieldset>
      </Card>

      <Card className="grid gap-4 sm:grid-cols-3">
        <h2 className="text-base font-semibold sm:col-span-3">Fabric, face sheets and fixings</h2>
        <Row label={`Fabric per m² (${c})`} error={e("fabric.pricePerM2")}>
          <Input type="number" step={0.01} value={Number.isFinite(v.fabric.pricePerM2) ? v.fabric.pricePerM2 : ""} onChange={(x) => setV({ ...v, fabric: { ...v.fabric, pricePerM2: num(x.target.value) } })} />
        </Row>
        <Row label="Wrap allowance (mm)" error={e("fabric.wrapM")} hint="Fabric past the frame's back edge, to staple">
          <Input type="number" step={5} value={Number.isFinite(v.fabric.wrapM) ? toMm(v.fabric.wrapM) : ""} onChange={(x) => setV({ ...v, fabric: { ...v.fabric, wrapM: fromMm(x.target.value) } })} />
        </Row>
        <span />
        <Row label="Face sheet length (mm)" error={e("sheet.lengthM")}>
          <Input type="number" step={1} value={Number.isFinite(v.sheet.lengthM) ? toMm(v.sheet.lengthM) : ""} onChange={(x) => setV({ ...v, sheet: { ...v.sheet, lengthM: fromMm(x.target.value) } })} />
        </Row>
        <Row label="Face sheet width (mm)" error={e("sheet.widthM")}>
          <Input type="number" step={1} value={Number.isFinite(v.sheet.widthM) ? toMm(v.sheet.widthM) : ""} onChange={(x) => setV({ ...v, sheet: { ...v.sheet, widthM: fromMm(x.target.value) } })} />
        </Row>
        <Row label={`Face sheet price (${c})`} error={e("sheet.price")}>
          <Input type="number" step={0.01} value={Number.isFinite(v.sheet.price) ? v.sheet.price : ""} onChange={(x) => setV({ ...v, sheet: { ...v.sheet, price: num(x.target.value) } })} />
        </Row>
        <Row label={`Screw (${c} each)`} error={e("fixings.screwPrice")}>
          <Input type="number" step={0.01} value={Number.isFinite(v.fixings.screwPrice) ? v.fixings.screwPrice : ""} onChange={(x) => setV({ ...v, fixings: { ...v.fixings, screwPrice: num(x.target.value) } })} />
        </Row>
        <Row label={`Wall cleat or hanger (${c} each)`} error={e("fixings.cleatPrice")}>
          <Input type="number" step={0.01} value={Number.isFinite(v.fixings.cleatPrice) ? v.fixings.cleatPrice : ""} onChange={(x) => setV({ ...v, fixings: { ...v.fixings, cleatPrice: num(x.target.value) } })} />
        </Row>
        <Row label={`Bracket (${c} each)`} error={e("fixings.bracketPrice")}>
          <Input type="number" step={0.01} value={Number.isFinite(v.fixings.bracketPrice) ? v.fixings.bracketPrice : ""} onChange={(x) => setV({ ...v, fixings: { ...v.fixings, bracketPrice: num(x.target.value) } })} />
        </Row>
      </Card>

      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : "Save the price list"}
        </Button>
        {message && (
          <span role="alert" className="text-sm font-medium text-outside">
            {message}
          </span>
        )}
        {updatedAt && !message && <span className="text-xs text-ink-faint">Last saved {updatedAt.slice(0, 16).replace("T", " ")} UTC (version {version})</span>}
      </div>
    </form>
  );
}
