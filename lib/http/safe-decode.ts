// Pure: a route segment decoded, or null when it is not valid percent-encoding (`%E0%A4%A`), so the caller answers
// 404 instead of letting decodeURIComponent's URIError escape as a 500.
export function safeDecode(segment: string): string | null {
  try {
    return decodeURIComponent(segment);
  } catch {
    return null;
  }
}
