import { checkCutterCsv } from "@/lib/catalogue/cutter-csv";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { parseQuery } from "@/search/parse/parse-query";

// Entry points for DeadlineRunner: the pure parsers behind each input path that takes untrusted text.
export const validateSheet = (source: string): string => JSON.stringify(validateSheetSource(source));
export const checkCsv = (text: string): string => JSON.stringify(checkCutterCsv(text));
export const parseSearch = (query: string): string => JSON.stringify(parseQuery(query));
