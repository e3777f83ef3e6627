export type ImportMode = "all-or-nothing" | "valid-rows";
