export * from "./errors";
export * from "./units";
export * from "./parse";
export * from "./formulas";
export * from "./quantities";
export * from "./format";
export * from "./types";
export * from "./adapt";
