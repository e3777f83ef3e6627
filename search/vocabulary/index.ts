export * from "./types";
export * from "./term-key";
export { materials } from "./materials";
export { materialGroups } from "./material-groups";
export { operations } from "./operations";
export { cornerForms } from "./corner-forms";
export { geometries } from "./geometry";
export { oneWaySynonyms, synonymGroups, vocabularyEntries } from "./synonyms";
export { materialByKey, materialKeysWithin } from "./lookup";
