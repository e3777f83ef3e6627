export type { ChipKind, ParsedQuery, QueryChip } from "./types";
export { parseQuery } from "./parse-query";
export { removeChip } from "./remove-chip";
export { describeQuery, looserQueries } from "./looser-queries";
export { classifyMaterial } from "./classify-material";
export { MAX_QUERY_CHARS, MAX_QUERY_TOKENS, sanitiseQuery } from "./sanitise";
export { INCH_SIZE_TOLERANCE_IN } from "./inch-sizes";
