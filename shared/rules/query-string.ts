type QueryValue = string | number | boolean | null | undefined | readonly (string | number)[];

/**
 * The one query-string builder: `?a=1&b=x` from an object, leaving out empty values (null, undefined, '',
 * empty lists) and joining lists with commas (`assetIds=3,4`). Answers '' when nothing is left.
 */
export function queryString(params: Record<string, QueryValue>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value === null || value === undefined || value === '') continue;
    if (Array.isArray(value)) {
      if (value.length) search.set(key, value.join(','));
    } else search.set(key, String(value));
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}
