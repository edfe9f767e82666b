import { redirect } from "next/navigation";
import { getActor } from "@/lib/server/auth/actor";

export default async function RiderLayout({ children }: { children: React.ReactNode }) {
  if (!(await getActor())) redirect("/sign-in?callbackUrl=/me");
  return <>{children}</>;
}
