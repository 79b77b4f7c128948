/**
 * The fetch of the action's HTTP client: undici's, the copy @actions/http-client brings (the
 * action loads it at start through @actions/core, so Node's own fetch would be a second one to
 * start). When the runner has a proxy for `baseUrl` (https_proxy/HTTPS_PROXY for an https API,
 * http_proxy/HTTP_PROXY for http; no_proxy/NO_PROXY and loopback addresses bypass it, all looked
 * up as @actions/http-client does), its proxy agent carries every request, redirects included.
 * @example (await clientFetch('https://api.github.com'))('https://api.github.com/meta')
 */
export async function clientFetch(baseUrl: string): Promise<typeof fetch> {
  const [{ getProxyUrl }, undici] = await Promise.all([import('@actions/http-client/lib/proxy'), import('undici')]);
  const send = undici.fetch as unknown as (url: string, init?: Record<string, unknown>) => Promise<Response>;
  if (getProxyUrl(new URL(baseUrl)) === undefined) return send as unknown as typeof fetch;
  const { HttpClient } = await import('@actions/http-client');
  const dispatcher = new HttpClient('bellgate').getAgentDispatcher(baseUrl);
  return ((url: string, init?: Record<string, unknown>) =>
    send(url, { ...init, dispatcher })) as unknown as typeof fetch;
}
