// Which events record: the rules of README "Which runs are recorded" ("Only runs on the baseline branch (push, schedule,
// manual) are recorded by default; pull-request runs are checked, not recorded").
import { describe, expect, it } from 'vitest';
import { decideRecord } from '../../src/github/event-policy.js';

const main = 'refs/heads/main';

describe('decideRecord', () => {
  it.each(['push', 'schedule', 'workflow_dispatch'])('records %s on the baseline branch', (eventName) => {
    expect(decideRecord('auto', { eventName, ref: main }, 'main').record).toBe(true);
  });
  it('does not record a push to another branch', () => {
    expect(decideRecord('auto', { eventName: 'push', ref: 'refs/heads/feature' }, 'main')).toMatchObject({
      record: false,
      notice: false,
    });
  });
  it('checks a merge queue run like a pull request: never recorded, no notice', () => {
    const ref = 'refs/heads/gh-readonly-queue/main/pr-104-929f8209d40f77f4abc622a499c93a83babdbe64';
    expect(decideRecord('auto', { eventName: 'merge_group', ref }, 'main')).toMatchObject({
      record: false,
      notice: false,
    });
  });
  it.each(['pull_request', 'pull_request_target'])('checks %s only, even with a baseline-looking ref', (eventName) => {
    expect(decideRecord('auto', { eventName, ref: main }, 'main').record).toBe(false);
  });
  it('checks other events only, with a notice', () => {
    expect(decideRecord('auto', { eventName: 'release', ref: main }, 'main')).toMatchObject({
      record: false,
      notice: true,
    });
  });
  it('lets always and never override the event', () => {
    expect(decideRecord('always', { eventName: 'pull_request', ref: 'refs/pull/3/merge' }, 'main').record).toBe(true);
    expect(decideRecord('never', { eventName: 'push', ref: main }, 'main').record).toBe(false);
  });
  it('does not record when the baseline branch is unknown, and says so', () => {
    expect(decideRecord('auto', { eventName: 'push', ref: main }, undefined)).toMatchObject({
      record: false,
      notice: true,
    });
  });
});
