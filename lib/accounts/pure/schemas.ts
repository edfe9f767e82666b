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
