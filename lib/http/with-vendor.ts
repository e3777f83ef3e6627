import "server-only";

import type { NextRequest } from "next/server";

import { resolveVendorAccess, type VendorAccess } from "@/lib/auth/access";
import { apiTokenOwner } from "@/lib/auth/api-tokens";
import type { Permission } from "@/lib/auth/permissions";
import { findSessionUser } from "@/lib/auth/session-user";
import { pinCookieHeader } from "@/lib/db/read-db";
import { NotFound } from "@/lib/errors/domain-errors";
import { consumeRateLimit } from "@/lib/rate-limit/consume-rate-limit";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

import { clientIp } from "./client-ip";
import { errorResponse } from "./error-response";
import { DEFAULT_PUBLIC_RATE, DEFAULT_VENDOR_RATE } from "./rate-defaults";
import { requireSameOrigin } from "./same-origin";

type Params = Record<string, string | string[] | undefined>;
type Ctx<P extends Params> = { params: Promise<P> };
export type VendorHandler<P extends Params> = (request: NextRequest, context: { access: VendorAccess; params: P }) => Promise<Response>;

export type WithVendorOptions = { permission?: Permission; rateLimit?: { limit: number; windowSeconds: number } };

// Operators (and the test run, whose browsers share one address) can raise every API limit at once.
function scaled(rate: { limit: number; windowSeconds: number }) {
  const multiplier = Number(process.env.API_RATE_LIMIT_MULTIPLIER ?? "1");
  return {
    limit: Math.ceil(rate.limit * (Number.isFinite(multiplier) && multiplier > 0 ? multiplier : 1)),
    windowSeconds: rate.windowSeconds,
  };
}

/**
 * Wraps every /api/v1/vendors/{vendor}/... handler: rate limit, session or bearer token,
 * vendor and membership through the one access helper, the app's own Origin for changes made with a session
 * cookie, typed errors to JSON.
 */
export function withVendor<P extends Params & { vendor: string }>(handler: VendorHandler<P>, options: WithVendorOptions = {}) {
  return async (request: NextRequest, ctx: Ctx<P>): Promise<Response> => {
    try {
      const params = await ctx.params;
      const bearer = request.headers.get("authorization")?.match(/^Bearer\s+(\S+)$/i)?.[1];
      // A route with its own limit counts in its own bucket; the rest share the general one.
      const scope = options.rateLimit ? request.nextUrl.pathname : "all";
      const rate = scaled(options.rateLimit ?? DEFAULT_VENDOR_RATE);
      const byAddress = () => consumeRateLimit({ key: `api:${scope}:${clientIp(request.headers)}`, ...rate });
      let user = null;
      if (bearer) {
        // The token is checked before it may choose a bucket: an unchecked one would give a caller a fresh
        // bucket per made-up token. A token that does not verify is limited by the client's address.
        const vendor = await findVendorBySlug(params.vendor);
        const owner = vendor ? await apiTokenOwner(bearer, vendor.id) : null;
        if (!owner) {
          await byAddress();
          throw new NotFound();
        }
        await consumeRateLimit({ key: `api:${scope}:token:${owner.tokenId}`, ...rate });
        user = owner.user;
      } else {
        await byAddress();
        user = await findSessionUser();
      }
      const access = await resolveVendorAccess(params.vendor, user, options.permission);
      // After access, so another vendor's route stays a plain 404.
      if (!bearer) requireSameOrigin(request);
      const response = await handler(request, { access, params });
      return request.method === "GET" || request.method === "HEAD" || response.status >= 400 ? response : pinned(response);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

// A browser that wrote through the API reads its next pages from the primary (see lib/db/read-db.ts).
function pinned(response: Response): Response {
  const cookie = pinCookieHeader();
  if (cookie) response.headers.append("set-cookie", cookie);
  return response;
}

/** For public, vendor-free endpoints such as /api/v1/calculate. */
export function withPublic(handler: (request: NextRequest) => Promise<Response>, rate = DEFAULT_PUBLIC_RATE) {
  return async (request: NextRequest): Promise<Response> => {
    try {
      await consumeRateLimit({ key: `public:${request.nextUrl.pathname}:${clientIp(request.headers)}`, ...scaled(rate) });
      return await handler(request);
    } catch (error) {
      return errorResponse(error);
    }
  };
}
