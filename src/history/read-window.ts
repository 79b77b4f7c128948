/**
 * How many of the newest runs a check reads: twice the largest `window` any metric uses. A metric
 * missing from some runs still finds its window in them, and the change-point search has room
 * before the window's start; the gate works on whatever tail it is given. At least 1.
 * Structural parameter: only the windows of the config are read.
 *
 * @example runsToRead({ defaults: { window: 60 }, rules: [{ settings: { window: 200 } }] }) // 400
 */
export function runsToRead(config: {
  defaults: { window: number };
  rules: readonly { settings: { window?: number } }[];
}): number {
  const largest = Math.max(config.defaults.window, ...config.rules.map((r) => r.settings.window ?? 0));
  return Math.max(1, CHECK_WINDOW_FACTOR * largest);
}

/** Runs read per window run (see runsToRead). */
export const CHECK_WINDOW_FACTOR = 2;
