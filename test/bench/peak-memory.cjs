// Preloaded into every timed process (NODE_OPTIONS=--require): on exit, writes the process's peak
// resident set size in KiB and its CPU time in microseconds (user + system) to BENCH_PEAK_FILE, as
// "peak cpu". The peak is Linux's VmHWM from /proc/self/status: getrusage's ru_maxrss would still
// count the bench's own peak from before the process was started (it survives fork and exec).
'use strict';
const file = process.env.BENCH_PEAK_FILE;
if (file) {
  process.on('exit', () => {
    const fs = require('node:fs');
    const u = process.resourceUsage();
    let peak = u.maxRSS;
    try {
      const hwm = /VmHWM:\s*(\d+)\s*kB/.exec(fs.readFileSync('/proc/self/status', 'utf8'));
      if (hwm) peak = Number(hwm[1]);
    } catch {
      // not Linux: ru_maxrss it is
    }
    fs.writeFileSync(file, `${peak} ${u.userCPUTime + u.systemCPUTime}`);
  });
}
