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

// The fields without defaults: an update must never fill an absent field with its default.
const projectFields = z.object({
  name: text(120, "Name").min(1, "Give the project a name"),
  clientName: text(120, "Client name").min(1, "Name the client"),
  siteAddress: text(300, "Address"),
  status: z.enum(PROJECT_STATUSES),
  notes: text(5000, "Notes"),
  clientUserId: z.string().max(64).nullable().describe("A client member of the firm who may read this project"),
  builderIds: z.array(z.string().max(64)).max(20).describe("Builder members assigned to this project"),
});

/** A project as the engineer edits it (one schema for the form, the action and the API). */
export const projectInputSchema = projectFields.extend({
  siteAddress: projectFields.shape.siteAddress.default(""),
  status: projectFields.shape.status.default("survey"),
  notes: projectFields.shape.notes.default(""),
  clientUserId: projectFields.shape.clientUserId.default(null),
  builderIds: projectFields.shape.builderIds.default([]),
});
export type ProjectInput = z.infer<typeof projectInputSchema>;

/** A partial update: only the fields sent change. */
export const projectUpdateSchema = projectFields.partial().extend({
  version: z.number().int().positive().describe("The version you read; a stale version gets 409"),
});
export type ProjectUpdate = z.infer<typeof projectUpdateSchema>;
