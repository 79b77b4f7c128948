// Preloaded into every timed process (NODE_OPTIONS=--require): on exit, writes the process's peak
// resident set size in KiB (getrusage ru_maxrss, via process.resourceUsage) and its CPU time in
// microseconds (user + system) to BENCH_PEAK_FILE, as "maxRSS cpu".
// Works whatever the process does, and costs the same in every measurement, bare node included.
'use strict';
const file = process.env.BENCH_PEAK_FILE;
if (file) {
  process.on('exit', () => {
    const u = process.resourceUsage();
    require('node:fs').writeFileSync(file, `${u.maxRSS} ${u.userCPUTime + u.systemCPUTime}`);
  });
}
