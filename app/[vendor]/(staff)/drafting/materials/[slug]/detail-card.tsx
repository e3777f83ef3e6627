import { MaterialCard } from "@/components/library/material-card";
import type { Material } from "@/lib/catalogue/catalogue-types";

export function DetailCard({ item }: { item: Material }) {
  return (
    <div className="max-w-xl">
      <MaterialCard material={item} units="metric" />
    </div>
  );
}
