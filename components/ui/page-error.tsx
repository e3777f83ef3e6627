"use client";

import { useRouter } from "next/navigation";
import { startTransition, useEffect, useState } from "react";

import { CATCHING_UP, isDatabaseUnavailable } from "@/lib/db/unavailable";

type Props = { error: Error & { digest?: string }; reset: () => void };

const RETRY_MS = 5_000;

/**
 * What an error boundary shows. A database that is restarting gets a calm "catching up" page that tries
 * again by itself; the error's digest says so, or (when production hides it) the health endpoint does.
 */
export function PageError({ error, reset }: Props) {
  const router = useRouter();
  const [catchingUp, setCatchingUp] = useState<boolean | null>(isDatabaseUnavailable(error) ? true : null);

  useEffect(() => {
    if (catchingUp !== null) return;
    fetch("/api/health", { cache: "no-store" })
      .then((r) => r.json() as Promise<{ database?: string }>)
      .then((health) => setCatchingUp(health.database === "down"))
      .catch(() => setCatchingUp(true));
  }, [catchingUp]);

  const retry = () =>
    startTransition(() => {
      router.refresh();
      reset();
    });

  useEffect(() => {
    if (!catchingUp) return;
    const timer = setTimeout(retry, RETRY_MS);
    return () => clearTimeout(timer);
  });

  if (catchingUp === null)
    return (
      <div role="status" className="py-16 text-center text-stone-600">
        Loading…
      </div>
    );
  return (
    <div role={catchingUp ? "status" : "alert"} className="py-16 text-center">
      <h1 className="text-2xl font-semibold">{catchingUp ? "One moment" : "Something went wrong"}</h1>
      <p className="mt-2 text-stone-600">
        {catchingUp ? `${CATCHING_UP} This page reloads by itself.` : "The page could not be shown. Nothing you saved is lost."}
      </p>
      <button type="button" onClick={retry} className="mt-6 rounded bg-accent px-4 py-2 text-accent-ink">
        Try again
      </button>
    </div>
  );
}
