import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { Report } from '../gate/report.js';
import { renderJson } from '../report/json.js';
import { renderMarkdown } from '../report/markdown.js';
import { renderText } from '../report/text.js';

/** The files `--out DIR` writes, in this order. */
export const REPORT_FILES = ['report.md', 'report.json', 'report.txt'] as const;

/**
 * Writes the report as markdown (for a PR comment or job summary), JSON (for scripts) and plain
 * text (no colour codes) into `dir`, creating it.
 * @returns the paths written.
 * @throws the file system's error when the folder cannot be created or written (the CLI names the path).
 */
export async function writeReports(dir: string, report: Report): Promise<string[]> {
  await mkdir(dir, { recursive: true });
  const contents: Record<(typeof REPORT_FILES)[number], string> = {
    'report.md': renderMarkdown(report, {}),
    'report.json': renderJson(report),
    'report.txt': renderText(report, { color: false, all: true }),
  };
  const written: string[] = [];
  for (const name of REPORT_FILES) {
    const path = join(dir, name);
    await writeFile(path, ensureNewline(contents[name]));
    written.push(path);
  }
  return written;
}

function ensureNewline(s: string): string {
  return s.endsWith('\n') ? s : `${s}\n`;
}
