// The one way dates read across Swarfbook: "2 Dec 2026" and "2 Dec 2026, 07:35 UTC" (UTC, so every
// reader and every server render the same text).
const DATE = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });
const DATE_TIME = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

export const formatDate = (date: Date | string | null | undefined) => (date ? DATE.format(new Date(date)) : "not yet");

export const formatDateTime = (date: Date | string) => `${DATE_TIME.format(new Date(date))} UTC`;
