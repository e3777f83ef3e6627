import Link from "next/link";

import { rigidityClassOf } from "@/content-schema/machine-rigidity";
import type { Machine } from "@/lib/bench/machine-rows";
import { formatQuantity } from "@/lib/machining";

/** The customer's machines as cards, each with its limits in its own units. */
export function MachineList({ machines, vendorSlug }: { machines: Machine[]; vendorSlug: string }) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
      {machines.map((m) => (
        <li key={m.id} data-machine={m.name} className="rounded-md border border-stone-300 bg-white p-4">
          <p className="font-semibold">{m.name}</p>
          <dl className="mt-2 grid grid-cols-2 gap-x-3 gap-y-1 text-sm">
            <dt className="text-stone-600">n</dt>
            <dd className="num">
              {formatQuantity(m.rpmMin, "spindleSpeed", m.units)} – {formatQuantity(m.rpmMax, "spindleSpeed", m.units)}
            </dd>
            <dt className="text-stone-600">Power</dt>
            <dd className="num">{formatQuantity(m.powerKw, "power", m.units)}</dd>
            <dt className="text-stone-600">Max feed</dt>
            <dd className="num">{formatQuantity(m.maxFeedMmMin, "feedRate", m.units)}</dd>
            <dt className="text-stone-600">Stick-out</dt>
            <dd className="num">{formatQuantity(m.stickoutMm, "length", m.units)}</dd>
          </dl>
          <p className="mt-2 text-xs text-stone-600">{rigidityClassOf(m.rigidity).label}</p>
          <Link
            href={`/${vendorSlug}/bench/machines/${m.id}`}
            className="mt-3 inline-flex min-h-11 items-center rounded border border-stone-300 px-3 text-sm"
          >
            Edit {m.name}
          </Link>
        </li>
      ))}
    </ul>
  );
}
