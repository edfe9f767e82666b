import Link from "next/link";
import { findParkBySlug } from "@/lib/parks/queries";

export const metadata = { title: "Notices confirmed", robots: { index: false } };
export const dynamic = "force-dynamic";

/** Where the confirmation link (GET /api/subscriptions/confirm) sends a browser afterwards. */
export default async function ConfirmedPage({ searchParams }: { searchParams: Promise<{ park?: string; error?: string }> }) {
  const { park: slug, error } = await searchParams;
  const park = !error && slug ? await findParkBySlug(slug) : null;
  if (!park) {
    return (
      <section className="card space-y-2" data-testid="confirm-invalid">
        <h1 className="text-2xl font-bold">This confirmation link does not work</h1>
        <p>It is altered, too old (links last 7 days) or the subscription was changed since. Ask for a new link on <Link href="/me/subscriptions" className="underline">Trail notices</Link>.</p>
      </section>
    );
  }
  return (
    <section className="card space-y-2" data-testid="confirm-done">
      <h1 className="text-2xl font-bold">You will get notices from {park.name}</h1>
      <p>Closures and other notices you chose now come to your inbox. Each e-mail has a link to stop them.</p>
      <p><Link href={`/parks/${park.slug}`} className="underline">Today at {park.name}</Link> · <Link href="/me/subscriptions" className="underline">Your notice e-mails</Link></p>
    </section>
  );
}
