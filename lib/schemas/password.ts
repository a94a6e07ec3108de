import { z } from "zod";

export const PASSWORD_RULE = z
  .string()
  .min(10, "Use at least 10 characters")
  .max(200, "Use at most 200 characters");

export const signInSchema = z.object({
  email: z.string().trim().min(1, "Enter your e-mail address").max(254).transform((s) => s.toLowerCase()),
  password: z.string().min(1, "Enter your password").max(200),
});

export const resetRequestSchema = z.object({ email: z.string().trim().max(254).pipe(z.email("Enter an e-mail address")).transform((s) => s.toLowerCase()) });
export const resetPasswordSchema = z.object({ token: z.string().min(10).max(200), password: PASSWORD_RULE });
