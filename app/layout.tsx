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
      <body className="min-h-screen font-sans">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:fixed focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-4 focus:py-2 focus:text-stone-900 focus:shadow"
        >
          Skip to the content
        </a>
        {children}
      </body>
    </html>
  );
}
