"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import { createRoomAction, updateRoomAction } from "@/app/(app)/projects/actions";
import { Button, ButtonLink } from "@/components/ui/button";
import { ActionError } from "@/components/ui/action-error";
import { describedBy, Field, Input, Textarea } from "@/components/ui/field";
import { fieldErrors } from "@/lib/api/zod-fields";
import { roomInputSchema, type RoomInput } from "@/lib/schemas/room";
import { feetInchesToMetres, metresToFeetInches, type UnitSystem } from "@/lib/units/length";

const DIMS = [
  { key: "lengthM", label: "Length", hint: "along the main listening axis (x)" },
  { key: "widthM", label: "Width", hint: "side wall to side wall (y)" },
  { key: "heightM", label: "Height", hint: "floor to ceiling (z)" },
] as const;
type DimKey = (typeof DIMS)[number]["key"];

/** What the inputs hold, in the units the person chose; converted to metres before validation. */
type FormValues = { name: string; notes: string; temperatureC: string; humidityPct: string } & Record<`${DimKey}_m` | `${DimKey}_ft` | `${DimKey}_in`, string>;

function toFormValues(room: RoomInput | undefined): FormValues {
  const v = {
    name: room?.name ?? "",
    notes: room?.notes ?? "",
    temperatureC: String(room?.temperatureC ?? 20),
    humidityPct: String(room?.humidityPct ?? 50),
  } as FormValues;
  for (const { key } of DIMS) {
    const m = room?.[key];
    v[`${key}_m`] = m === undefined ? "" : String(+m.toFixed(3));
    const fi = m === undefined ? undefined : metresToFeetInches(m);
    v[`${key}_ft`] = fi ? String(fi.feet) : "";
    v[`${key}_in`] = fi ? String(fi.inches) : "";
  }
  return v;
}

const num = (s: string) => (s.trim() === "" ? Number.NaN : Number(s.replace(",", ".")));

export function RoomForm({ projectId, roomId, version, initial, initialUnits }: { projectId: string; roomId?: string; version?: number; initial?: RoomInput; initialUnits: UnitSystem }) {
  const router = useRouter();
  const [units, setUnits] = useState<UnitSystem>(initialUnits);
  const [formError, setFormError] = useState<{ message: string; conflict: boolean } | null>(null);
  const { register, handleSubmit, setError, getValues, setValue, formState } = useForm<FormValues>({ defaultValues: toFormValues(initial) });
  const err = (k: string) => (formState.errors as Record<string, { message?: string } | undefined>)[k]?.message;

  const metresOf = (v: FormValues, key: DimKey) => (units === "metric" ? num(v[`${key}_m`]) : feetInchesToMetresSafe(num(v[`${key}_ft`]), num(v[`${key}_in`] || "0")));

  function switchUnits(next: UnitSystem) {
    if (next === units) return;
    const v = getValues();
    for (const { key } of DIMS) {
      const m = metresOf(v, key);
      if (!Number.isFinite(m) || m <= 0) continue;
      if (next === "metric") setValue(`${key}_m`, String(+m.toFixed(3)));
      else {
        const fi = metresToFeetInches(m);
        setValue(`${key}_ft`, String(fi.feet));
        setValue(`${key}_in`, String(fi.inches));
      }
    }
    setUnits(next);
  }

  const onSubmit = handleSubmit(async (v) => {
    setFormError(null);
    const candidate = {
      name: v.name,
      notes: v.notes,
      temperatureC: num(v.temperatureC),
      humidityPct: num(v.humidityPct),
      lengthM: metresOf(v, "lengthM"),
      widthM: metresOf(v, "widthM"),
      heightM: metresOf(v, "heightM"),
    };
    const parsed = roomInputSchema.safeParse(candidate);
    if (!parsed.success) {
      for (const [field, messages] of Object.entries(fieldErrors(parsed.error))) setError(field as keyof FormValues, { message: messages[0] });
      return;
    }
    const result = roomId ? await updateRoomAction(roomId, { ...parsed.data, version }) : await createRoomAction(projectId, parsed.data);
    if (result.ok) {
      toast.success(roomId ? "Room saved" : "Room created");
      router.push(`/rooms/${result.data.id}`);
      router.refresh();
      return;
    }
    for (const [field, messages] of Object.entries(result.fields ?? {})) setError(field as keyof FormValues, { message: messages[0] });
    setFormError({ message: result.message, conflict: result.code === "conflict" });
  });

  return (
    <form onSubmit={onSubmit} className="max-w-2xl space-y-5" noValidate>
      <ActionError error={formError} />
      <Field id="name" label="Room name" error={err("name")}>
        <Input {...describedBy("name", err("name"))} {...register("name")} autoFocus />
      </Field>
      <fieldset className="space-y-3">
        <div className="flex items-center justify-between">
          <legend className="text-sm font-medium">Inside dimensions</legend>
          <div role="group" aria-label="Enter dimensions in" className="flex overflow-hidden rounded-md border border-paper-line text-xs">
            {(["metric", "imperial"] as const).map((u) => (
              <button key={u} type="button" aria-pressed={units === u} onClick={() => switchUnits(u)} className={units === u ? "bg-ink px-2.5 py-1 text-paper" : "bg-paper-raised px-2.5 py-1 text-ink-soft hover:bg-paper-sunk"}>
                {u === "metric" ? "metres" : "feet + inches"}
              </button>
            ))}
          </div>
        </div>
        <div className="grid gap-4 sm:grid-cols-3">
          {DIMS.map(({ key, label, hint }) => (
            <Field key={key} id={key} label={label} hint={hint} error={err(key)}>
              {units === "metric" ? (
                <div className="relative">
                  <Input {...describedBy(key, err(key))} {...register(`${key}_m`)} inputMode="decimal" aria-label={`${label} in metres`} className="pr-8" />
                  <span className="pointer-events-none absolute right-3 top-2 text-sm text-ink-faint">m</span>
                </div>
              ) : (
                <div className="flex gap-2" id={key}>
                  <div className="relative flex-1">
                    <Input {...register(`${key}_ft`)} inputMode="numeric" aria-label={`${label}, feet`} aria-invalid={err(key) ? true : undefined} className="pr-7" />
                    <span className="pointer-events-none absolute right-2.5 top-2 text-sm text-ink-faint">ft</span>
                  </div>
                  <div className="relative flex-1">
                    <Input {...register(`${key}_in`)} inputMode="decimal" aria-label={`${label}, inches`} className="pr-7" />
                    <span className="pointer-events-none absolute right-2.5 top-2 text-sm text-ink-faint">in</span>
                  </div>
                </div>
              )}
            </Field>
          ))}
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field id="temperatureC" label="Air temperature (°C)" hint="Sets the speed of sound and air absorption." error={err("temperatureC")}>
          <Input {...describedBy("temperatureC", err("temperatureC"))} {...register("temperatureC")} inputMode="decimal" />
        </Field>
        <Field id="humidityPct" label="Relative humidity (%)" error={err("humidityPct")}>
          <Input {...describedBy("humidityPct", err("humidityPct"))} {...register("humidityPct")} inputMode="decimal" />
        </Field>
      </div>
      <Field id="notes" label="Notes" error={err("notes")}>
        <Textarea {...describedBy("notes", err("notes"))} {...register("notes")} rows={3} />
      </Field>
      <div className="flex gap-2">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : roomId ? "Save room" : "Create room"}
        </Button>
        <ButtonLink variant="secondary" href={roomId ? `/rooms/${roomId}` : `/projects/${projectId}`}>
          Cancel
        </ButtonLink>
      </div>
    </form>
  );
}

/** NaN for a blank or non-numeric entry; a negative entry maps to a negative length so the schema names it. */
function feetInchesToMetresSafe(feet: number, inches: number): number {
  if (!Number.isFinite(feet) || !Number.isFinite(inches)) return Number.NaN;
  if (feet < 0 || inches < 0) return -1;
  return feetInchesToMetres(feet, inches);
}
