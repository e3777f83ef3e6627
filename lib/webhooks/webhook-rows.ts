import type { WebhookEventType } from "@/content-schema/webhook-events";

export type Webhook = {
  id: string;
  url: string;
  description: string;
  events: WebhookEventType[];
  secretHint: string;
  state: "active" | "paused";
  consecutiveFailures: number;
  pausedAt: Date | null;
  createdAt: Date;
};

export type WebhookDelivery = {
  id: string;
  eventId: string;
  eventType: WebhookEventType;
  state: "pending" | "retrying" | "delivered" | "failed" | "held";
  attempts: number;
  lastStatus: number | null;
  lastError: string | null;
  responseExcerpt: string | null;
  durationMs: number | null;
  lastAttemptAt: Date | null;
  nextAttemptAt: Date | null;
  createdAt: Date;
};

export const WEBHOOK_COLUMNS = {
  id: "id",
  url: "url",
  description: "description",
  events: "events",
  secretHint: "secret_hint",
  state: "state",
  consecutiveFailures: "consecutive_failures",
  pausedAt: "paused_at",
  createdAt: "created_at",
} as const;

export const DELIVERY_COLUMNS = {
  id: "id",
  eventId: "event_id",
  eventType: "event_type",
  state: "state",
  attempts: "attempts",
  lastStatus: "last_status",
  lastError: "last_error",
  responseExcerpt: "response_excerpt",
  durationMs: "duration_ms",
  lastAttemptAt: "last_attempt_at",
  nextAttemptAt: "next_attempt_at",
  createdAt: "created_at",
} as const;
