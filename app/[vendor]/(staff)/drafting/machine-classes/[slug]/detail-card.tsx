import { MachineClassCard } from "@/components/library/machine-class-card";
import type { MachineClass } from "@/lib/catalogue/catalogue-types";

export function DetailCard({ item }: { item: MachineClass }) {
  return (
    <div className="max-w-xl">
      <MachineClassCard machineClass={item} units="metric" />
    </div>
  );
}
