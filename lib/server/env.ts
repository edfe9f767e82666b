import "server-only";
import { z } from "zod";
import { DEFAULT_DATABASE_URL } from "@/models/database-url";

/**
 * The environment, read and validated once. Defaults let `npm start` and `npm test`
 * run with no .env at all; scripts/start.sh exports the values it generates.
 */
const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().url().default(DEFAULT_DATABASE_URL),
  DATABASE_REPLICA_URLS: z.string().optional(),
  APP_URL: z.string().url().default("http://localhost:3000"),
  NEXTAUTH_SECRET: z.string().min(16).default("dev-only-secret-change-me-0123456789"),
  TOKEN_SECRET: z.string().min(16).optional(),
  SMTP_URL: z.string().default("smtp://127.0.0.1:2525"),
  FAKE_SMTP_CONTROL_URL: z.string().url().optional(),
  MAIL_FROM: z.string().default("Loamcast <no-reply@loamcast.test>"),
  PHOTO_STORAGE: z.enum(["local", "s3"]).default("local"),
  PHOTO_STORAGE_DIR: z.string().min(1).default(".local/photos-dev"),
  S3_BUCKET: z.string().min(3).max(63).optional(),
  S3_REGION: z.string().min(1).default("us-east-1"),
  S3_ENDPOINT: z.string().url().optional(),
  S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).default("false"),
  S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
  MAP_STYLE_URL: z.string().url().optional(),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(12),
  SECURE_COOKIES: z.enum(["true", "false"]).optional(),
}).refine((e) => e.PHOTO_STORAGE !== "s3" || e.S3_BUCKET, { message: "PHOTO_STORAGE=s3 needs S3_BUCKET", path: ["S3_BUCKET"] });

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function env(): Env {
  if (!cached) {
    const parsed = envSchema.safeParse(process.env);
    if (!parsed.success) {
      const problems = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
      throw new Error(`Invalid environment: ${problems}`);
    }
    cached = parsed.data;
  }
  return cached;
}

/** Secret for our own signed tokens (invitations, unsubscribe links); falls back to the auth secret. */
export const tokenSecret = () => env().TOKEN_SECRET ?? env().NEXTAUTH_SECRET;

/** True while the app sends to the local fake SMTP server (the default for start and tests). */
export const usesFakeMail = () => Boolean(env().FAKE_SMTP_CONTROL_URL);
