import type { WebhookEventType } from "@/content-schema/webhook-events";
import type { DeliveryState, WebhookState } from "@/content-schema/webhook-states";
import type { WebhookDeliveryRow, WebhookRow } from "@/lib/db/tables";

// Webhooks and their deliveries as the admin pages read them (never the sealed secret).

export type Webhook = {
  id: string;
  url: string;
  description: string;
  events: WebhookEventType[];
  secretHint: string;
  state: WebhookState;
  consecutiveFailures: number;
  pausedAt: Date | null;
  createdAt: Date;
};

export type WebhookDelivery = {
  id: string;
  eventId: string;
  eventType: WebhookEventType;
  state: DeliveryState;
  attempts: number;
  lastStatus: number | null;
  lastError: string | null;
  responseExcerpt: string | null;
  durationMs: number | null;
  lastAttemptAt: Date | null;
  nextAttemptAt: Date | null;
  createdAt: Date;
};

/** The columns a Webhook is made of: the sealed secret is not among them. */
export const WEBHOOK_COLUMNS = [
  "id",
  "url",
  "description",
  "events",
  "secret_hint",
  "state",
  "consecutive_failures",
  "paused_at",
  "created_at",
] as const satisfies readonly (keyof WebhookRow)[];

export const DELIVERY_COLUMNS = [
  "id",
  "event_id",
  "event_type",
  "state",
  "attempts",
  "last_status",
  "last_error",
  "response_excerpt",
  "duration_ms",
  "last_attempt_at",
  "next_attempt_at",
  "created_at",
] as const satisfies readonly (keyof WebhookDeliveryRow)[];

export const rowToWebhook = (r: Pick<WebhookRow, (typeof WEBHOOK_COLUMNS)[number]>): Webhook => ({
  id: r.id,
  url: r.url,
  description: r.description,
  events: r.events,
  secretHint: r.secret_hint,
  state: r.state,
  consecutiveFailures: r.consecutive_failures,
  pausedAt: r.paused_at,
  createdAt: r.created_at,
});

export const rowToDelivery = (r: Pick<WebhookDeliveryRow, (typeof DELIVERY_COLUMNS)[number]>): WebhookDelivery => ({
  id: r.id,
  eventId: r.event_id,
  eventType: r.event_type,
  state: r.state,
  attempts: r.attempts,
  lastStatus: r.last_status,
  lastError: r.last_error,
  responseExcerpt: r.response_excerpt,
  durationMs: r.duration_ms,
  lastAttemptAt: r.last_attempt_at,
  nextAttemptAt: r.next_attempt_at,
  createdAt: r.created_at,
});
