import type { GeometryEntry } from "./types";

export const geometries: readonly GeometryEntry[] = [
  { key: "single-flute", label: "single flute", flutes: 1, terms: ["single flute", "one flute", "single fluted", "one fluted"] },
  { key: "o-flute", label: "O-flute", flutes: 1, terms: ["O-flute"] },
  { key: "upcut", label: "up-cut", terms: ["up-cut", "up spiral"] },
  { key: "downcut", label: "down-cut", terms: ["down-cut", "down spiral"] },
  { key: "compression", label: "compression", terms: ["compression", "compression cut"] },
];
