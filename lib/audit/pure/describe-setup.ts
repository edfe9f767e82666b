/** One line for each team, settings and ground change on the park's activity page. */
export const SETUP_ACTIONS = ["park.create", "park.update", "ground.replace", "ground.clear", "staff.invite", "staff.join", "staff.role", "staff.remove", "staff.invite-revoke", "staff.invite-resend"] as const;

type Data = Record<string, unknown>;
const str = (v: unknown) => (typeof v === "string" ? v : "");

export function describeSetupEvent(action: string, data: Data, subjectName: string | null): string {
  const who = subjectName ?? "a former member";
  switch (action) {
    case "park.create":
      return `Created the park ${str(data.name)}`;
    case "park.update": {
      const changed = Array.isArray(data.changed) ? data.changed.map(String) : [];
      return changed.length ? `Changed the settings: ${changed.join(", ")}` : "Saved the settings unchanged";
    }
    case "ground.replace":
      return `Uploaded the ${str(data.layer)} layer (${Number(data.features) || 0} shapes)`;
    case "ground.clear":
      return `Cleared the ${str(data.layer)} layer`;
    case "staff.invite":
      return `Invited ${str(data.email)} as ${str(data.role)}`;
    case "staff.join":
      return `Joined the team as ${str(data.role)}`;
    case "staff.role":
      return `Made ${who} ${str(data.to)} (was ${str(data.from)})`;
    case "staff.remove":
      return `Removed ${who} from the team`;
    case "staff.invite-revoke":
      return `Withdrew the invitation to ${str(data.email)}`;
    case "staff.invite-resend":
      return `Sent the invitation to ${str(data.email)} again`;
    default:
      return action;
  }
}
