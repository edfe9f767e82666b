import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { safeCallbackUrl } from "@/lib/accounts/pure/callback-url";
import { env } from "@/lib/server/env";
import { User } from "@/models";
import { clientAddress } from "./client-address";
import { verifyAgainstNothing, verifyPassword } from "./password";
import { recordSignIn, signInBlocked } from "./rate-limit";
import { endAllSessions } from "./sessions";
import { SIGN_IN_REFUSAL, type SignInRefusal } from "@/lib/accounts/pure/sign-in-refusals";
import { isDatabaseUnavailable } from "@/lib/shared/db-errors";
import { recordAudit } from "@/lib/audit/record";

const credentialsSchema = z.object({ email: z.string().trim().toLowerCase().email().max(254), password: z.string().min(1).max(128) });

/** Absolute session lifetime (ASVS 7.3.2); the idle timeout is the JWT maxAge below (7.3.1). */
const ABSOLUTE_SESSION_SECONDS = 7 * 24 * 3600;
const IDLE_SESSION_SECONDS = 12 * 3600;

/** A refusal the sign-in form explains itself; its code is all that reaches the browser. */
class SignInRefused extends Error {
  constructor(readonly code: SignInRefusal) {
    super(code);
  }
}

/** Checks e-mail and password (throttled per account and address); the user for next-auth, or null. */
async function checkCredentials(raw: unknown, headers: Record<string, string> | undefined) {
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  const ip = clientAddress(headers);
  if (await signInBlocked(email, ip)) {
    await recordAudit({ parkId: null, actorId: null, action: "auth.sign-in.throttled", subjectType: "email", subjectId: null, data: { ip } });
    throw new SignInRefused(SIGN_IN_REFUSAL.throttled);
  }
  const user = await User.findOne({ where: { email }, useMaster: true }); // an account made a moment ago
  // An unknown address still costs one hash, so timing tells nothing (ASVS v5.0.0 6.3.8).
  const ok = user ? !user.disabledAt && (await verifyPassword(password, user.passwordHash)) : await verifyAgainstNothing(password);
  await recordSignIn(email, ip, ok);
  if (ok && user && !user.emailVerifiedAt) {
    await recordAudit({ parkId: null, actorId: user.id, action: "auth.sign-in.unproven", subjectType: "user", subjectId: user.id, data: { ip } });
    throw new SignInRefused(SIGN_IN_REFUSAL.unproven);
  }
  await recordAudit({ parkId: null, actorId: ok ? user!.id : null, action: ok ? "auth.sign-in" : "auth.sign-in.failed", subjectType: "email", subjectId: null, data: { ip } });
  if (!ok || !user) return null;
  return { id: user.id, email: user.email, name: user.name, sessionVersion: user.sessionVersion };
}

export const authOptions: NextAuthOptions = {
  secret: env().NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: IDLE_SESSION_SECONDS, updateAge: 15 * 60 },
  useSecureCookies: env().SECURE_COOKIES ? env().SECURE_COOKIES === "true" : env().APP_URL.startsWith("https://"),
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw, req) {
        try {
          return await checkCredentials(raw, req?.headers as Record<string, string> | undefined);
        } catch (error) {
          if (error instanceof SignInRefused) throw error;
          // Never a driver's message ("connect ECONNREFUSED …") on the sign-in form (ASVS v5.0.0 16.5.1).
          console.error(isDatabaseUnavailable(error) ? "[auth] database unavailable during sign-in:" : "[auth] sign-in failed:", (error as Error).message);
          throw new SignInRefused(SIGN_IN_REFUSAL.unavailable);
        }
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.sv = (user as { sessionVersion?: number }).sessionVersion ?? 0;
        token.authTime = Math.floor(Date.now() / 1000);
      }
      const authTime = typeof token.authTime === "number" ? token.authTime : 0;
      if (Date.now() / 1000 - authTime > ABSOLUTE_SESSION_SECONDS) return { expired: true };
      return token;
    },
    async session({ session, token }) {
      if (token.expired || !token.sub) return { ...session, user: undefined };
      session.user = { ...(session.user ?? {}), id: token.sub, sessionVersion: typeof token.sv === "number" ? token.sv : -1 };
      return session;
    },
    /** Only a path on our own origin, whatever next-auth was handed (no open redirect, ASVS v5.0.0 3.7.2). */
    async redirect({ url }) {
      return new URL(safeCallbackUrl(url, env().APP_URL), env().APP_URL).toString();
    },
  },
  events: {
    /** Sign-out ends the session on the server too: a copied cookie is refused from now on (ASVS 7.4.1). */
    async signOut({ token }) {
      if (token?.sub) {
        await endAllSessions(token.sub);
        await recordAudit({ parkId: null, actorId: token.sub, action: "auth.sign-out", subjectType: "user", subjectId: token.sub });
      }
    },
  },
};
