/** A PDF download: a safe file name, never cached by a shared cache (a Library may be for customers only). */
export function pdfResponse(pdf: Buffer, fileName: string): Response {
  const name = fileName.replace(/[^A-Za-z0-9._-]+/g, "-").slice(0, 120) || "sheet";
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="${name}.pdf"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
}
