/**
 * The runner's proxy for the action's HTTP client. The proxy is looked up the way @actions/http-
 * client does it (https_proxy/HTTPS_PROXY for an https API, http_proxy/HTTP_PROXY for http,
 * no_proxy/NO_PROXY and loopback addresses bypass it). Only when one applies are @actions/http-
 * client's proxy agent and undici's fetch loaded (together far slower to start than Node's own
 * fetch); the agent then carries every request of the client, redirects included.
 */

/**
 * A fetch that goes through the proxy configured for `baseUrl`, or undefined when none applies
 * (octokit then uses Node's fetch).
 * @example await proxyFetch('https://api.github.com') // undefined on a runner without a proxy
 */
export async function proxyFetch(baseUrl: string): Promise<typeof fetch | undefined> {
  const { getProxyUrl } = await import('@actions/http-client/lib/proxy');
  if (getProxyUrl(new URL(baseUrl)) === undefined) return undefined;
  const [{ HttpClient }, undici] = await Promise.all([import('@actions/http-client'), import('undici')]);
  const dispatcher = new HttpClient('bellgate').getAgentDispatcher(baseUrl);
  return ((url: string, init?: Record<string, unknown>) =>
    undici.fetch(url, { ...init, dispatcher } as never)) as unknown as typeof fetch;
}
