/**
 * The set-up checklist on a new park's staff desk: each item is ticked from the park's own data,
 * never by hand, so it cannot drift from the truth.
 */
export type SetupFacts = {
  settingsSaved: boolean;
  groundLayers: number;
  trails: number;
  members: number;
  reports: number;
  subscribers: number;
};

export type SetupItem = { key: string; label: string; done: boolean; href: string; hint: string };

export function setupChecklist(slug: string, f: SetupFacts): SetupItem[] {
  const staff = `/staff/${slug}`;
  return [
    { key: "settings", label: "Check the park's settings", done: f.settingsSaved, href: `${staff}/settings`, hint: "Time zone, location, elevations and contact details." },
    { key: "ground", label: "Draw the park's ground", done: f.groundLayers > 0, href: `${staff}/settings#ground-heading`, hint: "Boundary, lifts, roads and landmarks as GeoJSON." },
    { key: "trail", label: "Upload the first trail", done: f.trails > 0, href: `${staff}/trails/new`, hint: "A GPX or GeoJSON line from a ride or a survey." },
    { key: "team", label: "Invite the team", done: f.members > 1, href: `${staff}/team`, hint: "Rangers post the morning check; managers run the park." },
    { key: "check", label: "Post the first morning check", done: f.reports > 0, href: `${staff}/morning-check`, hint: "Open, caution or close each trail for the day." },
    { key: "subscriber", label: "Welcome the first subscriber", done: f.subscribers > 0, href: `/parks/${slug}`, hint: "Share the board's link: riders sign up there for closure e-mails." },
  ];
}
