// One request of the page benchmark: loopback only, body read to the end, anything but the expected status fails.
import { encode } from "next-auth/jwt";

export function assertLoopback(url: string) {
  if (new URL(url).hostname !== "127.0.0.1") throw new Error("The benchmark only requests 127.0.0.1.");
}

export type Request = { path: string; method?: "GET" | "POST"; body?: string; cookie?: string; status?: number };

export function requester(baseUrl: string) {
  assertLoopback(baseUrl);
  return async ({ path, method = "GET", body, cookie, status = 200 }: Request): Promise<number> => {
    const response = await fetch(baseUrl + path, {
      method,
      body,
      redirect: "manual",
      headers: { ...(cookie ? { cookie } : {}), ...(body ? { "content-type": "application/json" } : {}) },
    });
    const bytes = (await response.arrayBuffer()).byteLength;
    if (response.status !== status) throw new Error(`${method} ${path}: ${response.status}`);
    return bytes;
  };
}

/** A session cookie for `userId`, signed like the app's own (JWT sessions). */
export async function sessionCookie(userId: string, secret: string): Promise<string> {
  const token = await encode({ token: { sub: userId }, secret, maxAge: 3600 });
  return `next-auth.session-token=${token}`;
}
