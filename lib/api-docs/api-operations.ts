import type { ApiOperation } from "./api-operation";
import { benchOperations } from "./operations/bench-operations";
import { calculateOperations } from "./operations/calculate-operations";
import { draftingOperations } from "./operations/drafting-operations";
import { libraryOperations } from "./operations/library-operations";
import { supportOperations } from "./operations/support-operations";

/** Every /api/v1 route handler. A unit test walks app/api/v1 and fails on a route without its entry here. */
export const API_OPERATIONS: ApiOperation[] = [
  {
    method: "GET",
    path: "/api/v1/openapi.json",
    tag: "Reference",
    summary: "This document",
    access: "public",
    responses: { "200": { description: "OpenAPI 3.1." } },
  },
  ...calculateOperations,
  ...libraryOperations,
  ...benchOperations,
  ...supportOperations,
  ...draftingOperations,
];
