// Headers the app sets itself from the TCP connection (lib/http/record-peer-address.ts) and overwrites on every
// request, so a client cannot supply them. Next's own server only adds x-forwarded-for from the socket when the
// request has none, so with a client-written x-forwarded-for the socket's address would otherwise be lost.
export const PEER_HEADER = "x-swarfbook-peer";
export const FORWARDED_HEADER = "x-swarfbook-forwarded-for";
