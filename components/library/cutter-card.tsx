import Link from "next/link";

import { cornerFormLabels, geometryLabels } from "@/content-schema/catalogue-cutter";
import type { Cutter } from "@/lib/catalogue/catalogue-types";
import { formatLength, type UnitSystem } from "@/lib/machining";

import { SpecCard, SpecList } from "./spec-list";

const sym = (symbol: string, name: string) => (
  <abbr title={`${name} (ISO 13399 ${symbol})`} className="no-underline">
    <span className="font-mono font-semibold text-stone-900">{symbol}</span> <span className="text-xs">{name}</span>
  </abbr>
);

/** The cutter as a data-sheet card with ISO 13399 symbols; every value with its unit. */
export function CutterCard({ cutter, units, vendorSlug }: { cutter: Cutter; units: UnitSystem; vendorSlug: string }) {
  const rows: [React.ReactNode, React.ReactNode][] = [
    [sym("DC", "cutting diameter"), formatLength(cutter.diameterMm, units)],
    [sym("APMX", "flute length"), formatLength(cutter.fluteLengthMm, units)],
    [sym("OAL", "overall length"), formatLength(cutter.overallLengthMm, units)],
    [sym("DMM", "shank diameter"), formatLength(cutter.shankMm, units)],
    [sym("ZEFP", "flutes"), String(cutter.flutes)],
    [sym("RE", "corner radius"), cutter.cornerRadiusMm ? formatLength(cutter.cornerRadiusMm, units) : "—"],
  ];
  return (
    <SpecCard title="Cutter" id="cutter">
      <div className="flex gap-4">
        {cutter.imageKey ? (
          // eslint-disable-next-line @next/next/no-img-element -- served by our own route, checked by content on upload
          <img
            src={`/${vendorSlug}/library/cutters/${encodeURIComponent(cutter.sku)}/image`}
            alt={`Cutter ${cutter.sku}`}
            className="h-24 w-24 rounded border border-stone-200 object-contain"
          />
        ) : null}
        <div className="min-w-0 flex-1">
          <p className="font-semibold">
            <Link href={`/${vendorSlug}/library/cutters/${encodeURIComponent(cutter.sku)}`} className="num hover:underline">
              {cutter.sku}
            </Link>{" "}
            · {cutter.name}
          </p>
          <p className="mb-2 text-sm text-stone-600">
            {geometryLabels[cutter.geometry]} · {cornerFormLabels[cutter.cornerForm]} · {cutter.toolMaterial === "hss" ? "HSS" : "Carbide"}
            {cutter.coating ? ` · ${cutter.coating}` : ""}
            {cutter.helixDeg !== undefined ? <span className="num"> · helix {cutter.helixDeg}°</span> : null}
          </p>
          <SpecList rows={rows} />
        </div>
      </div>
    </SpecCard>
  );
}
