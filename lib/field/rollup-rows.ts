import { OUTCOME_SYMPTOMS, type OutcomeSymptom } from "@/content-schema/outcome-fields";

import { wilsonInterval, type Interval } from "./wilson";

// One row of field_version_rollups, read into the shape every Field-results list uses.
export type VersionRollup = {
  versionId: string;
  sheetId: string;
  number: number;
  state: string;
  publishedAt: string | null;
  views: number;
  adaptations: number;
  setups: number;
  outcomes: number;
  workedAsWritten: number;
  workedAfterChanges: number;
  failed: number;
  symptoms: Record<OutcomeSymptom, number>;
  lastOutcomeAt: string | null;
  tickets: number;
  handoffs: number;
  openHandoffs: number;
  failure: Interval;
};

export type RollupRow = Record<string, unknown>;

const int = (v: unknown) => Number(v ?? 0);
const iso = (v: unknown) => (v ? new Date(v as string).toISOString() : null);

export function readRollup(r: RollupRow, z: number): VersionRollup {
  const outcomes = int(r.outcomes),
    failed = int(r.failed);
  return {
    versionId: String(r.sheet_version_id),
    sheetId: String(r.sheet_id),
    number: int(r.number),
    state: String(r.state),
    publishedAt: iso(r.published_at),
    views: int(r.views),
    adaptations: int(r.adaptations),
    setups: int(r.setups),
    outcomes,
    workedAsWritten: int(r.worked_as_written),
    workedAfterChanges: int(r.worked_after_changes),
    failed,
    symptoms: Object.fromEntries(OUTCOME_SYMPTOMS.map((s) => [s, int(r[s])])) as Record<OutcomeSymptom, number>,
    lastOutcomeAt: iso(r.last_outcome_at),
    tickets: int(r.tickets),
    handoffs: int(r.handoffs),
    openHandoffs: int(r.open_handoffs),
    failure: wilsonInterval(failed, outcomes, z),
  };
}

/** The symptom named most often, or null when nothing failed. */
export function topSymptom(symptoms: Record<OutcomeSymptom, number>): OutcomeSymptom | null {
  let best: OutcomeSymptom | null = null;
  for (const s of OUTCOME_SYMPTOMS) if (symptoms[s] > 0 && (best === null || symptoms[s] > symptoms[best])) best = s;
  return best;
}
