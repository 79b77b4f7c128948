/**
 * An exclusive lock beside a file, for the file store's read-merge-write: a lock file created
 * with O_EXCL ("wx"), holding who took it (process id, host, a random token, the time).
 *
 * A writer that was killed leaves its lock behind. A lock is stale when its process is gone (same
 * host: signal 0 says so), or, when that cannot be asked (another host on a shared disk, or a lock
 * still empty because its writer died between creating and filling it), when it is older than
 * `staleMs` (empty: 10 s). Breaking a stale lock is itself guarded by a second lock file, and the
 * breaker deletes the lock only if it is still the very file it judged stale (same inode, time and
 * content), so two waiters never both break it, nor one break a lock taken meanwhile. A lock is
 * released only by its owner (its token), so a writer whose lock was broken cannot delete the next.
 */
import { closeSync, openSync, readFileSync, statSync, unlinkSync, writeSync } from 'node:fs';
import { hostname } from 'node:os';
import { StoreError } from './store.js';

export interface LockOptions {
  /** Longest wait for a lock held by a live writer (default 120 s). */
  waitMs?: number;
  /** Age after which a lock whose owner cannot be asked counts as stale (default 10 min). */
  staleMs?: number;
  /** Where messages say the lock is for (the store's description). */
  where: string;
}

interface Holder {
  raw: string;
  pid?: number;
  host?: string;
  token?: string;
  time?: string;
  ino: number;
  mtimeMs: number;
}

const EMPTY_STALE_MS = 10_000;
const BREAKER_STALE_MS = 10_000;

/**
 * Runs `work` while holding the lock `lockPath`, and releases it afterwards (also when work throws).
 * @throws StoreError when the lock cannot be had within waitMs or cannot be created at all.
 * @example await withFileLock('/repo/.bellgate/.history.jsonl.lock', () => append(), { where: 'file h.jsonl' })
 */
export async function withFileLock<T>(lockPath: string, work: () => Promise<T>, options: LockOptions): Promise<T> {
  const token = await acquire(lockPath, options);
  try {
    return await work();
  } finally {
    release(lockPath, token);
  }
}

async function acquire(lockPath: string, options: LockOptions): Promise<string> {
  const waitMs = options.waitMs ?? 120_000;
  const staleMs = options.staleMs ?? 600_000;
  const token = `${process.pid}-${Math.random().toString(36).slice(2)}${Math.random().toString(36).slice(2)}`;
  const content = JSON.stringify({ pid: process.pid, host: hostname(), token, time: new Date().toISOString() });
  const deadline = Date.now() + waitMs;
  // Bounded by the deadline: every turn either takes the lock, breaks a stale one or sleeps.
  for (let turn = 0; ; turn++) {
    try {
      const fd = openSync(lockPath, 'wx', 0o644);
      try {
        writeSync(fd, content);
      } finally {
        closeSync(fd);
      }
      return token;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') {
        throw new StoreError(`cannot create the lock file ${lockPath}: ${(error as Error).message}`, {
          where: options.where,
          fix: 'check that the folder of the history file is writable',
          cause: error,
        });
      }
    }
    const holder = readHolder(lockPath);
    if (holder === undefined) continue; // released meanwhile: try again at once
    if (isStale(holder, staleMs)) {
      breakLock(lockPath, holder);
      continue;
    }
    if (Date.now() > deadline) {
      const who = holder.pid === undefined ? 'a writer' : `process ${holder.pid} on ${holder.host ?? 'another host'}`;
      throw new StoreError(
        `the history file is locked by ${who} since ${holder.time ?? new Date(holder.mtimeMs).toISOString()}; gave up after ${Math.round(waitMs / 1000)} s`,
        {
          where: options.where,
          fix: `wait for that Bellgate to finish; if none is running, delete ${lockPath}`,
        },
      );
    }
    // Short waits that grow, with jitter so waiting writers do not retry in step.
    const wait = Math.min(250, 2 * 2 ** Math.min(turn, 7)) * (0.5 + Math.random());
    await new Promise((r) => setTimeout(r, wait));
  }
}

function readHolder(lockPath: string): Holder | undefined {
  try {
    const stat = statSync(lockPath);
    const raw = readFileSync(lockPath, 'utf8');
    const holder: Holder = { raw, ino: stat.ino, mtimeMs: stat.mtimeMs };
    try {
      const parsed = JSON.parse(raw) as Record<string, unknown>;
      if (typeof parsed.pid === 'number') holder.pid = parsed.pid;
      if (typeof parsed.host === 'string') holder.host = parsed.host;
      if (typeof parsed.token === 'string') holder.token = parsed.token;
      if (typeof parsed.time === 'string') holder.time = parsed.time;
    } catch {
      // An empty or cut lock file: its writer died before filling it, or is filling it now.
    }
    return holder;
  } catch {
    return undefined;
  }
}

function isStale(holder: Holder, staleMs: number): boolean {
  const age = Date.now() - holder.mtimeMs;
  if (holder.pid === undefined) return age > EMPTY_STALE_MS;
  if (holder.host !== hostname()) return age > staleMs;
  return !alive(holder.pid);
}

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    // EPERM: the process exists but belongs to someone else.
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Deletes the stale lock `judged`, if it is still that lock, under the breaker lock. */
function breakLock(lockPath: string, judged: Holder): void {
  const breaker = `${lockPath}.break`;
  let fd: number;
  try {
    fd = openSync(breaker, 'wx', 0o644);
  } catch {
    // Someone else is breaking it; a breaker left by a killed process is removed once it is old.
    try {
      if (Date.now() - statSync(breaker).mtimeMs > BREAKER_STALE_MS) unlinkSync(breaker);
    } catch {
      // gone already
    }
    return;
  }
  try {
    closeSync(fd);
    const now = readHolder(lockPath);
    if (now !== undefined && now.ino === judged.ino && now.mtimeMs === judged.mtimeMs && now.raw === judged.raw) {
      unlinkSync(lockPath);
    }
  } catch {
    // the lock went away meanwhile
  } finally {
    try {
      unlinkSync(breaker);
    } catch {
      // best effort
    }
  }
}

function release(lockPath: string, token: string): void {
  const holder = readHolder(lockPath);
  if (holder?.token !== token) return;
  try {
    unlinkSync(lockPath);
  } catch {
    // already gone
  }
}
