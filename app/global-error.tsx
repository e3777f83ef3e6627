"use client";

import { CATCHING_UP, isDatabaseUnavailable } from "@/lib/db/unavailable";

// The root layout itself failed (it reads the session, so a database restart can land here): plain HTML.
export default function GlobalError({ error }: { error: Error & { digest?: string } }) {
  const catchingUp = isDatabaseUnavailable(error);
  return (
    <html lang="en">
      <body style={{ fontFamily: "sans-serif", padding: "4rem", textAlign: "center" }}>
        <h1>{catchingUp ? "One moment" : "Something went wrong"}</h1>
        <p>{catchingUp ? CATCHING_UP : "The page could not be shown."} Please reload.</p>
      </body>
    </html>
  );
}
