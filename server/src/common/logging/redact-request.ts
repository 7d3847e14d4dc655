/**
 * What the request log keeps of a request: a quote link's token is as good as a password for that
 * quote, so it is cut from the URL, and the route's path segments (which repeat it) are dropped.
 */
export function redactRequestForLog<T extends { url?: string; params?: unknown }>(
  request: T,
): Omit<T, 'params'> & { params: undefined } {
  return {
    ...request,
    url: request.url?.replace(/\/(quotes|q)\/[^/?#]+/, '/$1/[token]'),
    params: undefined,
  };
}
