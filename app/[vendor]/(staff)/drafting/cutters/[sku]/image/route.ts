import { NextResponse } from "next/server";

import { MAX_IMAGE_BYTES } from "@/lib/catalogue/check-image";
import { findCutterBySku } from "@/lib/catalogue/find-catalogue-item";
import { setCutterImage } from "@/lib/catalogue/set-cutter-image";
import { NotFound } from "@/lib/errors/domain-errors";
import { readBodyBytes } from "@/lib/http/read-json";
import { safeDecode } from "@/lib/http/safe-decode";
import { withVendor } from "@/lib/http/with-vendor";
import { apiActor } from "@/lib/sheets/api-actor";

// POST /{vendor}/drafting/cutters/{sku}/image: the raw image bytes as the body; checked by content.
export const POST = withVendor<{ vendor: string; sku: string }>(
  async (request, { access, params }) => {
    const actor = apiActor(access);
    const sku = safeDecode(params.sku);
    const cutter = sku === null ? null : await findCutterBySku({ vendorId: actor.vendorId, sku });
    if (!cutter) throw new NotFound("No such cutter.");
    const bytes = await readBodyBytes(request, MAX_IMAGE_BYTES, "The image is larger than 5 MB.");
    const saved = await setCutterImage({ ...actor, cutterId: cutter.id, bytes });
    return NextResponse.json({ contentType: saved.contentType }, { status: 201 });
  },
  { permission: "catalogue.edit", rateLimit: { limit: 30, windowSeconds: 60 } },
);
