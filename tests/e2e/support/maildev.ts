import { MAILDEV_URL } from "./env";

export type Mail = { id: string; subject: string; text: string; html?: string; to: { address: string }[]; headers: Record<string, string> };

/** Poll MailDev's HTTP API until a message to `to` matching `subject` arrives. */
export async function waitForMail(to: string, subject: RegExp, { timeoutMs = 30_000, after = 0 } = {}): Promise<Mail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const response = await fetch(`${MAILDEV_URL}/api/email`);
    const mails = (await response.json()) as (Mail & { time: string })[];
    const hit = mails
      .filter((m) => new Date(m.time).getTime() >= after)
      .reverse()
      .find((m) => m.to.some((t) => t.address.toLowerCase() === to.toLowerCase()) && subject.test(m.subject));
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`No mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}

export function firstLink(text: string, pattern: RegExp): string {
  const link = text.match(/https?:\/\/\S+/g)?.find((l) => pattern.test(l));
  if (!link) throw new Error(`No link matching ${pattern} in mail:\n${text}`);
  return link;
}
