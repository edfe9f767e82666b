import "server-only";
import { primaryRole, type Actor } from "@/lib/server/auth/permissions";

export type NavLink = { href: string; label: string };

/** Navigation is data: which links each role sees. Pages still check permissions themselves. */
export function navigationFor(actor: Actor | null): NavLink[] {
  const role = primaryRole(actor);
  const links: NavLink[] = [
    { href: "/", label: "Parks" },
    { href: "/pressure", label: "Tyre pressure" },
  ];
  if (role === "anonymous") return [...links, { href: "/sign-in", label: "Sign in" }];
  links.push({ href: "/me", label: "My bike" });
  if (role === "manager" || role === "ranger" || role === "admin") links.push({ href: "/staff", label: "Staff desk" });
  if (role === "admin") links.push({ href: "/admin/parks", label: "All parks" }, { href: "/admin/mail", label: "Sent mail" });
  return links;
}
