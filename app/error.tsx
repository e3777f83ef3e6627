"use client";

import { PageError } from "@/components/ui/page-error";

// Pages outside a vendor (sign-in, the operator page) get the same boundary.
export default function RootError(props: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto max-w-3xl px-4">
      <PageError {...props} />
    </main>
  );
}
