import Link from "next/link";
import { JsonForm } from "@/components/account/json-form";
import { safeCallbackUrl } from "@/lib/accounts/pure/callback-url";
import { env } from "@/lib/server/env";
import { SignInForm } from "./sign-in-form";

export const metadata = { title: "Sign in" };

const first = (value: string | string[] | undefined) => (Array.isArray(value) ? value[0] : value);

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const created = Boolean(params.created);
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Sign in</h1>
      {created && (
        <p role="status" className="rounded-lg bg-moss-100 p-3 text-moss-700" data-testid="check-mail">
          Check your inbox: open the link we sent{first(params.email) ? ` to ${first(params.email)}` : ""} to finish creating your account, then sign in here.
        </p>
      )}
      {params.joined && <p role="status" className="rounded-lg bg-moss-100 p-3 text-moss-700">You joined the park team. Sign in to continue.</p>}
      {params.reset && <p role="status" className="rounded-lg bg-moss-100 p-3 text-moss-700">Password changed. Sign in with the new one.</p>}
      {params.proven && <p role="status" className="rounded-lg bg-moss-100 p-3 text-moss-700">Address proven. Sign in to continue.</p>}
      <SignInForm callbackUrl={safeCallbackUrl(params.callbackUrl, env().APP_URL)} />
      <p className="text-sm">
        <Link href="/account/forgot" className="font-semibold text-moss-700 underline">Forgot your password?</Link>
      </p>
      <p className="text-sm">
        New rider? <Link href="/sign-up" className="font-semibold text-moss-700 underline">Create an account</Link>
      </p>
      <details className="text-sm" open={created}>
        <summary className="cursor-pointer font-semibold text-moss-700">No link in your inbox?</summary>
        <div className="mt-2">
          <JsonForm
            url="/api/account/prove-address/resend"
            schema="email"
            fields={[{ name: "email", label: "Address to send it to", type: "email", autoComplete: "email", defaultValue: first(params.email) }]}
            submitLabel="Send the link again"
            busyLabel="Sending…"
            testId="resend-proof"
          />
        </div>
      </details>
    </section>
  );
}
