import type { SetupOverrides } from "@/content-schema/setup-fields";
import type { AdaptResult, EntryCapability, UnitSystem } from "@/lib/machining";

export type Setup = {
  id: string;
  name: string;
  machineId: string;
  sheetVersionId: string;
  operationIndex: number;
  overrides: SetupOverrides;
  result: AdaptResult;
  units: UnitSystem;
  /** What the customer's CAM can do to enter the material; the setup was computed with it. */
  entryCapability: EntryCapability;
  createdAt: string;
};

export const SETUP_COLUMNS = [
  "st.id",
  "st.name",
  "st.machine_id",
  "st.sheet_version_id",
  "st.operation_index",
  "st.overrides",
  "st.result",
  "st.units",
  "st.entry_capability",
  "st.created_at",
];

type Row = {
  id: string;
  name: string;
  machine_id: string;
  sheet_version_id: string;
  operation_index: number;
  overrides: SetupOverrides;
  result: AdaptResult;
  units: UnitSystem;
  entry_capability: EntryCapability;
  created_at: Date;
};

export const rowToSetup = (row: Row): Setup => ({
  id: row.id,
  name: row.name,
  machineId: row.machine_id,
  sheetVersionId: row.sheet_version_id,
  operationIndex: row.operation_index,
  overrides: row.overrides ?? {},
  result: row.result,
  units: row.units,
  entryCapability: row.entry_capability,
  createdAt: new Date(row.created_at).toISOString(),
});
