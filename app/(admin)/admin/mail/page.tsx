import { usesFakeMail } from "@/lib/server/env";
import { capturedMail } from "@/lib/server/mail/captured";
import { formatParkDateTime } from "@/lib/shared/park-clock";

export const metadata = { title: "Sent mail (local)" };
export const dynamic = "force-dynamic";

export default async function CapturedMailPage() {
  if (!usesFakeMail()) return <p className="card">A real mail server is configured: nothing is captured here.</p>;
  const messages = (await capturedMail()).reverse();
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Mail caught by the local mail server</h1>
      <p className="text-loam-700">Only in development and tests: nothing here left this machine.</p>
      {messages.length === 0 && <p className="card">No messages yet.</p>}
      <ul className="space-y-3">
        {messages.map((m) => (
          <li key={m.id} className="card space-y-2" data-testid="captured-mail">
            <p className="font-bold">{m.subject}</p>
            <p className="text-sm text-loam-600">
              to {m.to.join(", ")} · {formatParkDateTime(new Date(m.receivedAt))}
            </p>
            <pre tabIndex={0} aria-label={`Text of ${m.subject}`} className="max-h-64 overflow-auto whitespace-pre-wrap rounded bg-loam-50 p-2 text-xs">
              {m.text}
            </pre>
            {m.html && (
              <details>
                <summary className="min-h-tap cursor-pointer content-center font-semibold">As the rider sees it (HTML)</summary>
                {/* Sandboxed with nothing allowed: no scripts, no same-origin access; links open nowhere from here. */}
                <iframe title={`HTML of ${m.subject}`} sandbox="" srcDoc={m.html} className="mt-2 h-96 w-full rounded border border-loam-200 bg-white" />
              </details>
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}
