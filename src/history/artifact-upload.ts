/**
 * Uploads history files as a new artifact with @actions/artifact. The library (and its Azure
 * blob client) is imported only here, on the upload path, so runs that only check start fast.
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { ArtifactUploader } from './artifact-store.js';

/**
 * The real uploader: writes the files to a temp folder under `tempRoot` and uploads them zipped.
 * A re-run attempt of a workflow run that already uploaded this name is refused by the service
 * (409: names are unique within a workflow run); the earlier attempt's artifact is then deleted
 * through the runner's own artifact service (no `actions: write` needed) and the upload made once
 * more. Nothing is lost: that artifact was merged into what is uploaded.
 * @example await createArtifactUploader(process.env.RUNNER_TEMP)('bellgate-history-x', [{ name: 'history.jsonl', text }], 90)
 */
export function createArtifactUploader(tempRoot: string): ArtifactUploader {
  return async (name, files, retentionDays) => {
    const dir = await mkdtemp(join(tempRoot, 'bellgate-upload-'));
    try {
      const paths: string[] = [];
      for (const file of files) {
        const path = join(dir, file.name);
        await writeFile(path, file.text, 'utf8');
        paths.push(path);
      }
      const { DefaultArtifactClient } = await import('@actions/artifact');
      const client = new DefaultArtifactClient();
      try {
        return await client.uploadArtifact(name, paths, dir, { retentionDays });
      } catch (error) {
        if (!/409|already exists/i.test(error instanceof Error ? error.message : String(error))) throw error;
        // Replaced only when the earlier attempt's artifact can be found and deleted; otherwise the
        // 409 stands (the store says the earlier attempt's numbers are kept).
        const deleted = await client.deleteArtifact(name).then(
          () => true,
          () => false,
        );
        if (!deleted) throw error;
        return await client.uploadArtifact(name, paths, dir, { retentionDays });
      }
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  };
}
