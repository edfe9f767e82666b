import "server-only";
import { z } from "zod";
import { DEFAULT_DATABASE_URL } from "@/models/database-url";

/**
 * The environment, read and validated once. Defaults let `npm start` and `npm test`
 * run with no .env at all; scripts/start.sh exports the values it generates.
 */
/** The development fallback: refused in production (below), where a real secret must be set. */
const DEV_SECRET = "dev-only-secret-change-me-0123456789";

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().url().default(DEFAULT_DATABASE_URL),
  DATABASE_REPLICA_URLS: z.string().optional(),
  APP_URL: z.string().url().default("http://localhost:3000"),
  NEXTAUTH_SECRET: z.string().min(16).default(DEV_SECRET),
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
  /** Web Push (RFC 8292): the application server's P-256 key pair, base64url, and a contact for push services. */
  VAPID_PUBLIC_KEY: z.string().regex(/^[A-Za-z0-9_-]{87}$/, "an uncompressed P-256 public key, base64url").optional(),
  VAPID_PRIVATE_KEY: z.string().regex(/^[A-Za-z0-9_-]{43}$/, "a P-256 private key, base64url").optional(),
  VAPID_SUBJECT: z.string().regex(/^(mailto:|https:)/, "a mailto: or https: contact").default("mailto:no-reply@loamcast.test"),
  /** The local fake push service (npm start and npm test run it); browsers' endpoints here may be plain http. */
  FAKE_PUSH_URL: z.string().url().optional(),
  MAP_STYLE_URL: z.string().url().optional(),
  /** Open-Meteo (https://api.open-meteo.com) or the local fake; unset: no weather is fetched. */
  WEATHER_URL: z.string().url().optional(),
  WEATHER_TIMEOUT_MS: z.coerce.number().int().min(100).max(60_000).default(8000),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(12),
  SECURE_COOKIES: z.enum(["true", "false"]).optional(),
  /** Reverse proxies in front of the app that append to X-Forwarded-For (0: the socket peer is the client). */
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(10).default(0),
}).refine((e) => e.PHOTO_STORAGE !== "s3" || e.S3_BUCKET, { message: "PHOTO_STORAGE=s3 needs S3_BUCKET", path: ["S3_BUCKET"] });

export type Env = z.infer<typeof envSchema>;

/** Production must not run with the development secret or none (anyone could forge a session). */
const productionSafe = envSchema.superRefine((value, ctx) => {
  if (value.NODE_ENV === "production" && value.NEXTAUTH_SECRET === DEV_SECRET) {
    ctx.addIssue({ code: "custom", path: ["NEXTAUTH_SECRET"], message: "set a secret of your own in production (see .env.example)" });
  }
});

let cached: Env | undefined;

export function env(): Env {
  if (!cached) {
    // An empty value counts as unset, so `NEXTAUTH_SECRET=` falls to the default and is refused in production.
    const present = Object.fromEntries(Object.entries(process.env).filter(([, v]) => v !== ""));
    const parsed = productionSafe.safeParse(present);
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
