import { NextResponse } from "next/server";

import { openApiDocument } from "@/lib/api-docs/openapi-document";
import { withPublic } from "@/lib/http/with-vendor";

// GET /api/v1/openapi.json: the OpenAPI 3.1 document of every /api/v1 route, built from the schemas the handlers parse with.
export const GET = withPublic(async () => NextResponse.json(openApiDocument(), { headers: { "cache-control": "public, max-age=300" } }));
