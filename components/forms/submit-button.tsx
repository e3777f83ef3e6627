"use client";

import type { ReactNode } from "react";
import { useFormStatus } from "react-dom";

export function SubmitButton({
  children,
  pendingText,
  variant = "primary",
}: {
  children: ReactNode;
  pendingText?: string;
  variant?: "primary" | "quiet" | "danger";
}) {
  const { pending } = useFormStatus();
  const styles = {
    primary: "bg-accent text-accent-ink",
    quiet: "border border-stone-300 bg-white text-stone-900",
    danger: "border border-red-700 bg-white text-red-800",
  }[variant];
  return (
    <button type="submit" disabled={pending} className={`min-h-11 rounded px-4 py-2 font-medium disabled:opacity-60 ${styles}`}>
      {pending ? (pendingText ?? "Saving…") : children}
    </button>
  );
}
