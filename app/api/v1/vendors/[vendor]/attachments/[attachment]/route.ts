import { z } from "zod";

import { requireMember } from "@/lib/auth/access";
import { NotFound } from "@/lib/errors/domain-errors";
import { withVendor } from "@/lib/http/with-vendor";
import { sniffUpload } from "@/lib/storage/sniff-upload";
import { contentDisposition } from "@/lib/tickets/attachments/display-file-name";
import { getAttachment } from "@/lib/tickets/attachments/get-attachment";

// GET /api/v1/vendors/{vendor}/attachments/{id}: download, for the ticket's customer or Desk staff only.
export const GET = withVendor<{ vendor: string; attachment: string }>(async (_request, { access, params }) => {
  const attachmentId = z.uuid().safeParse(params.attachment).data;
  if (!attachmentId) throw new NotFound();
  requireMember(access);
  const file = await getAttachment({ vendorId: access.vendor.id, attachmentId, userId: access.user.id, role: access.member.role });
  // Images are checked again by content before a browser may show them inline.
  const recheck = file.kind === "image" ? await sniffUpload(file.bytes, file.fileName).catch(() => null) : null;
  const inline = recheck?.kind === "image";
  const contentType = inline
    ? recheck.contentType
    : file.kind === "pdf"
      ? "application/pdf"
      : file.kind === "text"
        ? "text/plain; charset=utf-8"
        : "application/octet-stream";
  return new Response(new Uint8Array(file.bytes), {
    headers: {
      "Content-Type": contentType,
      "Content-Length": String(file.bytes.byteLength),
      "Content-Disposition": contentDisposition(inline ? "inline" : "attachment", file.fileName),
      "X-Content-Type-Options": "nosniff",
      "Content-Security-Policy": "default-src 'none'; img-src 'self'; sandbox",
      "Cache-Control": "private, no-store",
    },
  });
});
