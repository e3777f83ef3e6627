/** A webhook sends while active; paused (by hand or after repeated failures) it keeps its deliveries held. */
export const webhookStates = ["active", "paused"] as const;
export type WebhookState = (typeof webhookStates)[number];

/** One delivery's way: pending, retrying after a failure, delivered, failed for good, or held while its webhook is paused. */
export const deliveryStates = ["pending", "retrying", "delivered", "failed", "held"] as const;
export type DeliveryState = (typeof deliveryStates)[number];
