import "./globals.css";

import type { Metadata } from "next";
import type { ReactNode } from "react";

import { inter, jetbrainsMono } from "@/components/fonts";

export const metadata: Metadata = {
  title: { default: "Swarfbook", template: "%s · Swarfbook" },
  description: "Recipe sheets of cutting data from your tool vendor, adapted to your machine.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${inter.variable} ${jetbrainsMono.variable}`}>
      <body className="min-h-screen font-sans">{children}</body>
    </html>
  );
}
