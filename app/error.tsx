"use client";

export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <section className="card space-y-2" role="alert">
      <h1 className="text-2xl font-bold">Something went wrong</h1>
      <p>We could not load this page. Your saved data is safe.</p>
      <button type="button" onClick={reset} className="btn-quiet">Try again</button>
    </section>
  );
}
