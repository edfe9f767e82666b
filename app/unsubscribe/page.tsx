import Link from "next/link";
import { describeUnsubscribe } from "@/lib/notices/subscriptions";

export const metadata = { title: "Stop trail notices", robots: { index: false } };
export const dynamic = "force-dynamic";

/**
 * Where an e-mail's "stop these e-mails" link lands. Opening it changes nothing (mail scanners
 * open links too); the button posts to the one-click endpoint. No sign-in needed.
 */
export default async function UnsubscribePage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const link = await describeUnsubscribe(token).catch(() => null);
  if (!link) {
    return (
      <section className="card space-y-2" data-testid="unsubscribe-invalid">
        <h1 className="text-2xl font-bold">This link does not work</h1>
        <p>It is incomplete, altered or too old. Sign in and choose your e-mails on <Link href="/me/subscriptions" className="underline">Trail notices</Link>.</p>
      </section>
    );
  }
  if (!link.subscribed) {
    return (
      <section className="card space-y-2" data-testid="unsubscribe-done">
        <h1 className="text-2xl font-bold">You are unsubscribed</h1>
        <p>No more notices from {link.park.name} will be e-mailed to you.</p>
        <p>Changed your mind? <Link href={`/me/subscriptions?park=${link.park.slug}`} className="underline">Subscribe again</Link>.</p>
      </section>
    );
  }
  return (
    <section className="card space-y-3">
      <h1 className="text-2xl font-bold">Stop notices from {link.park.name}?</h1>
      <p>You will no longer get closure, reopening or advisory e-mails from this park.</p>
      <form method="post" action={`/api/unsubscribe?token=${encodeURIComponent(token!)}`}>
        <input type="hidden" name="List-Unsubscribe" value="One-Click" />
        <button type="submit" className="btn-primary">Stop these e-mails</button>
      </form>
    </section>
  );
}
