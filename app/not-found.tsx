import Link from "next/link";

export default function NotFound() {
  return (
    <section className="card space-y-2">
      <h1 className="text-2xl font-bold">Nothing here</h1>
      <p>That page does not exist, or the park or trail has moved.</p>
      <Link href="/" className="btn-quiet">Back to the parks</Link>
    </section>
  );
}
