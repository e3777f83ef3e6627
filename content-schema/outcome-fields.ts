import { z } from "zod";

export const OUTCOME_RESULTS = ["worked_as_written", "worked_after_changes", "failed"] as const;
export const OUTCOME_SYMPTOMS = ["chatter", "melting_welding", "poor_finish", "broken_tool", "stalled_lost_steps"] as const;
export type OutcomeResult = (typeof OUTCOME_RESULTS)[number];
export type OutcomeSymptom = (typeof OUTCOME_SYMPTOMS)[number];

export const outcomeResultLabels: Record<OutcomeResult, string> = {
  worked_as_written: "Worked as written",
  worked_after_changes: "Worked after changes",
  failed: "Failed",
};
export const outcomeSymptomLabels: Record<OutcomeSymptom, string> = {
  chatter: "Chatter",
  melting_welding: "Melting or welding",
  poor_finish: "Poor finish",
  broken_tool: "Broken tool",
  stalled_lost_steps: "Stalled or lost steps",
};

/** Numbers a customer may say they changed; the same keys as the adapted result. */
export const CHANGEABLE_PARAMS = ["rpm", "feedMmMin", "axialDepthMm", "radialDepthMm", "plungeFeedMmMin"] as const;
export type ChangeableParam = (typeof CHANGEABLE_PARAMS)[number];
export const changeableParamLabels: Record<ChangeableParam, string> = {
  rpm: "n (spindle speed)",
  feedMmMin: "vf (feed rate)",
  axialDepthMm: "ap (axial depth)",
  radialDepthMm: "ae (radial depth)",
  plungeFeedMmMin: "Plunge feed",
};

const blank = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);
const changeSchema = z.object({ from: z.number().finite().positive(), to: z.number().finite().positive() });
/** What a customer changed, by parameter; also how a stored outcome's `changes` column is read back. */
export const outcomeChangesSchema = z.partialRecord(z.enum(CHANGEABLE_PARAMS), changeSchema);

/** An outcome report. `changes` is keyed by parameter, metric machining units (rpm, mm/min, mm). */
export const outcomeFieldsSchema = z
  .object({
    result: z.enum(OUTCOME_RESULTS, { error: "Say how the cut went." }),
    symptom: z.preprocess(blank, z.enum(OUTCOME_SYMPTOMS, { error: "Pick what went wrong." }).optional()),
    changes: outcomeChangesSchema.default({}),
    notes: z.string().trim().max(2000, "At most 2000 characters.").default(""),
  })
  .superRefine((o, ctx) => {
    if (o.result === "failed" && !o.symptom) ctx.addIssue({ code: "custom", path: ["symptom"], message: "Pick what went wrong." });
    if (o.result !== "failed" && o.symptom)
      ctx.addIssue({ code: "custom", path: ["symptom"], message: "A symptom goes only with a failed cut." });
    if (o.result === "worked_after_changes" && Object.keys(o.changes).length === 0) {
      ctx.addIssue({ code: "custom", path: ["changes"], message: "Say which numbers you changed (from and to)." });
    }
  });
export type OutcomeFields = z.output<typeof outcomeFieldsSchema>;
