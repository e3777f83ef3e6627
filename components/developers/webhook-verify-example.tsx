import { REPLAY_WINDOW_SECONDS, SIGNATURE_HEADER, TIMESTAMP_HEADER } from "@/lib/webhooks/sign-payload";

const CODE = `import { createHmac, timingSafeEqual } from "node:crypto";

// rawBody: the request body exactly as received (a Buffer or string), before JSON.parse.
export function isFromSwarfbook(secret, headers, rawBody) {
  const timestamp = headers["${TIMESTAMP_HEADER.toLowerCase()}"];
  const signature = headers["${SIGNATURE_HEADER.toLowerCase()}"] ?? "";
  if (!/^\\d+$/.test(timestamp ?? "")) return false;
  if (Math.abs(Date.now() / 1000 - Number(timestamp)) > ${REPLAY_WINDOW_SECONDS}) return false; // replay window
  const expected = "sha256=" + createHmac("sha256", secret).update(timestamp + "." + rawBody).digest("hex");
  return expected.length === signature.length && timingSafeEqual(Buffer.from(expected), Buffer.from(signature));
}`;

/** The receiver's check in Node.js, for the API reference. */
export function WebhookVerifyExample() {
  return (
    <figure className="mb-4">
      <figcaption className="mb-1 text-sm font-medium">Checking a delivery (Node.js)</figcaption>
      <pre className="overflow-auto rounded border border-stone-200 bg-stone-50 p-3 text-xs" tabIndex={0}>
        {CODE}
      </pre>
    </figure>
  );
}
