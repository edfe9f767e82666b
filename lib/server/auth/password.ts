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

export const passwordSchema = z
  .string()
  .min(8, "Use at least 8 characters.")
  .max(128, "Use at most 128 characters.")
  .refine((p) => !commonPasswords().has(p.toLowerCase()), "That password is too common: choose another.");

/** bcrypt with a cost of 12 by default (ASVS 11.4.2: a slow hash). */
export const hashPassword = (password: string) => bcrypt.hash(password, env().BCRYPT_COST);
export const verifyPassword = (password: string, hash: string) => bcrypt.compare(password, hash);
