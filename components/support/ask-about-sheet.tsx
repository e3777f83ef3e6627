import Link from "next/link";

/** Leads to a new ticket about this sheet version (and the machine, when the page knows it). */
export function AskAboutSheet({
  vendorSlug,
  vendorName,
  sheetVersionId,
  machineId,
}: {
  vendorSlug: string;
  vendorName: string;
  sheetVersionId: string;
  machineId?: string;
}) {
  const query = new URLSearchParams({ sheetVersion: sheetVersionId, ...(machineId ? { machine: machineId } : {}) });
  return (
    <Link
      href={`/${vendorSlug}/support/new?${query}`}
      data-ask-about-sheet
      className="no-print inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4 font-medium"
    >
      Ask {vendorName} about this sheet
    </Link>
  );
}
