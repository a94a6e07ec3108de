import { z } from "zod";
import { PASSWORD_RULE } from "./password";

export const ROLES = ["owner", "engineer", "builder", "client"] as const;
export const ROLE_LABEL: Record<(typeof ROLES)[number], string> = { owner: "Owner", engineer: "Engineer", builder: "Builder", client: "Client" };

export const inviteSchema = z.object({
  email: z.email("Enter an e-mail address").max(254).transform((s) => s.toLowerCase()),
  name: z.string().trim().min(1, "Enter the person's name").max(120),
  role: z.enum(ROLES),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const memberUpdateSchema = z.object({
  role: z.enum(ROLES).optional(),
  active: z.boolean().optional(),
});

export const acceptInviteSchema = z.object({ token: z.string().min(10).max(200), password: PASSWORD_RULE });
