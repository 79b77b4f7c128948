/**
 * Uploads a history file as a new artifact with @actions/artifact. The library (and its Azure
 * blob client) is imported only here, on the upload path, so runs that only check start fast.
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { ArtifactUploader } from './artifact-store.js';

/**
 * The real uploader: writes `text` to a temp folder under `tempRoot` and uploads it zipped.
 * @example await createArtifactUploader(process.env.RUNNER_TEMP)('bellgate-history-x', 'history.json', '{}', 90)
 */
export function createArtifactUploader(tempRoot: string): ArtifactUploader {
  return async (name, fileName, text, retentionDays) => {
    const dir = await mkdtemp(join(tempRoot, 'bellgate-upload-'));
    try {
      const file = join(dir, fileName);
      await writeFile(file, text, 'utf8');
      const { DefaultArtifactClient } = await import('@actions/artifact');
      await new DefaultArtifactClient().uploadArtifact(name, [file], dir, { retentionDays });
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  };
}
