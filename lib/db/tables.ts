// The row type of every table, as PostgreSQL returns it through pg: uuid/text as string, bigint as string,
// timestamptz and date as Date, jsonb as unknown until a mapper checks it. Knex reads the map below, so
// `db("cutters").where(...).first()` is a CutterRow and an insert or update is checked against its columns.
// A migration that adds or changes a column changes its row here in the same commit.
import type { Knex } from "knex";

import type { CutterFields } from "@/content-schema/catalogue-cutter";
import type { MaterialFields } from "@/content-schema/catalogue-material";
import type { BatchItemOutcome, BatchState } from "@/content-schema/family";
import type { OutcomeResult, OutcomeSymptom } from "@/content-schema/outcome-fields";
import type { SheetState } from "@/content-schema/sheet-workflow";
import type { SpindleKindKey } from "@/content-schema/spindle-kind";
import type { MessageVisibility, TicketPriority, TicketStatus } from "@/content-schema/ticket-status";
import type { WebhookEventType } from "@/content-schema/webhook-events";
import type { DeliveryState, WebhookState } from "@/content-schema/webhook-states";
import type { Role } from "@/lib/auth/roles";
import type { UnitSystem } from "@/lib/machining/quantities";
import type { MailKind } from "@/lib/mail-preferences/mail-kinds";

export interface ApiTokenRow {
  id: string;
  vendor_id: string;
  user_id: string;
  name: string;
  prefix: string;
  token_hash: string;
  last_used_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export interface AuditLogEntryRow {
  id: string;
  vendor_id: string | null;
  actor_user_id: string | null;
  action: string;
  object_type: string;
  object_id: string | null;
  details: unknown;
  created_at: Date;
}

export interface ChangeAlertSentRow {
  vendor_id: string;
  version_id: string;
  superseded_version_id: string;
  user_id: string;
  setup_count: number;
  created_at: Date;
}

export interface CutterImageRow {
  key: string;
  vendor_id: string;
  content_type: string;
  bytes: Buffer;
  created_at: Date;
}

export interface CutterRow {
  id: string;
  vendor_id: string;
  sku: string;
  name: string;
  diameter_mm: number;
  flutes: number;
  flute_length_mm: number;
  overall_length_mm: number;
  shank_mm: number;
  corner_form: CutterFields["cornerForm"];
  corner_radius_mm: number | null;
  helix_deg: number | null;
  tool_material: CutterFields["toolMaterial"];
  coating: string | null;
  geometry: CutterFields["geometry"];
  notes: string;
  short_code: string;
  image_key: string | null;
  created_at: Date;
  updated_at: Date;
}

export interface DeadLetterNoticeRow {
  queue: string;
  notified_count: number;
  notified_at: Date | null;
}

export interface DeskViewRow {
  id: string;
  vendor_id: string;
  user_id: string;
  name: string;
  filters: unknown;
  created_at: Date;
}

export interface FamilyBatchItemRow {
  id: string;
  vendor_id: string;
  batch_id: string;
  cutter_id: string;
  material_id: string;
  machine_class_id: string;
  sheet_id: string | null;
  version_id: string | null;
  previous_version_id: string | null;
  outcome: BatchItemOutcome;
  /** jsonb: CellWarning[] (`cellWarningSchema`). */
  warnings: unknown;
  /** jsonb: CellProvenance[] (`cellProvenanceSchema`). */
  provenance: unknown;
  excluded_reason: string | null;
  excluded_by: string | null;
  created_at: Date;
}

export interface FamilyBatchRow {
  id: string;
  vendor_id: string;
  family_id: string;
  number: number;
  rule_set_id: string;
  state: BatchState;
  total: number;
  done: number;
  error: string | null;
  created_by: string | null;
  approved_by: string | null;
  approved_at: Date | null;
  published_by: string | null;
  published_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export interface FamilyRow {
  id: string;
  vendor_id: string;
  slug: string;
  name: string;
  /** jsonb: CutterSelection (`cutterSelectionSchema`). */
  cutter_selection: unknown;
  material_ids: string[];
  machine_class_ids: string[];
  created_by: string | null;
  created_at: Date;
  updated_at: Date;
}

export interface FamilyRuleSetRow {
  id: string;
  vendor_id: string;
  family_id: string;
  number: number;
  /** jsonb: FamilyRules (`familyRulesSchema`). */
  rules: unknown;
  note: string;
  created_by: string | null;
  created_at: Date;
}

export interface FieldChangeRollupRow {
  vendor_id: string | null;
  sheet_version_id: string;
  operation_index: number;
  param: string;
  reports: number | null;
  median_pct: number | null;
  q1_pct: number | null;
  q3_pct: number | null;
  lowered: number | null;
  raised: number | null;
}

export interface FieldDigestSentRow {
  vendor_id: string;
  user_id: string;
  week_start: Date;
  created_at: Date;
}

export interface FieldRollupChangeRow {
  id: string;
  sheet_version_id: string;
}

export interface FieldRollupRefreshRow {
  name: string;
  refreshed_at: Date;
  duration_ms: number;
}

export interface FieldVersionRollupRow {
  vendor_id: string | null;
  sheet_version_id: string;
  sheet_id: string | null;
  number: number | null;
  state: string | null;
  published_at: Date | null;
  views: number | null;
  adaptations: number | null;
  setups: number | null;
  outcomes: number | null;
  worked_as_written: number | null;
  worked_after_changes: number | null;
  failed: number | null;
  chatter: number | null;
  melting_welding: number | null;
  poor_finish: number | null;
  broken_tool: number | null;
  stalled_lost_steps: number | null;
  last_outcome_at: Date | null;
  tickets: number | null;
  handoffs: number | null;
  open_handoffs: number | null;
}

export interface InboundMailLogEntryRow {
  id: string;
  vendor_id: string | null;
  ticket_id: string | null;
  mail_from: string;
  rcpt_to: string;
  outcome: string;
  reason: string;
  created_at: Date;
}

export interface InvitationRow {
  id: string;
  vendor_id: string;
  email: string;
  role: Role;
  token_hash: string;
  invited_by: string | null;
  expires_at: Date;
  accepted_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export interface MachineClassRow {
  id: string;
  vendor_id: string;
  slug: string;
  name: string;
  description: string;
  rpm_min: number;
  rpm_max: number;
  power_kw: number;
  max_feed_mm_min: number;
  rigidity: number;
  z_thrust_n: number | null;
  created_at: Date;
  updated_at: Date;
  spindle_kind: SpindleKindKey;
  rated_rpm: number | null;
}

export interface MachineRow {
  id: string;
  vendor_id: string;
  user_id: string;
  name: string;
  preset: string | null;
  rpm_min: number;
  rpm_max: number;
  power_kw: number;
  max_feed_mm_min: number;
  rigidity: number;
  z_thrust_n: number | null;
  stickout_mm: number | null;
  units: UnitSystem;
  created_at: Date;
  updated_at: Date;
  spindle_kind: SpindleKindKey;
  rated_rpm: number | null;
}

export interface MailPreferenceRow {
  vendor_id: string;
  user_id: string;
  kind: MailKind;
  enabled: boolean;
  updated_at: Date;
}

export interface CustomerCutterRow {
  vendor_id: string;
  user_id: string;
  cutter_id: string;
  created_at: Date;
}

export interface MaterialRow {
  id: string;
  vendor_id: string;
  slug: string;
  name: string;
  material_group: MaterialFields["materialGroup"];
  vc_min_mpm: number;
  vc_max_mpm: number;
  min_chip_load_mm: number;
  kc_nmm2: number;
  synonyms: string[];
  cautions: unknown;
  notes: string;
  created_at: Date;
  updated_at: Date;
  chip_load_min_pct_d: number;
  chip_load_max_pct_d: number;
  kc11_nmm2: number | null;
  mc: number | null;
}

export interface MemberRow {
  id: string;
  vendor_id: string;
  user_id: string;
  role: Role;
  created_at: Date;
  updated_at: Date;
}

export interface OutcomeRow {
  id: string;
  vendor_id: string;
  setup_id: string;
  sheet_version_id: string;
  user_id: string;
  machine_id: string | null;
  result: OutcomeResult;
  symptom: OutcomeSymptom | null;
  changes: unknown;
  notes: string;
  photo_key: string | null;
  created_at: Date;
  idempotency_key: string | null;
  photo_size_bytes: number | null;
}

export interface ProblemReportRow {
  id: string;
  vendor_id: string;
  sheet_version_id: string;
  ticket_id: string | null;
  reported_by: string | null;
  summary: string;
  details: string;
  status: string;
  created_at: Date;
  idempotency_key: string | null;
}

export interface RateLimitBucketRow {
  key: string;
  window_start: Date;
  hits: number;
}

export interface ReplySnippetRow {
  id: string;
  vendor_id: string;
  title: string;
  body: string;
  created_by: string | null;
  created_at: Date;
}

export interface SearchDocumentRow {
  vendor_id: string;
  doc_id: string;
  kind: string;
  sheet_id: string | null;
  version_id: string | null;
  cutter_id: string | null;
  slug: string;
  version_number: number | null;
  title: string;
  summary: string;
  cutter_sku: string;
  cutter_name: string;
  material_name: string | null;
  material_names: string[];
  material_key: string | null;
  material_group: string | null;
  operations: string[];
  machine_class: string | null;
  machine_class_name: string | null;
  diameter_mm: number;
  flutes: number;
  corner_form: string;
  geometry: string;
  tags: string[];
  body: string;
  words: string;
  search_vector: string;
  published_at: Date | null;
  indexed_at: Date;
}

export interface SearchIndexVersionRow {
  vendor_id: string;
  /** bigint: moved by triggers on every change to the vendor's search_documents or search_words. */
  version: string;
}

export interface SearchWordRow {
  vendor_id: string;
  word: string;
}

export interface SetupRow {
  id: string;
  vendor_id: string;
  user_id: string;
  machine_id: string;
  sheet_version_id: string;
  operation_index: number;
  name: string;
  overrides: unknown;
  result: unknown;
  units: UnitSystem;
  created_at: Date;
  updated_at: Date;
  entry_capability: string;
}

export interface SheetVersionActivityRow {
  vendor_id: string;
  sheet_version_id: string;
  day: Date;
  views: number;
  adaptations: number;
}

export interface SheetVersionRow {
  id: string;
  vendor_id: string;
  sheet_id: string;
  number: number;
  state: SheetState;
  title: string;
  source: string;
  front_matter: unknown;
  change_note: string;
  revision: number;
  author_id: string | null;
  updated_by: string | null;
  submitted_at: Date | null;
  approved_by: string | null;
  approved_at: Date | null;
  published_at: Date | null;
  superseded_at: Date | null;
  withdrawn_at: Date | null;
  withdrawn_reason: string | null;
  created_at: Date;
  updated_at: Date;
}

export interface SheetRow {
  id: string;
  vendor_id: string;
  slug: string;
  cutter_id: string;
  material_id: string;
  machine_class_id: string;
  created_by: string | null;
  created_at: Date;
  updated_at: Date;
}

export interface TicketAttachmentRow {
  id: string;
  vendor_id: string;
  ticket_id: string | null;
  message_id: string | null;
  uploaded_by: string;
  storage_key: string;
  file_name: string;
  content_type: string;
  kind: string;
  size_bytes: number;
  created_at: Date;
}

export interface TicketMessageRow {
  id: string;
  vendor_id: string;
  ticket_id: string;
  author_id: string | null;
  visibility: MessageVisibility;
  source: string;
  body: string;
  card: unknown | null;
  created_at: Date;
  idempotency_key: string | null;
  email_message_key: string | null;
}

export interface TicketSheetLinkRow {
  id: string;
  vendor_id: string;
  ticket_id: string;
  sheet_version_id: string;
  machine_id: string | null;
  created_at: Date;
}

export interface TicketRow {
  id: string;
  vendor_id: string;
  number: number;
  customer_id: string;
  subject: string;
  body: string;
  status: TicketStatus;
  priority: TicketPriority;
  assignee_id: string | null;
  material_id: string | null;
  machine_id: string | null;
  tags: string[];
  idempotency_key: string;
  first_response_due_at: Date;
  first_response_at: Date | null;
  closed_at: Date | null;
  satisfaction: number | null;
  satisfaction_comment: string | null;
  last_activity_at: Date;
  created_at: Date;
  updated_at: Date;
}

export interface UploadDeletionRow {
  storage_key: string;
  created_at: Date;
}

export interface UserRow {
  id: string;
  email: string;
  name: string;
  password_hash: string | null;
  email_verified: Date | null;
  is_operator: boolean;
  created_at: Date;
  updated_at: Date;
  session_epoch: number;
}

export interface VendorRow {
  id: string;
  slug: string;
  name: string;
  accent_color: string;
  logo: Buffer | null;
  logo_type: string | null;
  settings: unknown;
  created_at: Date;
  updated_at: Date;
}

export interface VerificationTokenRow {
  identifier: string;
  token: string;
  expires: Date;
}

export interface WebhookDeliveryRow {
  id: string;
  vendor_id: string;
  webhook_id: string;
  event_id: string;
  event_type: WebhookEventType;
  /** The envelope as signed and sent (text, not jsonb: the signature covers these exact bytes). */
  body: string;
  state: DeliveryState;
  attempts: number;
  last_status: number | null;
  last_error: string | null;
  response_excerpt: string | null;
  duration_ms: number | null;
  last_attempt_at: Date | null;
  next_attempt_at: Date | null;
  delivered_at: Date | null;
  created_at: Date;
}

export interface WebhookRow {
  id: string;
  vendor_id: string;
  url: string;
  description: string;
  events: WebhookEventType[];
  secret_encrypted: string;
  secret_hint: string;
  state: WebhookState;
  consecutive_failures: number;
  paused_at: Date | null;
  created_by: string | null;
  created_at: Date;
}

/** The insert shape of a table keyed by a date: the day as text, defaulted columns optional. */
type DayKeyed<Row, Day extends keyof Row, Defaulted extends keyof Row> = Omit<Row, Day | Defaulted> &
  Record<Day, string> &
  Partial<Pick<Row, Defaulted>>;

declare module "knex/types/tables" {
  interface Tables {
    api_tokens: ApiTokenRow;
    audit_log: AuditLogEntryRow;
    change_alerts_sent: ChangeAlertSentRow;
    cutter_images: CutterImageRow;
    customer_cutters: CustomerCutterRow;
    cutters: CutterRow;
    dead_letter_notices: DeadLetterNoticeRow;
    desk_views: DeskViewRow;
    families: FamilyRow;
    family_batch_items: FamilyBatchItemRow;
    family_batches: FamilyBatchRow;
    family_rule_sets: FamilyRuleSetRow;
    field_change_rollups: FieldChangeRollupRow;
    // A date column reads as a Date and is written as "yyyy-mm-dd" (no time zone to shift the day).
    field_digests_sent: Knex.CompositeTableType<FieldDigestSentRow, DayKeyed<FieldDigestSentRow, "week_start", "created_at">>;
    field_rollup_changes: FieldRollupChangeRow;
    field_rollup_refreshes: FieldRollupRefreshRow;
    field_version_rollups: FieldVersionRollupRow;
    inbound_mail_log: InboundMailLogEntryRow;
    invitations: InvitationRow;
    machine_classes: MachineClassRow;
    machines: MachineRow;
    mail_preferences: MailPreferenceRow;
    materials: MaterialRow;
    members: MemberRow;
    outcomes: OutcomeRow;
    problem_reports: ProblemReportRow;
    rate_limit_buckets: RateLimitBucketRow;
    reply_snippets: ReplySnippetRow;
    search_documents: SearchDocumentRow;
    search_index_versions: SearchIndexVersionRow;
    search_words: SearchWordRow;
    setups: SetupRow;
    sheet_version_activity: Knex.CompositeTableType<
      SheetVersionActivityRow,
      DayKeyed<SheetVersionActivityRow, "day", "views" | "adaptations">
    >;
    sheet_versions: SheetVersionRow;
    sheets: SheetRow;
    ticket_attachments: TicketAttachmentRow;
    ticket_messages: TicketMessageRow;
    ticket_sheet_links: TicketSheetLinkRow;
    tickets: TicketRow;
    upload_deletions: UploadDeletionRow;
    users: UserRow;
    vendors: VendorRow;
    verification_tokens: VerificationTokenRow;
    webhook_deliveries: WebhookDeliveryRow;
    webhooks: WebhookRow;
  }
}
