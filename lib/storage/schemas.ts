import { z } from "zod";

export const roomFileKindSchema = z.enum(["photo", "drawing", "client-file"], { error: "kind must be photo, drawing or client-file" });

/** The text fields of a multipart upload (the file itself is the `file` part). */
export const roomFileUploadFieldsSchema = z.object({
  kind: roomFileKindSchema,
  caption: z.string().trim().max(500, "At most 500 characters").default(""),
});

/** PATCH /rooms/{roomId}/files/{fileId}: choose a photo for the report, or caption it. */
export const roomFileUpdateSchema = z
  .object({
    includeInReport: z.boolean().optional(),
    caption: z.string().trim().max(500, "At most 500 characters").optional(),
  })
  .strict()
  .refine((v) => v.includeInReport !== undefined || v.caption !== undefined, { message: "Send includeInReport or caption" })
  .meta({ id: "RoomFileUpdate" });
