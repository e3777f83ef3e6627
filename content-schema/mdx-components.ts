import { z } from "zod";

import { cautionKindSchema, operationKindSchema } from "./sheet-kinds";

// MDX attributes arrive as strings only: next-mdx-remote drops `{…}` attribute values.

const onlyKindsSchema = z
  .string()
  .transform((text) =>
    text
      .split(",")
      .map((part) => part.trim())
      .filter(Boolean),
  )
  .pipe(z.array(operationKindSchema).min(1, 'List at least one operation kind, e.g. only="slotting,profile"'));

const IMAGE_PATH = /\.(png|jpe?g|webp|avif|gif|svg)$/i;

function isImageSource(src: string): boolean {
  if (/[\s\\]/.test(src) || src.startsWith("//")) return false;
  const path = src.split(/[?#]/)[0];
  if (/^https:\/\/[^/]+\/./i.test(src)) return IMAGE_PATH.test(path);
  // A relative path: no scheme, no leaving the sheet's folder.
  if (/^[a-z][a-z0-9+.-]*:/i.test(src) || src.split("/").includes("..")) return false;
  return IMAGE_PATH.test(path);
}

export const cautionPropsSchema = z.strictObject({
  kind: cautionKindSchema,
  title: z.string().trim().min(1).max(120).optional(),
});

export const operationTablePropsSchema = z.strictObject({
  only: onlyKindsSchema.optional(),
});

export const adaptPanelPropsSchema = z.strictObject({
  operation: z
    .string()
    .regex(/^\d{1,3}$/, "operation is the index of an operation in the front matter, counting from 0")
    .transform(Number)
    .default(0),
});

export const figurePropsSchema = z.strictObject({
  src: z.string().refine(isImageSource, "src must be a relative path or an https URL to an image (.png, .jpg, .webp, .avif, .gif, .svg)"),
  alt: z.string().trim().min(1, "alt text is required: describe the picture for readers who cannot see it").max(300),
  caption: z.string().trim().max(300).optional(),
});

/** The only components a sheet's MDX may use, with the schema of their string props. */
export const mdxComponentSchemas = {
  Caution: cautionPropsSchema,
  OperationTable: operationTablePropsSchema,
  AdaptPanel: adaptPanelPropsSchema,
  Figure: figurePropsSchema,
} as const;

export type MdxComponentName = keyof typeof mdxComponentSchemas;
export const mdxComponentNames = Object.keys(mdxComponentSchemas) as MdxComponentName[];

/** Components that wrap prose; the others must be self-closing. */
export const mdxComponentsWithChildren: ReadonlySet<MdxComponentName> = new Set(["Caution"]);

export function isMdxComponentName(name: string): name is MdxComponentName {
  return Object.hasOwn(mdxComponentSchemas, name);
}

export type CautionProps = z.output<typeof cautionPropsSchema>;
export type OperationTableProps = z.output<typeof operationTablePropsSchema>;
export type AdaptPanelProps = z.output<typeof adaptPanelPropsSchema>;
export type FigureProps = z.output<typeof figurePropsSchema>;
