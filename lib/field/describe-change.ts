import { changeableParamLabels, type ChangeableParam } from "@/content-schema/outcome-fields";

// Pure: what customers changed, as one sentence an engineer can act on.
export type ChangeRollup = {
  param: string;
  reports: number;
  medianPct: number;
  q1Pct: number;
  q3Pct: number;
  lowered: number;
  raised: number;
};

const pct = (n: number) => `${Math.abs(n).toLocaleString("en-GB", { maximumFractionDigits: Math.abs(n) < 10 ? 1 : 0 })} %`;
const labelOf = (param: string) => changeableParamLabels[param as ChangeableParam] ?? param;

function spread(c: ChangeRollup): string {
  if (c.reports < 4) return "";
  const signed = (n: number) => `${n < 0 ? "−" : "+"}${pct(n)}`;
  return `; the middle half of reports ran ${signed(c.q1Pct)} to ${signed(c.q3Pct)}`;
}

export function describeChange(c: ChangeRollup): string {
  const reports = `${c.reports} ${c.reports === 1 ? "report" : "reports"}`;
  if (Math.abs(c.medianPct) < 0.05) {
    return c.lowered + c.raised === 0
      ? `${labelOf(c.param)} named in ${reports} but kept at the sheet's value`
      : `${labelOf(c.param)} changed both ways, median ±0 % in ${reports} (${c.lowered} lowered, ${c.raised} raised)`;
  }
  const way = c.medianPct < 0 ? "lowered" : "raised";
  const agree = c.medianPct < 0 ? c.lowered : c.raised;
  return `${labelOf(c.param)} ${way} by a median of ${pct(c.medianPct)} in ${reports} (${agree} of ${c.reports} ${way} it${spread(c)})`;
}
