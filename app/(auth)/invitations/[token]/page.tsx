import { findOpenInvitation, isWithdrawnInvitation } from "@/lib/staff/invitations";
import { User } from "@/models";
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
  const existing = await User.count({ where: { email: invitation.email } });
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Join {invitation.park?.name}</h1>
      <p>
        You were invited as <strong>{invitation.role}</strong> with the address <strong className="[overflow-wrap:anywhere]">{invitation.email}</strong>.
        {existing > 0 && " You already have an account: after joining, sign in with your usual password."}
      </p>
      <AcceptInvitationForm token={token} needsPassword={existing === 0} />
    </section>
  );
}
