import "server-only";
import { claimMailToRecipient } from "@/lib/server/auth/throttle";
import { sendMail } from "@/lib/server/mail/transport";

type Kind = "prove-address" | "already-registered" | "password-reset" | "password-changed" | "change-email" | "email-changed-notice";

const TEMPLATES: Record<Kind, (v: { link?: string; name?: string; newEmail?: string }) => { subject: string; text: string }> = {
  "prove-address": ({ link, name }) => ({
    subject: "Finish creating your Loamcast account",
    text: `Hello ${name ?? ""},\n\nOpen this link within 24 hours to prove this is your address and finish creating your account:\n${link}\n\nIf you did not sign up, ignore this e-mail: nothing happens without the link.`,
  }),
  "already-registered": ({ link }) => ({
    subject: "Someone tried to sign up with your address",
    text: `Someone (perhaps you) tried to create a Loamcast account with this address, which already has one. No new account was made.\n\nForgot your password? Choose a new one here:\n${link}\n\nIf it was not you, you need do nothing.`,
  }),
  "password-reset": ({ link }) => ({
    subject: "Choose a new Loamcast password",
    text: `Open this link within 1 hour to choose a new password:\n${link}\n\nIt works once. Every device signed in to your account will be signed out.\nIf you did not ask for this, ignore this e-mail: your password stays as it is.`,
  }),
  "password-changed": () => ({
    subject: "Your Loamcast password was changed",
    text: "The password of your Loamcast account was just changed and every other session was signed out.\n\nIf this was not you, choose a new password at once with \"Forgot your password?\" on the sign-in page.",
  }),
  "change-email": ({ link }) => ({
    subject: "Prove your new Loamcast address",
    text: `Open this link within 24 hours to make this address the one your Loamcast account uses:\n${link}\n\nIf you did not ask for this, ignore this e-mail.`,
  }),
  "email-changed-notice": ({ newEmail }) => ({
    subject: "Your Loamcast address is changing",
    text: `Someone signed in to your Loamcast account asked to move it to ${newEmail}. It moves once the link sent there is opened.\n\nIf this was not you, change your password now: that signs out every device.`,
  }),
};

/**
 * Sends one account mail, at most MAILS_PER_RECIPIENT_PER_HOUR of a kind to an address an hour (so
 * nobody can flood an inbox through our forms). A mail server that is down is logged and does not
 * fail the request: the person can ask again (ASVS v5.0.0 16.5.2).
 */
export async function sendAccountMail(to: string, kind: Kind, values: { link?: string; name?: string; newEmail?: string } = {}) {
  if (!(await claimMailToRecipient(to, `account:${kind}`))) return false;
  try {
    await sendMail({ to, ...TEMPLATES[kind](values) });
    return true;
  } catch (error) {
    console.error(`[mail] ${kind} mail could not be sent:`, (error as Error).message);
    return false;
  }
}
