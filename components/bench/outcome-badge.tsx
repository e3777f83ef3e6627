import { outcomeResultLabels, outcomeSymptomLabels, type OutcomeResult, type OutcomeSymptom } from "@/content-schema/outcome-fields";

const STYLE: Record<OutcomeResult, { icon: string; className: string }> = {
  worked_as_written: { icon: "✓", className: "border-green-700 text-green-900" },
  worked_after_changes: { icon: "✓", className: "border-green-700 text-green-900" },
  failed: { icon: "✕", className: "border-red-700 text-red-900" },
};

/** An outcome in words with an icon; colour is never the only signal. */
export function OutcomeBadge({ result, symptom }: { result: OutcomeResult; symptom: OutcomeSymptom | null }) {
  const style = STYLE[result];
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs ${style.className}`}>
      <span aria-hidden>{style.icon}</span>
      {outcomeResultLabels[result]}
      {symptom ? `: ${outcomeSymptomLabels[symptom].toLowerCase()}` : ""}
    </span>
  );
}
