import type { CutterFields } from "@/content-schema/catalogue-cutter";
import type { MachineClassFields } from "@/content-schema/catalogue-machine-class";
import type { MaterialFields } from "@/content-schema/catalogue-material";

export type Cutter = CutterFields & { id: string; shortCode: string; imageKey: string | null; updatedAt: Date };
export type Material = MaterialFields & { id: string; updatedAt: Date };
export type MachineClass = MachineClassFields & { id: string; updatedAt: Date };
