import { z } from "zod";
import { emailSchema, idSchema, timestampSchema } from "./common";

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 200;

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN, `At least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `At most ${PASSWORD_MAX} characters`);

export const personNameSchema = z
  .string()
  .trim()
  .min(1, "Enter your name")
  .max(100, "At most 100 characters");

export const siteRoleSchema = z.enum(["admin", "member"]);
export type SiteRole = z.infer<typeof siteRoleSchema>;

/** POST /api/auth/register. Creates the account and signs it in. */
export const registerSchema = z.object({
  email: emailSchema,
  password: passwordSchema,
  name: personNameSchema,
});
export type Register = z.infer<typeof registerSchema>;

/** POST /api/auth/login. The password rule is not re-checked here: any non-empty string. */
export const loginSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password").max(PASSWORD_MAX),
});
export type Login = z.infer<typeof loginSchema>;

/** The public view of an account (never the password hash). */
export const userSchema = z.object({
  id: idSchema,
  email: z.string(),
  name: z.string(),
  siteRole: siteRoleSchema,
  createdAt: timestampSchema,
});
export type User = z.infer<typeof userSchema>;

/** POST /api/auth/forgot. The answer is the same whether or not the account exists. */
export const forgotPasswordSchema = z.object({ email: emailSchema });
export type ForgotPassword = z.infer<typeof forgotPasswordSchema>;

/** POST /api/auth/reset with the token from the e-mailed link `/reset?token=…`. */
export const resetPasswordSchema = z.object({
  token: z.string().trim().min(16, "This reset link is not valid").max(200, "This reset link is not valid"),
  password: passwordSchema,
});
export type ResetPassword = z.infer<typeof resetPasswordSchema>;
