"use client";

export default function GlobalError() {
  return (
    <html lang="en">
      <body style={{ fontFamily: "sans-serif", padding: "4rem", textAlign: "center" }}>
        <h1>Something went wrong</h1>
        <p>The page could not be shown. Please reload.</p>
      </body>
    </html>
  );
}
