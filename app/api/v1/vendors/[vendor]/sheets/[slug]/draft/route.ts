import { NextResponse } from "next/server";

import { saveDraftSchema } from "@/content-schema/sheet-workflow";
import { NotFound } from "@/lib/errors/domain-errors";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { errorResponse } from "@/lib/http/error-response";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { apiActor } from "@/lib/sheets/api-actor";
import { findOpenDraft, getSheet } from "@/lib/sheets/find-sheet";
import { DraftConflict, saveDraft } from "@/lib/sheets/save-draft";
import { startNewVersion } from "@/lib/sheets/start-new-version";

type P = { vendor: string; slug: string };

// GET /api/v1/vendors/{vendor}/sheets/{slug}/draft: the open draft's source, state and revision.
export const GET = withVendor<P>(
  async (_request, { access, params }) => {
    const sheet = await getSheet({ vendorId: access.vendor.id, slug: params.slug });
    const draft = await findOpenDraft({ vendorId: access.vendor.id, sheetId: sheet.id });
    if (!draft) throw new NotFound("This sheet has no open draft.");
    return NextResponse.json({
      number: draft.number,
      state: draft.state,
      revision: draft.revision,
      source: draft.source,
      approved: Boolean(draft.approvedBy),
    });
  },
  { permission: "sheets.author" },
);

// PUT /api/v1/vendors/{vendor}/sheets/{slug}/draft: { source, revision } saves the open draft; without an
// open draft (and without revision) it starts the next version from this source. A stale revision is 409,
// a missing one on an open draft 428.
export const PUT = withVendor<P>(
  async (request, { access, params }) => {
    const body = parseInput(saveDraftSchema, await readJson(request, 256 * 1024));
    const actor = apiActor(access);
    const sheet = await getSheet({ vendorId: actor.vendorId, slug: params.slug });
    const draft = await findOpenDraft({ vendorId: actor.vendorId, sheetId: sheet.id });
    if (!draft && body.revision === undefined) {
      const created = await startNewVersion({ ...actor, slug: params.slug, source: body.source });
      return NextResponse.json(
        { number: created.number, state: "draft", revision: created.revision, issues: created.issues },
        { status: 201 },
      );
    }
    if (body.revision === undefined) {
      // Saving over an open draft without saying which revision it edits would skip the optimistic lock.
      return NextResponse.json(
        {
          error: "revision_required",
          message: `This sheet has an open draft (revision ${draft?.revision}). GET the draft, edit its source, and PUT { source, revision } with the revision you read; a newer save answers 409 with the current text.`,
          current: { revision: draft?.revision },
        },
        { status: 428 },
      );
    }
    try {
      const saved = await saveDraft({ ...actor, slug: params.slug, source: body.source, revision: body.revision });
      return NextResponse.json({
        number: draft?.number,
        state: "draft",
        revision: saved.revision,
        valid: saved.valid,
        issues: saved.issues,
      });
    } catch (error) {
      if (error instanceof DraftConflict) {
        return NextResponse.json(
          { error: "conflict", message: error.message, current: { revision: error.current.revision, source: error.current.source } },
          { status: 409 },
        );
      }
      return errorResponse(error);
    }
  },
  { permission: "sheets.author" },
);
