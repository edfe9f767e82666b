/**
 * Why a correct-looking sign-in was refused, as codes: next-auth hands the code to the browser and
 * the sign-in form shows our own words for it, never a server message.
 */
export const SIGN_IN_REFUSAL = { throttled: "throttled", unproven: "unproven", unavailable: "unavailable" } as const;
export type SignInRefusal = (typeof SIGN_IN_REFUSAL)[keyof typeof SIGN_IN_REFUSAL];

export const SIGN_IN_MESSAGES: Record<SignInRefusal | "mismatch", string> = {
  throttled: "Too many failed attempts. Wait 15 minutes and try again.",
  unproven: "Open the link we e-mailed you to prove this address, then sign in.",
  unavailable: "Sign-in is briefly unavailable. Try again in a moment.",
  mismatch: "That e-mail and password do not match an account.",
};

/** The message for next-auth's `error` (a code of ours, "CredentialsSignin", or anything else). */
export function signInMessage(error: string | null | undefined): { code: SignInRefusal | "mismatch"; text: string } {
  const code = error && error in SIGN_IN_MESSAGES ? (error as SignInRefusal) : error === "CredentialsSignin" || !error ? "mismatch" : "unavailable";
  return { code, text: SIGN_IN_MESSAGES[code] };
}
