import type { Knex } from "knex";

/**
 * Join a `sheet_versions as v` query to its sheet (s), cutter (c), material (m) and machine class (k),
 * each join also matching vendor_id so a row can never pair with another vendor's catalogue.
 */
export function joinSheetCatalogue<T extends Knex.QueryBuilder>(query: T): T {
  return query
    .join("sheets as s", function () {
      this.on("s.id", "v.sheet_id").andOn("s.vendor_id", "v.vendor_id");
    })
    .join("cutters as c", function () {
      this.on("c.id", "s.cutter_id").andOn("c.vendor_id", "s.vendor_id");
    })
    .join("materials as m", function () {
      this.on("m.id", "s.material_id").andOn("m.vendor_id", "s.vendor_id");
    })
    .join("machine_classes as k", function () {
      this.on("k.id", "s.machine_class_id").andOn("k.vendor_id", "s.vendor_id");
    }) as T;
}
