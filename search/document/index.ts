export { type SearchDocument, cutterDocId, searchDocumentSchema, sheetDocId } from "./document-schema";
export { buildCutterDocument, buildSheetDocument, materialNamesOf, type SheetDocumentSource } from "./build-sheet-document";
export { indexWords, operationWords } from "./index-words";
export { mdxToPlainText } from "./plain-text";
