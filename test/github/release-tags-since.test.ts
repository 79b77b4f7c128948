import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { compareVersions, previousRelease, versionOf } from '../../src/github/release-tags.js';

// A second opinion: npm's `semver` (a devDependency), loaded as is.
const semver = createRequire(import.meta.url)('semver') as { compare(a: string, b: string): number };

const cmp = (a: string, b: string): number => compareVersions(versionOf(a)!, versionOf(b)!);

describe('release tags in Semantic Versioning precedence', () => {
  it("orders semver.org's own example (item 11) as published", () => {
    // semver.org 2.0.0, item 11: 1.0.0-alpha < 1.0.0-alpha.1 < 1.0.0-alpha.beta < 1.0.0-beta <
    // 1.0.0-beta.2 < 1.0.0-beta.11 < 1.0.0-rc.1 < 1.0.0.
    const published = [
      '1.0.0-alpha',
      '1.0.0-alpha.1',
      '1.0.0-alpha.beta',
      '1.0.0-beta',
      '1.0.0-beta.2',
      '1.0.0-beta.11',
      '1.0.0-rc.1',
      '1.0.0',
    ];
    const shuffled = [...published].reverse();
    expect(shuffled.sort(cmp)).toEqual(published);
  });

  it('agrees with npm semver on every pair of a mixed list, a leading v and build metadata included', () => {
    const tags = [
      'v1.2.3',
      '1.10.0',
      'v1.2.10',
      'v2.0.0-rc.1',
      'v2.0.0',
      '0.9.9',
      'v1.2.3+build.7',
      'v1.2.3-2',
      'v1.2.3-10',
    ];
    for (const a of tags) for (const b of tags) expect(Math.sign(cmp(a, b)), `${a} vs ${b}`).toBe(semver.compare(a, b));
  });

  it('the previous release: the highest version below the current, pre-releases passed over by a full release', () => {
    const tags = ['v1.1.0', 'v1.1.0-rc.1', 'v1.0.0', 'v0.9.0', 'nightly', 'v1.0.1-beta'].map((name) => ({
      name,
      sha: name,
    }));
    expect(previousRelease(tags, 'v1.1.0')?.name).toBe('v1.0.0');
    // A release candidate is reviewed since the release candidate or release below it.
    expect(previousRelease(tags, 'v1.1.0-rc.1')?.name).toBe('v1.0.1-beta');
    // Not a release run: the newest release.
    expect(previousRelease(tags)?.name).toBe('v1.1.0');
    expect(previousRelease(tags, 'v0.9.0')).toBeUndefined();
    expect(versionOf('nightly')).toBeUndefined();
  });
});
