import { getActor } from "@/lib/server/auth/actor";
import { findOpenInvitation, inviteeAccount, isWithdrawnInvitation } from "@/lib/staff/invitations";
import { AcceptInvitationForm } from "./accept-form";

export const metadata = { title: "Join a park team" };
export const dynamic = "force-dynamic";

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = token.length <= 200 ? await findOpenInvitation(token) : null;
  if (!invitation && token.length <= 200 && (await isWithdrawnInvitation(token))) {
    return (
      <section className="card space-y-2" data-testid="invitation-withdrawn">
        <h1 className="text-2xl font-bold">This invitation was withdrawn</h1>
        <p>The park&apos;s manager took it back. If you still expect to join the team, ask them for a new one.</p>
      </section>
    );
  }
  if (!invitation) {
    return (
      <section className="card space-y-2">
        <h1 className="text-2xl font-bold">This invitation link is not valid</h1>
        <p>It may have expired or been used already. Ask your park manager to send a new one.</p>
      </section>
    );
  }
  const [account, actor] = await Promise.all([inviteeAccount(invitation.email), getActor()]);
  const signedInAsInvitee = account === "proven" && actor?.email === invitation.email;
  const ask = account === "proven" ? (signedInAsInvitee ? "nothing" : "current-password") : "new-password";
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Join {invitation.park?.name}</h1>
      <p>
        You were invited as <strong>{invitation.role}</strong> with the address <strong className="[overflow-wrap:anywhere]">{invitation.email}</strong>.
        {ask === "current-password" && " That address already has an account: enter its password (or sign in as it first) to join."}
        {ask === "nothing" && " You are signed in as that account."}
      </p>
      <AcceptInvitationForm token={token} ask={ask} />
    </section>
  );
}
