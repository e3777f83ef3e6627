import { missesFor, type MachineSpec } from "@/lib/field/coverage-gaps";

// Pure: which of the vendor's machine classes fit a customer's machine. A class fits when the machine is near enough
// to the class's reference machine that its sheets are a fair starting point: the same bands Field results use to
// say which customers' machines a class covers (lib/field/coverage-gaps.ts).

export type ClassRef = MachineSpec & { id: string };

export const classFits = (machine: MachineSpec, klass: MachineSpec) => missesFor(machine, klass).length === 0;

/** The ids of the classes that fit at least one of the machines. */
export function fittingClassIds(machines: readonly MachineSpec[], classes: readonly ClassRef[]): string[] {
  return classes.filter((k) => machines.some((m) => classFits(m, k))).map((k) => k.id);
}
