import { usesFakeMail } from "@/lib/server/env";
import { capturedMail } from "@/lib/server/mail/captured";

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
          <li key={m.id} className="card">
            <p className="font-bold">{m.subject}</p>
            <p className="text-sm text-loam-600">to {m.to.join(", ")} · {new Date(m.receivedAt).toLocaleString("en-GB")}</p>
            <pre tabIndex={0} aria-label={`Body of ${m.subject}`} className="mt-2 max-h-64 overflow-auto whitespace-pre-wrap rounded bg-loam-50 p-2 text-xs">{m.text}</pre>
          </li>
        ))}
      </ul>
    </section>
  );
}
