import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import type { SheetState } from "@/content-schema/sheet-workflow";

export type SheetRecord = {
  id: string;
  slug: string;
  cutterId: string;
  materialId: string;
  machineClassId: string;
  createdBy: string | null;
};

export type SheetVersion = {
  id: string;
  sheetId: string;
  number: number;
  state: SheetState;
  title: string;
  source: string;
  /** The validated front matter; null while a draft does not validate. */
  frontMatter: SheetFrontMatter | null;
  changeNote: string;
  revision: number;
  authorId: string | null;
  authorName: string | null;
  updatedBy: string | null;
  updatedByName: string | null;
  submittedAt: Date | null;
  approvedBy: string | null;
  approvedByName: string | null;
  approvedAt: Date | null;
  publishedAt: Date | null;
  supersededAt: Date | null;
  withdrawnAt: Date | null;
  withdrawnReason: string | null;
  createdAt: Date;
  updatedAt: Date;
};

/** States a reader may see; drafts and versions in review never reach the Library. */
export const READABLE_STATES: readonly SheetState[] = ["published", "superseded", "withdrawn"];
