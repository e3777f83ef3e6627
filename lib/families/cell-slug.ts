// Pure: the slug of a generated sheet, `<material>-<sku>-<machine class>` like the hand-made ones, at most 60
// characters; a taken slug gets the cutter's short code.

const slugPart = (text: string) =>
  text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "");
const fit = (text: string, max: number) => text.slice(0, max).replace(/-+$/g, "");

export function cellSlug({
  materialSlug,
  sku,
  machineClassSlug,
  shortCode,
}: {
  materialSlug: string;
  sku: string;
  machineClassSlug: string;
  shortCode?: string;
}): string {
  const tail = [slugPart(sku), machineClassSlug, shortCode ? slugPart(shortCode) : ""].filter(Boolean).join("-");
  return fit(`${fit(materialSlug, Math.max(2, 59 - tail.length))}-${tail}`, 60);
}
