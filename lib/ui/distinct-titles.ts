/**
 * Titles that would read the same in one list get their machine class added ("… · Light belt-drive
 * router"), so two sheets for the same cutter and material can be told apart at a glance.
 */
export function distinctTitles<T>(items: T[], title: (item: T) => string, machineClass: (item: T) => string | null | undefined): string[] {
  const counts = new Map<string, number>();
  for (const item of items) counts.set(title(item), (counts.get(title(item)) ?? 0) + 1);
  return items.map((item) => {
    const text = title(item);
    const kind = machineClass(item);
    return (counts.get(text) ?? 0) > 1 && kind && !text.includes(kind) ? `${text} · ${kind}` : text;
  });
}
