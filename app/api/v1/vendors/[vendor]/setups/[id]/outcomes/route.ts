import { outcomeFieldsSchema } from "@/content-schema/outcome-fields";
import { outcomeFormSchema } from "@/content-schema/outcome-form";
import { requireMember } from "@/lib/auth/access";
import { findSetup } from "@/lib/bench/list-setups";
import { recordOutcome } from "@/lib/bench/outcomes";
import { NotFound } from "@/lib/errors/domain-errors";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { idempotencyKeyOf } from "@/lib/http/idempotency-key";
import { readForm } from "@/lib/http/read-form";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { MAX_UPLOAD_BYTES } from "@/lib/storage";

const formValues = (form: FormData) => Object.fromEntries([...form.keys()].map((k) => [k, form.get(k)]));

// POST /api/v1/vendors/{vendor}/setups/{id}/outcomes: report how a cut went (JSON, or multipart with a photo); 200 for a repeated Idempotency-Key.
export const POST = withVendor<{ vendor: string; id: string }>(
  async (request, { access, params }) => {
    requireMember(access);
    const owner = { vendorId: access.vendor.id, userId: access.user.id, setupId: params.id, idempotencyKey: idempotencyKeyOf(request) };
    if (!(await findSetup(owner))) throw new NotFound();
    let outcome;
    if ((request.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
      const form = await readForm(request, MAX_UPLOAD_BYTES + 64 * 1024, "A photo may be at most 10 MB.");
      const {
        vendor: _v,
        setupId: _s,
        photo,
        ...fields
      } = parseInput(outcomeFormSchema, { ...formValues(form), vendor: access.vendor.slug, setupId: params.id });
      outcome = await recordOutcome({ ...owner, fields, photo: photo ? Buffer.from(await photo.arrayBuffer()) : null });
    } else {
      outcome = await recordOutcome({ ...owner, fields: parseInput(outcomeFieldsSchema, await readJson(request)) });
    }
    const { created, ...saved } = outcome;
    return Response.json({ outcome: saved }, { status: created ? 201 : 200 });
  },
  { permission: "bench.use", rateLimit: { limit: 30, windowSeconds: 60 } },
);
