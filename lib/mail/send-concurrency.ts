/** How many mails one worker sends at once, one relay connection each: every mail is its own job, so order never mattered. */
export const MAIL_SEND_CONCURRENCY = Math.min(16, Math.max(1, Math.trunc(Number(process.env.MAIL_SEND_CONCURRENCY ?? 4)) || 1));
