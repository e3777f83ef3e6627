"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" onClick={() => void signOut({ callbackUrl: "/" })} className="rounded px-3 py-2 hover:bg-black/10">
      Sign out
    </button>
  );
}
