import "server-only";
import bcrypt from "bcryptjs";
import { readFileSync } from "node:fs";
import path from "node:path";
import { z } from "zod";
import { env } from "@/lib/server/env";

/** ASVS v5.0.0 6.2.1 / 6.2.4: at least 8 characters, common passwords refused. */
let common: Set<string> | undefined;
function commonPasswords(): Set<string> {
  if (!common) {
    const text = readFileSync(path.join(process.cwd(), "data/common-passwords.txt"), "utf8").replace(/^#.*$/gm, "");
    common = new Set(text.split(/\r?\n/).map((l) => l.trim().toLowerCase()).filter(Boolean));
  }
  return common;
}

export const MAX_PASSWORD_BYTES = 72;

export const passwordSchema = z
  .string()
  .min(8, "Use at least 8 characters.")
  .max(128, "Use at most 128 characters.")
  // bcrypt reads only the first 72 bytes: refuse longer rather than silently ignore the rest.
  .refine((p) => Buffer.byteLength(p, "utf8") <= MAX_PASSWORD_BYTES, `Use at most ${MAX_PASSWORD_BYTES} bytes (about 72 letters; accented letters and emoji count as 2–4).`)
  .refine((p) => !commonPasswords().has(p.toLowerCase()), "That password is too common: choose another.");

/** bcrypt with a cost of 12 by default (ASVS 11.4.2: a slow hash). */
export const hashPassword = (password: string) => bcrypt.hash(password, env().BCRYPT_COST);
export const verifyPassword = (password: string, hash: string) => bcrypt.compare(password, hash);

/**
 * Spends one comparison's time when there is no account to compare against, so a wrong password
 * takes as long for an unknown address as for a real one (ASVS v5.0.0 6.3.8: no enumeration by timing).
 */
let standIn: Promise<string> | undefined;
export async function verifyAgainstNothing(password: string): Promise<false> {
  standIn ??= hashPassword("no account has this password");
  await bcrypt.compare(password, await standIn);
  return false;
}
