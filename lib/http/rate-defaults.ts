// The API's rate limits when a route sets none: the vendor API's shared bucket (per token, or per client
// address for sessions) and the bucket of each public endpoint (per client address).
export const DEFAULT_VENDOR_RATE = { limit: 300, windowSeconds: 60 };
export const DEFAULT_PUBLIC_RATE = { limit: 120, windowSeconds: 60 };
