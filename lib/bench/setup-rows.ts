import type { SetupOverrides } from "@/content-schema/setup-fields";
import type { AdaptResult, UnitSystem } from "@/lib/machining";

export type Setup = {
  id: string;
  name: string;
  machineId: string;
  sheetVersionId: string;
  operationIndex: number;
  overrides: SetupOverrides;
  result: AdaptResult;
  units: UnitSystem;
  createdAt: string;
};

export const SETUP_COLUMNS = ["st.id", "st.name", "st.machine_id", "st.sheet_version_id", "st.operation_index", "st.overrides", "st.result", "st.units", "st.created_at"];

type Row = { id: string; name: string; machine_id: string; sheet_version_id: string; operation_index: number; overrides: SetupOverrides; result: AdaptResult; units: UnitSystem; created_at: Date };

export const rowToSetup = (row: Row): Setup => ({
  id: row.id,
  name: row.name,
  machineId: row.machine_id,
  sheetVersionId: row.sheet_version_id,
  operationIndex: row.operation_index,
  overrides: row.overrides ?? {},
  result: row.result,
  units: row.units,
  createdAt: new Date(row.created_at).toISOString(),
});
