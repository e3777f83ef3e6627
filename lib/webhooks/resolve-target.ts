import "server-only";

import { lookup } from "node:dns/promises";
import { isIP } from "node:net";

import { isAllowedAddress } from "./address-policy";
import { webhookUrlProblem } from "./webhook-url";

export type ResolvedTarget = { url: URL; address: string; family: 4 | 6 };
export class RefusedTarget extends Error {}

/**
 * Check a webhook URL and resolve its host once. Every address the name resolves to must be allowed (a name
 * with one public and one private address is refused), and the request then goes to the address checked
 * here, so a second, different DNS answer cannot redirect it inside the network.
 */
export async function resolveTarget(raw: string, options: { allowLoopback: boolean }): Promise<ResolvedTarget> {
  const problem = webhookUrlProblem(raw, options);
  if (problem) throw new RefusedTarget(problem);
  const url = new URL(raw);
  const host = url.hostname.replace(/^\[|\]$/g, "");
  let answers: { address: string; family: number }[];
  if (isIP(host)) answers = [{ address: host, family: isIP(host) }];
  else {
    try {
      answers = await lookup(host, { all: true, verbatim: true });
    } catch {
      throw new RefusedTarget(`The name ${host} does not resolve.`);
    }
  }
  if (answers.length === 0) throw new RefusedTarget(`The name ${host} does not resolve.`);
  const refused = answers.find((a) => !isAllowedAddress(a.address, options));
  if (refused)
    throw new RefusedTarget(
      `${host} points to ${refused.address}, a private, loopback or reserved address; webhooks go to public addresses only.`,
    );
  return { url, address: answers[0].address, family: answers[0].family === 6 ? 6 : 4 };
}
