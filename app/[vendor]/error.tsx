"use client";

export default function VendorError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="py-16 text-center">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-stone-600">The page could not be shown. Nothing you saved is lost.</p>
      <button type="button" onClick={reset} className="mt-6 rounded bg-accent px-4 py-2 text-accent-ink">
        Try again
      </button>
    </div>
  );
}
