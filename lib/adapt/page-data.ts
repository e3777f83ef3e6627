import "server-only";

import { cache } from "react";

import { findVersionAdaptContext } from "./find-version-adapt-context";

/** A sheet version's adapt context, read once per request however many panels and sections ask for it. */
export const findAdaptContext = cache((vendorId: string, versionId: string) => findVersionAdaptContext({ vendorId, versionId }));
