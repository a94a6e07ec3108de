import { z } from "zod";
import { FEE_CURRENCIES, toMinorUnits } from "./money";

/** The owner's fee form: amount typed as money ("850.00"), stored in minor units. */
export const feeSettingsSchema = z
  .object({
    basis: z.enum(["per-report", "per-project"], { error: "Choose per report or per project" }),
    amount: z
      .string()
      .trim()
      .refine((s) => {
        try {
          return toMinorUnits(s) <= 100_000_000;
        } catch {
          return false;
        }
      }, "Enter an amount such as 850 or 850.00 (at most 1 000 000)"),
    currency: z.enum(FEE_CURRENCIES, { error: "Choose a currency" }),
    downloadsWaitForPayment: z.boolean().default(false),
  })
  .meta({ id: "FeeSettings" });

export type FeeSettingsInput = z.infer<typeof feeSettingsSchema>;

/** POST /invoices: raise an invoice for the firm's fee (per-report fees name the report). */
export const raiseInvoiceSchema = z
  .object({
    projectId: z.uuid({ error: "projectId must be a project id" }),
    reportId: z.uuid({ error: "reportId must be a report id" }).optional(),
  })
  .strict()
  .meta({ id: "RaiseInvoice" });

export type RaiseInvoiceInput = z.infer<typeof raiseInvoiceSchema>;
