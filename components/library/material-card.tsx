import { materialGroupLabels } from "@/content-schema/catalogue-material";
import { cautionKindLabels } from "@/content-schema/sheet-kinds";
import type { Material } from "@/lib/catalogue/catalogue-types";
import { formatChipLoad, formatCuttingSpeed, type UnitSystem } from "@/lib/machining";

import { SpecCard, SpecList } from "./spec-list";

export function MaterialCard({ material, units }: { material: Material; units: UnitSystem }) {
  return (
    <SpecCard title="Material" id="material">
      <p className="font-semibold">{material.name}</p>
      <p className="mb-2 text-sm text-stone-600">
        {materialGroupLabels[material.materialGroup]}
        {material.synonyms.length ? ` · also: ${material.synonyms.join(", ")}` : ""}
      </p>
      <SpecList
        rows={[
          ["vc window", `${formatCuttingSpeed(material.vcMinMpm, units)} – ${formatCuttingSpeed(material.vcMaxMpm, units)}`],
          ["Minimum fz", formatChipLoad(material.minChipLoadMm, units)],
          ["Chip load band (hex)", `${material.chipLoadMinPctD} – ${material.chipLoadMaxPctD} % of D`],
          ...(material.kc11Nmm2 !== undefined
            ? [["kc1.1, mc", `${material.kc11Nmm2} N/mm², ${material.mc ?? 0.25}`] as [string, string]]
            : []),
        ]}
      />
      {material.cautions.length ? (
        <ul className="mt-3 space-y-1 text-sm">
          {material.cautions.map((c, i) => (
            <li key={i}>
              <span className="mr-1 text-xs font-semibold uppercase tracking-wide text-amber-900">⚠ {cautionKindLabels[c.kind]}:</span>
              {c.text}
            </li>
          ))}
        </ul>
      ) : null}
    </SpecCard>
  );
}
