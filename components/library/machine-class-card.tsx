import { spindleKindLabels } from "@/content-schema/spindle-kind";
import type { MachineClass } from "@/lib/catalogue/catalogue-types";
import { formatFeed, formatForce, formatPower, formatSpindleSpeed, type UnitSystem } from "@/lib/machining";

import { SpecCard, SpecList } from "./spec-list";

export function MachineClassCard({ machineClass, units }: { machineClass: MachineClass; units: UnitSystem }) {
  return (
    <SpecCard title="Reference machine class" id="machine-class">
      <p className="font-semibold">{machineClass.name}</p>
      {machineClass.description ? <p className="mb-2 text-sm text-stone-600">{machineClass.description}</p> : null}
      <SpecList
        rows={[
          ["Spindle speed", `${formatSpindleSpeed(machineClass.rpmMin)} – ${formatSpindleSpeed(machineClass.rpmMax)}`],
          ["Spindle power", formatPower(machineClass.powerKw, units)],
          ["Max feed", formatFeed(machineClass.maxFeedMmMin, units)],
          ["Rigidity", `${machineClass.rigidity.toFixed(2)} (1 = stiffest)`],
          ["Z thrust", machineClass.zThrustN ? formatForce(machineClass.zThrustN, units) : "—"],
          [
            "Spindle drive",
            `${spindleKindLabels[machineClass.spindleKind]}${machineClass.ratedRpm ? `, rated at ${formatSpindleSpeed(machineClass.ratedRpm)}` : ""}`,
          ],
        ]}
      />
    </SpecCard>
  );
}
