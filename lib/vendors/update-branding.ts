import "server-only";

import { fileTypeFromBuffer } from "file-type";

import { LOGO_MAX_BYTES, LOGO_TYPES, type BrandingInput } from "@/content-schema/vendor-branding";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";
import { invalidateLibrary } from "@/lib/library/library-cache";
import { bumpLibraryGeneration } from "@/lib/library/library-generation";

/** Decide a logo's type by its bytes, never by its name or the browser's word. */
export async function checkLogo(bytes: Buffer): Promise<{ bytes: Buffer; type: string }> {
  if (bytes.byteLength > LOGO_MAX_BYTES)
    throw new InvalidInput("The logo is too large.", { logo: [`At most ${LOGO_MAX_BYTES / 1024} KB.`] });
  const sniffed = await fileTypeFromBuffer(bytes);
  if (!sniffed || !(LOGO_TYPES as readonly string[]).includes(sniffed.mime)) {
    throw new InvalidInput("The logo must be a PNG, JPEG or WebP image.", { logo: ["Upload a PNG, JPEG or WebP image."] });
  }
  return { bytes, type: sniffed.mime };
}

export async function updateBranding(opts: { vendorId: string; actorUserId: string; input: BrandingInput; logo?: Buffer | null }) {
  const logo = opts.logo && opts.logo.byteLength > 0 ? await checkLogo(opts.logo) : null;
  await db.transaction(async (trx) => {
    const current = await trx("vendors").where({ id: opts.vendorId }).forUpdate().first<{ settings: Record<string, unknown> }>("settings");
    const settings = {
      ...current.settings,
      libraryPublic: opts.input.libraryPublic,
      requireSecondApproval: opts.input.requireSecondApproval,
      ...(opts.input.wilsonConfidence === undefined ? {} : { wilsonConfidence: opts.input.wilsonConfidence }),
    };
    await trx("vendors")
      .where({ id: opts.vendorId })
      .update({
        name: opts.input.name,
        accent_color: opts.input.accentColor.toLowerCase(),
        settings: JSON.stringify(settings),
        ...(logo ? { logo: logo.bytes, logo_type: logo.type } : {}),
        updated_at: trx.fn.now(),
      });
    await writeAudit(
      {
        vendorId: opts.vendorId,
        actorUserId: opts.actorUserId,
        action: "vendor.branding",
        objectType: "vendor",
        objectId: opts.vendorId,
        details: {
          name: opts.input.name,
          accentColor: opts.input.accentColor,
          logo: Boolean(logo),
          libraryPublic: opts.input.libraryPublic,
          requireSecondApproval: opts.input.requireSecondApproval,
          wilsonConfidence: opts.input.wilsonConfidence,
        },
      },
      trx,
    );
    // Name, colour, logo and the customers-only setting show on (or close) every stored Library page.
    await bumpLibraryGeneration(trx, opts.vendorId);
  });
  invalidateLibrary({ vendorId: opts.vendorId });
}
