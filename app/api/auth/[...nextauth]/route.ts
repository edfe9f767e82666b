// next-auth's own endpoints (sign-in, sign-out, session, CSRF token).
import NextAuth from "next-auth";
import { authOptions } from "@/lib/server/auth/options";

const auth = NextAuth(authOptions);
export { auth as GET, auth as POST };
