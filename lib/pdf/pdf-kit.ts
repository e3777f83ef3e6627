import "server-only";

import { existsSync } from "node:fs";
import { Font, StyleSheet } from "@react-pdf/renderer";
import QRCode from "qrcode";

// The building blocks every printed sheet shares: one font set, one text fallback, base styles and QR codes.

// DejaVu covers Ø, ≈, ±, →, ≥ and the no-break space; without it the built-in Helvetica is used and the
// few symbols outside Latin-1 are spelt out.
const DEJAVU = "/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf";
const DEJAVU_BOLD = "/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf";
const hasDejaVu = existsSync(DEJAVU) && existsSync(DEJAVU_BOLD);
if (hasDejaVu) Font.register({ family: "DejaVu", fonts: [{ src: DEJAVU }, { src: DEJAVU_BOLD, fontWeight: "bold" }] });
Font.registerHyphenationCallback((word) => [word]);

export const pdfFamily = hasDejaVu ? "DejaVu" : "Helvetica";

/** Text safe for the font in use: with Helvetica the few symbols outside Latin-1 are spelt out. */
export const pdfText = (text: string) =>
  hasDejaVu
    ? text
    : text
        .replace(/→/g, "->")
        .replace(/[\u00a0\u202f]/g, " ")
        .replace(/·/g, "x")
        .replace(/³/g, "3")
        .replace(/≥/g, ">=")
        .replace(/≤/g, "<=");

export const pdfBase = StyleSheet.create({
  page: { padding: 32, fontSize: 9, fontFamily: pdfFamily, color: "#1c1917" },
  h1: { fontSize: 15, fontWeight: "bold" },
  h2: { fontSize: 10, fontWeight: "bold", marginTop: 10, marginBottom: 4 },
  muted: { color: "#57534e" },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: "#d6d3d1", paddingVertical: 3 },
  th: { fontWeight: "bold" },
  li: { marginBottom: 3 },
  qr: { width: 72, height: 72 },
});

/** A QR code of `url` as a PNG data URL, sized for print. */
export const qrDataUrl = (url: string) => QRCode.toDataURL(url, { margin: 1, width: 240, errorCorrectionLevel: "M" });
