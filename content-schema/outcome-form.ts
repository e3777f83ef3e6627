import { z } from "zod";

import { isMachiningInputError, parseFeed, parseLength, parseSpindleSpeed } from "@/lib/machining";

import { CHANGEABLE_PARAMS, outcomeFieldsSchema, type ChangeableParam } from "./outcome-fields";

type Values = Record<string, unknown>;

function parserFor(param: ChangeableParam, units: string) {
  const imperial = units === "imperial";
  if (param === "rpm") return (t: string) => parseSpindleSpeed(t);
  if (param === "feedMmMin" || param === "plungeFeedMmMin")
    return (t: string) => parseFeed(t, { defaultUnit: imperial ? "in/min" : "mm/min" });
  return (t: string) => parseLength(t, { defaultUnit: imperial ? "in" : "mm" });
}

// The form sends `from_<param>` / `to_<param>` as typed in the setup's units; unparseable text stays text
// so the schema reports it on the field.
function changesFromForm(values: Values) {
  const changes: Record<string, { from: unknown; to: unknown }> = {};
  for (const param of CHANGEABLE_PARAMS) {
    const from = String(values[`from_${param}`] ?? "").trim();
    const to = String(values[`to_${param}`] ?? "").trim();
    if (!to || from === to) continue;
    const parse = parserFor(param, String(values.units ?? "metric"));
    const read = (text: string) => {
      try {
        return parse(text);
      } catch (error) {
        if (isMachiningInputError(error)) return text;
        throw error;
      }
    };
    changes[param] = { from: read(from), to: read(to) };
  }
  return changes;
}

/** The outcome form: a result, a symptom, the changed numbers, notes and an optional photo file. */
export const outcomeFormSchema = z.preprocess(
  (raw) => {
    const values = (raw ?? {}) as Values;
    return { ...values, changes: values.result === "worked_after_changes" ? changesFromForm(values) : {} };
  },
  outcomeFieldsSchema.and(
    z.object({
      vendor: z.string().min(1),
      setupId: z.uuid("Unknown setup."),
      photo: z.preprocess((v) => (v instanceof Blob && v.size > 0 ? v : undefined), z.instanceof(Blob).optional()),
    }),
  ),
);
