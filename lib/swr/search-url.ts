/** The API URL of a search query string; shared by the server page (SWR fallback key) and the client hook. */
export const searchApiUrl = (vendorSlug: string, query: string) =>
  `/api/v1/vendors/${encodeURIComponent(vendorSlug)}/search${query ? `?${query}` : ""}`;
