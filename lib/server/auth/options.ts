import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { env } from "@/lib/server/env";
import { recordAudit } from "@/lib/audit/record";
import { User } from "@/models";
import { verifyPassword } from "./password";
import { recordSignIn, signInBlocked } from "./rate-limit";

const credentialsSchema = z.object({ email: z.string().trim().toLowerCase().email().max(254), password: z.string().min(1).max(128) });

/** Absolute session lifetime (ASVS 7.3.2); the idle timeout is the JWT maxAge below (7.3.1). */
const ABSOLUTE_SESSION_SECONDS = 7 * 24 * 3600;
const IDLE_SESSION_SECONDS = 12 * 3600;

function clientIp(headers: Record<string, string | string[] | undefined> | undefined): string {
  const forwarded = headers?.["x-forwarded-for"];
  const first = (Array.isArray(forwarded) ? forwarded[0] : forwarded)?.split(",")[0]?.trim();
  return (first || "local").slice(0, 64);
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
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) return null;
        const { email, password } = parsed.data;
        const ip = clientIp(req?.headers as Record<string, string> | undefined);
        if (await signInBlocked(email, ip)) {
          await recordAudit({ parkId: null, actorId: null, action: "auth.sign-in.throttled", subjectType: "email", subjectId: null, data: { ip } });
          throw new Error("Too many failed attempts. Wait 15 minutes and try again.");
        }
        const user = await User.findOne({ where: { email }, useMaster: true }); // an account made a moment ago
        const ok = Boolean(user && !user.disabledAt && (await verifyPassword(password, user.passwordHash)));
        await recordSignIn(email, ip, ok);
        await recordAudit({
          parkId: null,
          actorId: ok ? user!.id : null,
          action: ok ? "auth.sign-in" : "auth.sign-in.failed",
          subjectType: "email",
          subjectId: null,
          data: { ip },
        });
        if (!ok || !user) return null;
        return { id: user.id, email: user.email, name: user.name };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.authTime = Math.floor(Date.now() / 1000);
      }
      const authTime = typeof token.authTime === "number" ? token.authTime : 0;
      if (Date.now() / 1000 - authTime > ABSOLUTE_SESSION_SECONDS) return { expired: true };
      return token;
    },
    async session({ session, token }) {
      if (token.expired || !token.sub) return { ...session, user: undefined };
      session.user = { ...(session.user ?? {}), id: token.sub };
      return session;
    },
  },
};
