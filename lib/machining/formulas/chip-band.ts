import { positive } from "../validate";

export interface ChipLoadBandMaterial {
  minChipLoadMm?: number;
  chipLoadPctOfD?: { min: number; max: number };
}

export interface ChipLoadBand {
  /** Floor: where the edge stops cutting and rubs; 0 when the material gives none. */
  minMm: number;
  /** Ceiling: where a small cutter breaks; Infinity when the material gives no band. */
  maxMm: number;
  /** The ceiling is under the floor: no chip load avoids both rubbing and breakage. */
  impossible: boolean;
}

/** fzMin = max(minChipLoadMm, min·D), fzMax = max·D; both are compared with hex, not fz. */
export function chipLoadBand(material: ChipLoadBandMaterial, diameterMm: number): ChipLoadBand {
  const d = positive(diameterMm, "diameterMm");
  const pct = material.chipLoadPctOfD;
  const minMm = Math.max(material.minChipLoadMm ?? 0, pct ? pct.min * d : 0);
  const maxMm = pct ? pct.max * d : Number.POSITIVE_INFINITY;
  return { minMm, maxMm, impossible: maxMm < minMm };
}
