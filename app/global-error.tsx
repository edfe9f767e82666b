"use client";

import "./globals.css";

/**
 * Shown when the root layout itself fails (app/error.tsx covers everything below it). It replaces
 * the layout, so it brings its own <html> and <body>. The reference is the digest logged on the server.
 */
export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body className="min-h-screen font-sans">
        <main className="mx-auto max-w-xl space-y-3 px-4 py-10" role="alert">
          <h1 className="text-2xl font-bold">Loamcast is having trouble</h1>
          <p>This page could not be shown. Nothing you saved is lost. Try again, or come back in a few minutes.</p>
          <p className="text-loam-800">Before you ride, check the park&apos;s own signs and staff for today&apos;s trail status.</p>
          {error.digest ? <p className="text-sm text-loam-600">Reference for the park team: <code>{error.digest}</code></p> : null}
          <button type="button" onClick={reset} className="btn-quiet">Try again</button>
        </main>
      </body>
    </html>
  );
}
