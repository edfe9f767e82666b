import { z } from "zod";
import { nameCheck } from "@/lib/shared/text";

export const emailSchema = z.string().trim().toLowerCase().email("Enter a valid e-mail address.").max(254);
export const nameSchema = z.string().trim().min(1, "Enter your name.").max(80, "Use at most 80 characters.").superRefine(nameCheck("Your name"));

/** The password rule itself lives in lib/server/auth/password.ts (it reads the common-password list on the server). */
export const signUpFields = z.object({ name: nameSchema, email: emailSchema, password: z.string() }).strict();
export const invitationFields = z
  .object({ email: emailSchema, role: z.enum(["manager", "ranger"], { message: "Choose manager or ranger." }) })
  .strict();
export const acceptInvitationFields = z.object({ token: z.string().min(20).max(200), name: nameSchema, password: z.string() }).strict();

/** Tokens from e-mailed links: base64url, 43 characters when we make them; anything else is refused. */
export const tokenSchema = z.string({ message: "The link's token is missing." }).min(20, "This link is incomplete.").max(200, "This link is not valid.");
export const tokenFields = z.object({ token: tokenSchema }).strict();
export const emailOnlyFields = z.object({ email: emailSchema }).strict();
/** The password rules themselves are checked on the server (lib/server/auth/password.ts). */
export const resetConfirmFields = z.object({ token: tokenSchema, password: z.string().max(1000) }).strict();
export const changePasswordFields = z.object({ currentPassword: z.string().min(1, "Enter your current password.").max(1000), newPassword: z.string().max(1000) }).strict();
export const passwordOnlyFields = z.object({ password: z.string().min(1, "Enter your password.").max(1000) }).strict();
export const changeEmailFields = z.object({ newEmail: emailSchema, password: z.string().min(1, "Enter your password.").max(1000) }).strict();
