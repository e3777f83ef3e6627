"use client";

// next-auth's client is loaded on the click, not with every page that shows the button.
async function signOutNow() {
  const { signOut } = await import("next-auth/react");
  await signOut({ callbackUrl: "/" });
}

export function SignOutButton() {
  return (
    <button type="button" onClick={() => void signOutNow()} className="rounded px-3 py-2 hover:bg-black/10">
      Sign out
    </button>
  );
}
