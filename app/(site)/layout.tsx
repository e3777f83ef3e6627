import Link from "next/link";
import type { ReactNode } from "react";

import { SafetyFooter } from "@/components/shell/safety-note";

export default function SiteLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <header data-shell className="border-b border-stone-200 bg-white">
        <div className="mx-auto flex max-w-5xl items-center gap-4 px-4 py-3">
          <Link href="/" className="text-lg font-semibold tracking-tight">Swarfbook</Link>
          <nav className="ml-auto flex gap-2 text-sm">
            <Link href="/sign-in" className="rounded px-3 py-2 hover:bg-stone-100">Sign in</Link>
          </nav>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-5xl flex-1 px-4 py-10">{children}</main>
      <SafetyFooter />
    </div>
  );
}
