/**
 * The loopback GitHub a workflow test needs, started together and stopped in reverse: Azurite
 * (artifact storage), the REST stand-in and the results service in front of them, plus a
 * temporary folder for the workspaces.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ROOT } from '../action-runner.js';
import { startAzurite, type Azurite } from './azurite.js';
import { startRestStandin, type RestStandin } from './rest-api.js';
import { startResultsStandin, type ResultsStandin } from './results-service.js';

export interface Services {
  root: string;
  azurite: Azurite;
  rest: RestStandin;
  results: ResultsStandin;
  close(): Promise<void>;
}

export async function startServices(prefix: string): Promise<Services> {
  const root = await mkdtemp(join(tmpdir(), prefix));
  const azurite = await startAzurite(ROOT);
  const rest = await startRestStandin();
  const results = await startResultsStandin(azurite, rest);
  return {
    root,
    azurite,
    rest,
    results,
    async close() {
      await results.close();
      await rest.close();
      await azurite.stop();
      await rm(root, { recursive: true, force: true });
    },
  };
}
