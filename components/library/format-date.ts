const DATE = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });

export const formatDate = (date: Date | string | null | undefined) => (date ? DATE.format(new Date(date)) : "—");
