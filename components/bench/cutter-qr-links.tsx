/** Short link and QR downloads for a cutter's box label. */
export function CutterQrLinks({ vendorSlug, sku, shortUrl }: { vendorSlug: string; sku: string; shortUrl: string }) {
  const qr = `/api/v1/vendors/${vendorSlug}/cutters/${encodeURIComponent(sku)}/qr`;
  return (
    <div className="flex flex-wrap items-center gap-3 text-sm">
      {/* eslint-disable-next-line @next/next/no-img-element -- a generated QR code, not a content image */}
      <img
        src={`${qr}?format=svg`}
        alt={`QR code for ${shortUrl}`}
        width={96}
        height={96}
        className="rounded border border-stone-200 bg-white"
      />
      <div className="space-y-1">
        <p>
          Short link:{" "}
          <a className="num underline" href={shortUrl}>
            {shortUrl.replace(/^https?:\/\//, "")}
          </a>
        </p>
        <p className="flex gap-2">
          <a
            className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-3"
            href={`${qr}?format=png&download=1`}
          >
            QR as PNG
          </a>
          <a
            className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-3"
            href={`${qr}?format=svg&download=1`}
          >
            QR as SVG
          </a>
        </p>
      </div>
    </div>
  );
}
