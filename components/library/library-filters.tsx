import type { Cutter, MachineClass, Material } from "@/lib/catalogue/catalogue-types";
import type { LibraryFilters as Filters } from "@/lib/sheets/list-published-sheets";

/** `shop`: null hides "fits my shop" (visitors, staff without a Bench); true or false is its state. */
type Props = {
  action: string;
  filters: Filters;
  cutters: Cutter[];
  materials: Material[];
  machineClasses: MachineClass[];
  shop?: boolean | null;
};

const select = "min-h-11 w-full max-w-full rounded border border-stone-300 bg-white px-3 py-2 sm:w-auto";

/** Browse by cutter, material and machine class: a plain GET form, so it works without JavaScript. */
export function LibraryFilters({ action, filters, cutters, materials, machineClasses, shop = null }: Props) {
  return (
    <form action={action} method="get" className="no-print mb-6 flex flex-wrap items-end gap-3" aria-label="Filter sheets">
      <label className="flex min-w-0 max-w-full flex-col gap-1 text-sm font-medium">
        Cutter
        <select name="cutter" defaultValue={filters.cutter ?? ""} className={select}>
          <option value="">All cutters</option>
          {cutters.map((c) => (
            <option key={c.id} value={c.sku}>
              {c.sku} · {c.name}
            </option>
          ))}
        </select>
      </label>
      <label className="flex min-w-0 max-w-full flex-col gap-1 text-sm font-medium">
        Material
        <select name="material" defaultValue={filters.material ?? ""} className={select}>
          <option value="">All materials</option>
          {materials.map((m) => (
            <option key={m.id} value={m.slug}>
              {m.name}
            </option>
          ))}
        </select>
      </label>
      <label className="flex min-w-0 max-w-full flex-col gap-1 text-sm font-medium">
        Machine class
        <select name="machineClass" defaultValue={filters.machineClass ?? ""} className={select}>
          <option value="">All machine classes</option>
          {machineClasses.map((k) => (
            <option key={k.id} value={k.slug}>
              {k.name}
            </option>
          ))}
        </select>
      </label>
      {shop === null ? null : (
        <label className="flex min-h-11 items-center gap-2 text-sm font-medium">
          <input type="checkbox" name="shop" value="mine" defaultChecked={shop} className="h-5 w-5" />
          Fits my shop
        </label>
      )}
      <button type="submit" className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
        Show sheets
      </button>
      {filters.cutter || filters.material || filters.machineClass || shop ? (
        <a href={action} className="min-h-11 px-2 py-2 text-sm underline">
          Clear filters
        </a>
      ) : null}
    </form>
  );
}
