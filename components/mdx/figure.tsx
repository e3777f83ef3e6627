import { figurePropsSchema } from "@/content-schema/mdx-components";

export type FigureMdxProps = { src?: string; alt?: string; caption?: string };

/** An image with its alt text and an optional caption. */
export function Figure({ src, alt, caption, resolveSrc }: FigureMdxProps & { resolveSrc?: (src: string) => string }) {
  const parsed = figurePropsSchema.safeParse({ src, alt, caption });
  if (!parsed.success) return null;
  const figure = parsed.data;
  const href = /^https:/i.test(figure.src) || !resolveSrc ? figure.src : resolveSrc(figure.src);
  return (
    <figure className="my-6 break-inside-avoid">
      {/* eslint-disable-next-line @next/next/no-img-element -- sheet images come from any https host or the vendor's uploads */}
      <img src={href} alt={figure.alt} loading="lazy" decoding="async" className="h-auto max-w-full rounded border border-stone-200" />
      {figure.caption ? <figcaption className="mt-2 text-sm text-stone-600 print:text-black">{figure.caption}</figcaption> : null}
    </figure>
  );
}
