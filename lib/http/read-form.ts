import "server-only";

import { InvalidInput } from "@/lib/errors/domain-errors";

import { readBodyBytes } from "./read-json";

/** A multipart or URL-encoded form body read with a byte cap (413 past it) and a clear 400 when malformed. */
export async function readForm(request: Request, maxBytes: number, tooLargeMessage?: string): Promise<FormData> {
  const bytes = await readBodyBytes(request, maxBytes, tooLargeMessage);
  try {
    return await new Response(bytes, { headers: { "content-type": request.headers.get("content-type") ?? "" } }).formData();
  } catch {
    throw new InvalidInput("The form data could not be read.");
  }
}
