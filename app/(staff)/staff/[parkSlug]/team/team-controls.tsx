"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/lib/client/api-request";

type Role = "manager" | "ranger";

/** Runs one team change and shows the server's answer (a refusal such as "last manager" says why). */
function useTeamCall() {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, setPending] = useState(false);
  async function run(method: "POST" | "PATCH" | "DELETE", url: string, body: unknown, done: string) {
    setPending(true);
    const result = await sendJson(method, url, body);
    setPending(false);
    setMessage(result.ok ? { ok: true, text: done } : { ok: false, text: result.error.message });
    if (result.ok) router.refresh();
  }
  const note = message && <p role={message.ok ? "status" : "alert"} className={`w-full text-sm font-semibold ${message.ok ? "text-moss-700" : "text-brick-600"}`}>{message.text}</p>;
  return { run, pending, note };
}

export function MemberControls({ parkSlug, userId, name, role }: { parkSlug: string; userId: string; name: string; role: Role }) {
  const { run, pending, note } = useTeamCall();
  const url = `/api/parks/${parkSlug}/staff/${userId}`;
  const other: Role = role === "manager" ? "ranger" : "manager";
  return (
    <div className="flex flex-wrap gap-2">
      <button type="button" className="btn-quiet" disabled={pending} onClick={() => run("PATCH", url, { role: other }, `${name} is now ${other}.`)}>
        Make {other}
      </button>
      <button
        type="button"
        className="btn-quiet text-brick-600"
        disabled={pending}
        onClick={() => window.confirm(`Remove ${name} from the team? Their access ends with their next page.`) && run("DELETE", url, undefined, `${name} was removed from the team.`)}
      >
        Remove
      </button>
      {note}
    </div>
  );
}

export function InvitationControls({ parkSlug, id, email }: { parkSlug: string; id: string; email: string }) {
  const { run, pending, note } = useTeamCall();
  const url = `/api/parks/${parkSlug}/invitations/${id}`;
  return (
    <div className="flex flex-wrap gap-2">
      <button type="button" className="btn-quiet" disabled={pending} onClick={() => run("POST", `${url}/resend`, undefined, `A new link went to ${email}; the old one no longer works.`)}>
        Send again
      </button>
      <button type="button" className="btn-quiet text-brick-600" disabled={pending} onClick={() => run("DELETE", url, undefined, `The invitation to ${email} was withdrawn.`)}>
        Withdraw
      </button>
      {note}
    </div>
  );
}
