import { fraction } from "../validate";

export type RigidityClassName = "light" | "medium" | "rigid";

// Invented defaults near common practice: a belt-drive Z on a light router, a lead- or ball-screw
// Z on a mid-size router, the Z of a machining centre or production router.
const Z_THRUST_N: Record<RigidityClassName, number> = { light: 150, medium: 400, rigid: 1500 };

/** Z thrust assumed when a machine does not give its own, in N. */
export const defaultZThrustN = (rigidityClass: RigidityClassName): number => Z_THRUST_N[rigidityClass];

/** Bands of the 0–1 rigidity factor: under 0.45 light, under 0.85 medium, else rigid. */
export const RIGIDITY_CLASS_BANDS = { lightBelow: 0.45, mediumBelow: 0.85 } as const;

export function rigidityClassFromFactor(rigidity: number): RigidityClassName {
  const r = fraction(rigidity, "rigidity");
  return r < RIGIDITY_CLASS_BANDS.lightBelow ? "light" : r < RIGIDITY_CLASS_BANDS.mediumBelow ? "medium" : "rigid";
}
