/**
 * Real example event payloads, as GitHub sends them (the `@octokit/webhooks-examples` package,
 * collected from GitHub's own webhook deliveries), so the action is driven with what the runner
 * puts in GITHUB_EVENT_PATH rather than with this project's reading of it. `schedule` has no
 * webhook payload; its runs carry only `{ "schedule": "<cron>" }` plus the repository.
 */
import { createRequire } from 'node:module';

type Payload = Record<string, unknown>;
interface WebhookExamples {
  name: string;
  examples: Payload[];
}

const require = createRequire(import.meta.url);
const all = require('@octokit/webhooks-examples/api.github.com/index.json') as WebhookExamples[];

/**
 * A fresh copy of the first example of `event` (with `action`, when given) that `accept` takes.
 * @throws when the package holds no such example (a test written against another version).
 */
export function examplePayload(event: string, action?: string, accept: (p: Payload) => boolean = () => true): Payload {
  const found = all
    .find((e) => e.name === event)
    ?.examples.find((p) => (action === undefined || p.action === action) && accept(p));
  if (found === undefined)
    throw new Error(`@octokit/webhooks-examples has no ${event}${action ? `.${action}` : ''} example`);
  return structuredClone(found);
}
