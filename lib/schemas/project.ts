import { z } from "zod";

const text = (max: number, label: string) => z.string().trim().max(max, `${label} must be at most ${max} characters`);

export const PROJECT_STATUSES = ["survey", "design", "build", "delivered", "closed"] as const;
export const PROJECT_STATUS_LABEL: Record<(typeof PROJECT_STATUSES)[number], string> = {
  survey: "Survey",
  design: "Design",
  build: "Build",
  delivered: "Delivered",
  closed: "Closed",
};

/** A project as the engineer edits it (one schema for the form, the action and the API). */
export const projectInputSchema = z.object({
  name: text(120, "Name").min(1, "Give the project a name"),
  clientName: text(120, "Client name").min(1, "Name the client"),
  siteAddress: text(300, "Address").default(""),
  status: z.enum(PROJECT_STATUSES).default("survey"),
  notes: text(5000, "Notes").default(""),
  clientUserId: z.string().max(64).nullable().default(null).describe("A client member of the firm who may read this project"),
  builderIds: z.array(z.string().max(64)).max(20).default([]).describe("Builder members assigned to this project"),
});
export type ProjectInput = z.infer<typeof projectInputSchema>;

export const projectUpdateSchema = projectInputSchema.partial().extend({
  version: z.number().int().positive().describe("The version you read; a stale version gets 409"),
});
export type ProjectUpdate = z.infer<typeof projectUpdateSchema>;
