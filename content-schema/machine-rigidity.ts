/** Rigidity classes in plain words, each mapped to the engine's 0–1 factor (1 = the stiffest class). */
export const RIGIDITY_CLASSES = [
  { key: "light", factor: 0.35, label: "Light and flexible (belt drive, aluminium extrusion frame)" },
  { key: "moderate", factor: 0.55, label: "Moderately stiff (lead screws, braced extrusion or bolted plate frame)" },
  { key: "stiff", factor: 0.75, label: "Stiff (ball screws, steel or thick plate frame, supported rails)" },
  { key: "very-rigid", factor: 1, label: "Very rigid (cast or welded frame, ball screws, linear rails)" },
] as const;

export type RigidityKey = (typeof RIGIDITY_CLASSES)[number]["key"];
export const RIGIDITY_KEYS = RIGIDITY_CLASSES.map((c) => c.key) as [RigidityKey, ...RigidityKey[]];

export const rigidityFactor = (key: RigidityKey): number => RIGIDITY_CLASSES.find((c) => c.key === key)!.factor;

/** The class whose factor is nearest to a stored factor (machines keep the number, forms show the words). */
export function rigidityClassOf(factor: number) {
  return RIGIDITY_CLASSES.reduce((best, c) => (Math.abs(c.factor - factor) < Math.abs(best.factor - factor) ? c : best));
}
