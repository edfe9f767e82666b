"use client";
import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: "/" })} className="min-h-tap px-3 text-sm font-semibold underline-offset-4 hover:underline">
      Sign out
    </button>
  );
}
