import type { z } from "zod";
import { changeEmailFields, changePasswordFields, emailOnlyFields, passwordOnlyFields, resetConfirmFields, tokenFields } from "./schemas";

/** The schema each account form checks in the browser before sending; the route checks it again. */
export const ACCOUNT_FORM_SCHEMAS = {
  email: emailOnlyFields,
  token: tokenFields,
  resetConfirm: resetConfirmFields,
  changePassword: changePasswordFields,
  changeEmail: changeEmailFields,
  password: passwordOnlyFields,
} satisfies Record<string, z.ZodType>;
export type AccountFormSchema = keyof typeof ACCOUNT_FORM_SCHEMAS;
