/**
 * Links taken from records: only http(s) addresses and DOIs become links; anything else
 * (javascript:, data:, relative paths, malformed text) is shown as plain text by the caller.
 */

const DOI = /^10\.[0-9]{4,9}\/\S+$/;

/** `https://doi.org/<doi>` with each path segment URL-encoded, or undefined for a malformed DOI. */
export function doiUrl(doi: string): string | undefined {
  const bare = doi.trim().replace(/^(?:doi:\s*|https?:\/\/(?:dx\.)?doi\.org\/)/i, '');
  if (!DOI.test(bare)) return undefined;
  return `https://doi.org/${bare.split('/').map(encodeURIComponent).join('/')}`;
}

/** The address normalised when it is an absolute http(s) URL; undefined otherwise. */
export function httpUrl(url: string): string | undefined {
  let parsed: URL;
  try {
    parsed = new URL(url.trim());
  } catch {
    return undefined;
  }
  if (parsed.protocol !== 'http:' && parsed.protocol !== 'https:') return undefined;
  if (parsed.username || parsed.password) return undefined;
  return parsed.href;
}

/** A free-text source (an observation's `source`): a link when it is a DOI or an http(s) URL. */
export function sourceUrl(text: string): string | undefined {
  return doiUrl(text) ?? (/^https?:\/\//i.test(text.trim()) ? httpUrl(text) : undefined);
}
