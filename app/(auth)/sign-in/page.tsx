import Link from "next/link";
import { SignInForm } from "./sign-in-form";

export const metadata = { title: "Sign in" };

/** Only same-site paths are accepted as a place to return to (no open redirect). */
function safeCallback(value: string | string[] | undefined) {
  const path = Array.isArray(value) ? value[0] : value;
  return path && path.startsWith("/") && !path.startsWith("//") ? path : "/";
}

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Sign in</h1>
      {params.created && <p role="status" className="rounded-lg bg-moss-100 p-3 text-moss-700">Account created. Sign in to continue.</p>}
      {params.joined && <p role="status" className="rounded-lg bg-moss-100 p-3 text-moss-700">You joined the park team. Sign in to continue.</p>}
      <SignInForm callbackUrl={safeCallback(params.callbackUrl)} />
      <p className="text-sm">
        New rider? <Link href="/sign-up" className="font-semibold text-moss-700 underline">Create an account</Link>
      </p>
    </section>
  );
}
