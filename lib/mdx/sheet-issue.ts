export type SheetIssueSeverity = "error" | "warning";

/** One problem in a sheet source; `line` counts from 1 in the whole file. */
export type SheetIssue = {
  line: number;
  column?: number;
  /** Front-matter field, e.g. `operations[0].vf`. */
  path?: string;
  message: string;
  severity: SheetIssueSeverity;
};

export function hasErrors(issues: readonly SheetIssue[]): boolean {
  return issues.some((issue) => issue.severity === "error");
}

export function formatIssue(issue: SheetIssue): string {
  const where = issue.column ? `${issue.line}:${issue.column}` : `${issue.line}`;
  return `line ${where}: ${issue.message}`;
}

/** Thrown when a sheet source that failed validation is compiled. */
export class SheetSourceError extends Error {
  readonly issues: SheetIssue[];

  constructor(issues: SheetIssue[]) {
    const errors = issues.filter((issue) => issue.severity === "error");
    super(`The sheet source has ${errors.length} error(s): ${errors.map(formatIssue).join("; ")}`);
    this.name = "SheetSourceError";
    this.issues = issues;
  }
}
