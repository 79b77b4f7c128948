/**
 * The previous release tag of a release: among the repository's tags that read as versions
 * (`v1.2.3`, `1.2`, `v2.0.0-rc.1`), the highest below the current one, in Semantic Versioning 2.0.0
 * precedence (numbers compared as numbers; a pre-release below its release; build metadata
 * ignored). A full release skips pre-releases, so v2.4.0 is reviewed since v2.3.x, not since
 * v2.4.0-rc.2. Pure.
 */

/** A tag as the repository lists it: its name and the commit it points to. */
export interface RepoTag {
  name: string;
  sha: string;
}

interface Version {
  core: number[];
  pre: string[];
}

const VERSION = /^v?(\d{1,9}(?:\.\d{1,9}){0,3})(?:-([0-9A-Za-z.-]+))?(?:\+[0-9A-Za-z.-]+)?$/;

/** A tag name read as a version, or undefined when it is not one. */
export function versionOf(name: string): Version | undefined {
  const m = VERSION.exec(name);
  if (!m) return undefined;
  return { core: m[1]!.split('.').map(Number), pre: m[2] === undefined ? [] : m[2].split('.') };
}

/** Semantic Versioning precedence (semver.org, item 11); missing core parts count as 0. */
export function compareVersions(a: Version, b: Version): number {
  for (let i = 0; i < Math.max(a.core.length, b.core.length); i++) {
    const d = (a.core[i] ?? 0) - (b.core[i] ?? 0);
    if (d !== 0) return Math.sign(d);
  }
  if (a.pre.length === 0 || b.pre.length === 0) return Math.sign(b.pre.length - a.pre.length);
  for (let i = 0; i < Math.min(a.pre.length, b.pre.length); i++) {
    const x = a.pre[i]!;
    const y = b.pre[i]!;
    if (x === y) continue;
    const nx = /^\d+$/.test(x);
    const ny = /^\d+$/.test(y);
    if (nx && ny) return Math.sign(Number(x) - Number(y));
    if (nx !== ny) return nx ? -1 : 1;
    return x < y ? -1 : 1;
  }
  return Math.sign(a.pre.length - b.pre.length);
}

/**
 * The release before `current` (a tag name; undefined: the newest release, for a run that is no
 * release, e.g. a manual one). Tags that are not versions are passed over.
 * @example previousRelease([{ name: 'v1.0.0', sha: 'a' }, { name: 'v1.1.0', sha: 'b' }], 'v1.1.0')?.name // 'v1.0.0'
 */
export function previousRelease(tags: readonly RepoTag[], current?: string): RepoTag | undefined {
  const now = current === undefined ? undefined : versionOf(current);
  const full = now === undefined || now.pre.length === 0;
  let best: { tag: RepoTag; version: Version } | undefined;
  for (const tag of tags) {
    const v = versionOf(tag.name);
    if (v === undefined || tag.name === current) continue;
    if (full && v.pre.length > 0) continue;
    if (now !== undefined && compareVersions(v, now) >= 0) continue;
    if (best === undefined || compareVersions(v, best.version) > 0) best = { tag, version: v };
  }
  return best?.tag;
}
