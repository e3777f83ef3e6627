/** Capped exponential backoff: base·2^attempt seconds, never more than cap (attempt counts from 0). */
export function backoffSeconds(attempt: number, { baseSeconds, capSeconds }: { baseSeconds: number; capSeconds: number }): number {
  return Math.min(capSeconds, baseSeconds * 2 ** Math.min(attempt, 30));
}

/** How many retries a capped backoff needs before the waits add up to at least `windowSeconds`. */
export function retriesToCover(schedule: { baseSeconds: number; capSeconds: number; windowSeconds: number }): number {
  let total = 0;
  let retries = 0;
  while (total < schedule.windowSeconds) total += backoffSeconds(retries++, schedule);
  return retries;
}
