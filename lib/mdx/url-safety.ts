export type UrlUse = "link" | "image";

const SCHEME = /^([a-z][a-z0-9+.-]*):/i;
const SCRIPTABLE = new Set(["javascript", "vbscript", "data"]);
const ALLOWED: Record<UrlUse, ReadonlySet<string>> = {
  link: new Set(["http", "https", "mailto", "tel"]),
  image: new Set(["https"]),
};
const URL_ATTRIBUTES = new Set(["src", "href", "action", "formaction", "poster", "data", "background", "xlink:href", "srcset"]);

// Browsers ignore control characters and whitespace inside a scheme (`java\tscript:`).
function schemeOf(url: string): string | undefined {
  const squeezed = url.replace(/[\u0000-\u0020\u007f-\u009f]/g, "");
  return SCHEME.exec(squeezed)?.[1].toLowerCase();
}

/** Why a link or image URL may not appear in a sheet, or undefined when it is safe. */
export function unsafeUrlReason(url: string, use: UrlUse): string | undefined {
  const scheme = schemeOf(url);
  if (!scheme) return undefined;
  if (SCRIPTABLE.has(scheme)) return `\`${scheme}:\` URLs are not allowed in a sheet`;
  if (!ALLOWED[use].has(scheme)) {
    const allowed = [...ALLOWED[use]].map((s) => `${s}:`).join(", ");
    return `\`${scheme}:\` URLs are not allowed in ${use}s; use ${allowed} or a relative path`;
  }
  return undefined;
}

/**
 * Why an attribute value is a scriptable URL, or undefined. Text attributes such as
 * a title "Data: keep the guard on" are not URLs, so only a scheme glued to its
 * content, or any scheme in a URL attribute, counts.
 */
export function unsafeAttributeReason(name: string, value: string): string | undefined {
  const scheme = schemeOf(value);
  if (!scheme || !SCRIPTABLE.has(scheme)) return undefined;
  const gluedToContent = !/^[^:]*:\s/.test(value.trimStart());
  if (URL_ATTRIBUTES.has(name.toLowerCase()) || gluedToContent) {
    return `\`${scheme}:\` URLs are not allowed in a sheet (attribute ${name})`;
  }
  return undefined;
}
