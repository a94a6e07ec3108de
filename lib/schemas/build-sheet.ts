/**
 * zod schemas of the build-sheet inputs: the firm's price list (settings page, server action and
 * PUT /price-list) and a treatment item's site progress (build sheet, server action and
 * PUT /treatment-items/{itemId}/progress). Pure: no React, Next or db imports, so the form, the
 * action and the route handler share them. Bounds follow lib/build-sheet's job schema.
 */
import { z } from "zod";

const metres = (label: string, min: number, max: number) =>
  z
    .number({ error: `${label} must be a number of metres` })
    .finite(`${label} must be a finite number`)
    .min(min, `${label} must be at least ${min * 1000} mm`)
    .max(max, `${label} must be at most ${max * 1000} mm`);
const price = (label: string, max = 1e6) => z.number({ error: `${label} must be a number` }).finite().min(0, `${label} cannot be negative`).max(max, `${label} must be at most ${max}`);

/** Standard insulation slab sizes (length × width, m): 1200 × 600 mm, and 48 × 24 in exactly (1 in = 25.4 mm). */
export const SLAB_PRESETS = {
  metric: { lengthM: 1.2, widthM: 0.6, label: "1200 × 600 mm" },
  imperial: { lengthM: 1.2192, widthM: 0.6096, label: "48 × 24 in" },
} as const;

/** The firm's price list and stock sizes, as the owner edits it. */
export const priceListInputSchema = z
  .object({
    currency: z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, "Use a three-letter currency code such as EUR or GBP"),
    lumber: z.object({
      thicknessM: metres("Section thickness", 0.005, 0.1),
      widthM: metres("Section width", 0.01, 0.5),
      densityKgM3: z.number().finite().min(100, "Wood density must be at least 100 kg/m³").max(1500, "Wood density must be at most 1500 kg/m³"),
      basis: z.enum(["per-metre", "per-board"], { error: "Choose per metre or per board" }),
      pricePerM: price("Price per metre", 1e4),
      boards: z
        .array(z.object({ lengthM: metres("Board length", 0.3, 12), price: price("Board price", 1e4) }))
        .min(1, "List at least one stock board length")
        .max(10, "At most 10 board lengths"),
    }),
    kerfM: metres("Saw kerf", 0, 0.02),
    slab: z.object({
      standard: z.enum(["metric", "imperial"]),
      lengthM: metres("Slab length", 0.1, 5),
      widthM: metres("Slab width", 0.1, 5),
      prices: z
        .array(z.object({ thicknessM: metres("Slab thickness", 0.005, 0.5), price: price("Slab price", 1e4) }))
        .min(1, "List at least one slab thickness")
        .max(10, "At most 10 slab thicknesses"),
    }),
    fabric: z.object({ pricePerM2: price("Fabric price per m²", 1e4), wrapM: metres("Wrap allowance", 0, 0.3) }),
    sheet: z.object({ lengthM: metres("Sheet length", 0.1, 5), widthM: metres("Sheet width", 0.1, 5), price: price("Sheet price", 1e4) }),
    fixings: z.object({ screwPrice: price("Screw price", 100), cleatPrice: price("Cleat price", 1e3), bracketPrice: price("Bracket price", 1e3) }),
    version: z.number().int().min(0).describe("The version you read (0 when the firm has no price list yet); a stale version gets 409"),
  })
  .superRefine((v, ctx) => {
    const lengths = v.lumber.boards.map((b) => Math.round(b.lengthM * 1000));
    lengths.forEach((l, i) => {
      if (lengths.indexOf(l) !== i) ctx.addIssue({ code: "custom", path: ["lumber", "boards", i, "lengthM"], message: "this board length is listed twice" });
    });
    const thick = v.slab.prices.map((p) => Math.round(p.thicknessM * 1000));
    thick.forEach((t, i) => {
      if (thick.indexOf(t) !== i) ctx.addIssue({ code: "custom", path: ["slab", "prices", i, "thicknessM"], message: "this thickness is listed twice" });
    });
  })
  .meta({ id: "PriceListInput", description: "The firm's materials prices and stock sizes for build sheets (lengths in m, prices in the firm's currency)" });
export type PriceListInput = z.infer<typeof priceListInputSchema>;
/** A stored price list: the input without its version. */
export type PriceListValues = Omit<PriceListInput, "version">;

const day = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Give the day as YYYY-MM-DD")
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), "Not a calendar day")
  .refine((s) => s >= "2000-01-01", "The day must be in 2000 or later")
  .refine((s) => s <= new Date(Date.now() + 36 * 3600_000).toISOString().slice(0, 10), "The day cannot be in the future");

/** Body of PUT /treatment-items/{itemId}/progress: only the fields sent change; null clears a mark. */
export const progressInputSchema = z
  .object({
    builtOn: day.nullable().optional().describe("Day the item was built (YYYY-MM-DD); null clears it"),
    installedOn: day.nullable().optional().describe("Day the item was installed (YYYY-MM-DD); null clears it"),
    note: z.string().trim().max(2000, "The note must be at most 2000 characters").optional(),
  })
  .refine((v) => v.builtOn !== undefined || v.installedOn !== undefined || v.note !== undefined, { message: "Send builtOn, installedOn or note", path: [""] })
  .meta({ id: "ProgressInput", description: "Marks a treatment item built and/or installed on a day, with a note" });
export type ProgressInput = z.infer<typeof progressInputSchema>;
