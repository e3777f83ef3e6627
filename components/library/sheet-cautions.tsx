import { Caution } from "@/components/mdx";
import type { SheetCaution } from "@/content-schema/sheet-front-matter";
import { STANDARD_CAUTIONS } from "@/lib/library/standard-cautions";

/** The sheet's own cautions first, then the standard ones every sheet carries. */
export function SheetCautions({ cautions }: { cautions: SheetCaution[] }) {
  return (
    <section id="cautions" aria-labelledby="cautions-heading" className="mt-8">
      <h2 id="cautions-heading" className="mb-2 text-lg font-semibold">
        Cautions
      </h2>
      {cautions.map((c, i) => (
        <Caution key={`s${i}`} kind={c.kind}>
          {c.text}
        </Caution>
      ))}
      <ul className="mt-3 list-disc space-y-1 pl-5 text-sm text-stone-700">
        {STANDARD_CAUTIONS.map((c, i) => (
          <li key={i}>{c.text}</li>
        ))}
      </ul>
    </section>
  );
}
