import Link from "next/link";
import type { ReactNode } from "react";

import { findSessionUser } from "@/lib/auth/session-user";

import { AccountArea } from "./account-area";
import { SafetyFooter } from "./safety-note";

/** The platform's own pages (home, sign-in, operator): the Swarfbook header with the signed-in state. */
export async function SiteShell({ children, width = "max-w-5xl" }: { children: ReactNode; width?: string }) {
  const user = await findSessionUser();
  return (
    <div className="flex min-h-screen flex-col">
      <header data-shell className="border-b border-stone-200 bg-white">
        <div className={`mx-auto flex ${width} flex-wrap items-center gap-4 px-4 py-3`}>
          <Link href="/" className="text-lg font-semibold tracking-tight">
            Swarfbook
          </Link>
          <AccountArea
            userName={user ? user.name || user.email : null}
            signInHref="/sign-in"
            links={[...(user?.isOperator ? [{ href: "/operator", label: "Operator" }] : []), { href: "/account", label: "Your account" }]}
          />
        </div>
      </header>
      <main id="main" className={`mx-auto w-full ${width} flex-1 px-4 py-10`}>
        {children}
      </main>
      <SafetyFooter />
    </div>
  );
}
