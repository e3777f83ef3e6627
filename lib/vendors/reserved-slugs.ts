import { z } from "zod";

// Top-level path segments that belong to the platform, never to a vendor.
export const RESERVED_SLUGS = new Set([
  "api",
  "operator",
  "sign-in",
  "sign-out",
  "sign-up",
  "auth",
  "admin",
  "_next",
  "static",
  "public",
  "favicon.ico",
  "robots.txt",
  "sitemap.xml",
  "c",
  "help",
  "about",
  "settings",
  "account",
  "profile",
  "www",
  "mail",
  "status",
  "health",
  "login",
  "logout",
  "new",
  "vendors",
  "swarfbook",
  "developers",
]);

export const vendorSlugSchema = z
  .string()
  .trim()
  .toLowerCase()
  .min(2, "At least 2 characters.")
  .max(40, "At most 40 characters.")
  .regex(/^[a-z0-9](?:[a-z0-9-]*[a-z0-9])?$/, "Lower-case letters, digits and single dashes.")
  .refine((slug) => !RESERVED_SLUGS.has(slug), "That name is reserved.");
