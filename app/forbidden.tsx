import Link from "next/link";

/** Answered with status 403 by forbidden() (staff and admin pages for an account without the role). */
export default function Forbidden() {
  return (
    <section className="card space-y-2" data-testid="refused">
      <h1 className="text-2xl font-bold">Not for this account</h1>
      <p>Staff pages are for park managers and rangers; ask your park manager for an invitation. Admin pages are for site admins.</p>
      <Link href="/" className="btn-quiet">Back to the parks</Link>
    </section>
  );
}
