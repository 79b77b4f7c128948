// A writer process for the file-store tests, bundled by test/helpers/bundle.ts and run by node:
//   node file-writer.mjs record PATH WRITER COUNT   -> COUNT records with ids "<WRITER>0<i>-1"
//   node file-writer.mjs die-in-rewrite PATH        -> takes the lock, leaves a temp file, is killed
//   node file-writer.mjs die-in-append PATH         -> takes the lock, writes half a line, is killed
import { closeSync, openSync, writeFileSync, writeSync } from 'node:fs';
import { createFileStore, lockPathOf, tempPathOf } from '../../../src/history/file-store.js';
import { withFileLock } from '../../../src/history/file-lock.js';

const [mode, path = '', a = '0', b = '0'] = process.argv.slice(2);
const store = createFileStore(path, 'linux-x64');

if (mode === 'record') {
  const writer = Number(a);
  const count = Number(b);
  for (let i = 0; i < count; i++) {
    const id = `${writer}0${i}-1`;
    await store.update({
      kind: 'record',
      info: { id, time: new Date(Date.UTC(2026, 0, 1, 0, writer, i)).toISOString() },
      run: { metrics: new Map([['build/compile', { value: writer * 100 + i, unit: 's', count: 1 }]]), meta: new Map() },
      keep: 100_000,
    });
  }
  process.stdout.write(`ok ${count}\n`);
} else {
  // Take the lock the way the store does, then die holding it (SIGKILL: no cleanup runs).
  await withFileLock(
    lockPathOf(path),
    async () => {
      if (mode === 'die-in-rewrite') writeFileSync(tempPathOf(path, 'deadbeef'), '{"schema":"bellgate.history/3"');
      else {
        const fd = openSync(path, 'a');
        writeSync(fd, '{"id":"torn-1","time":"2026-01-0');
        closeSync(fd);
      }
      process.kill(process.pid, 'SIGKILL');
      await new Promise(() => undefined);
    },
    { where: `file ${path}` },
  );
}
