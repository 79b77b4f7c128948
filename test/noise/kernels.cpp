// Three compiled kernels of the noise workload (test/noise/workload.mjs), one per invocation:
//   kernels NAME REPS SAMPLES WARMUP
// Runs WARMUP untimed and SAMPLES timed repetitions of REPS units of work and prints one JSON
// line {"wall":[ms...],"cpu":[ms...],"check":N}; the checksum keeps the work from being optimised away.
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <ctime>
#include <vector>
#include <cmath>

static double cpu_ms() {
  timespec ts;
  clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &ts);
  return ts.tv_sec * 1e3 + ts.tv_nsec / 1e6;
}

static double wall_ms() {
  timespec ts;
  clock_gettime(CLOCK_MONOTONIC, &ts);
  return ts.tv_sec * 1e3 + ts.tv_nsec / 1e6;
}

// Dense 96 x 96 matrix product, one product per unit.
static double matmul(long reps) {
  const int n = 96;
  std::vector<double> a(n * n), b(n * n), c(n * n);
  for (int i = 0; i < n * n; i++) {
    a[i] = (i % 17) * 0.25 - 2.0;
    b[i] = (i % 13) * 0.5 - 3.0;
  }
  double sum = 0;
  for (long r = 0; r < reps; r++) {
    for (int i = 0; i < n; i++)
      for (int j = 0; j < n; j++) {
        double s = 0;
        for (int k = 0; k < n; k++) s += a[i * n + k] * b[k * n + j];
        c[i * n + j] = s;
      }
    a[r % (n * n)] += c[(r * 7) % (n * n)] * 1e-9;
    sum += c[(r * 31) % (n * n)];
  }
  return sum;
}

// Sieve of Eratosthenes up to 200,000, one sieve per unit.
static double sieve(long reps) {
  const int limit = 200000;
  std::vector<char> composite(limit + 1);
  double count = 0;
  for (long r = 0; r < reps; r++) {
    std::memset(composite.data(), 0, composite.size());
    for (long i = 2; i * i <= limit; i++)
      if (!composite[i])
        for (long j = i * i; j <= limit; j += i) composite[j] = 1;
    for (int i = 2; i <= limit; i++) count += !composite[i];
  }
  return count;
}

// Five bodies under gravity, 2,000 leapfrog steps per unit.
static double bodies(long reps) {
  double x[5], y[5], z[5], vx[5], vy[5], vz[5], m[5];
  for (int i = 0; i < 5; i++) {
    x[i] = i * 1.1; y[i] = i * 0.7 - 1.0; z[i] = (i % 2) * 0.3;
    vx[i] = 0.01 * i; vy[i] = -0.02 * i; vz[i] = 0.005; m[i] = 1.0 + i * 0.1;
  }
  for (long r = 0; r < reps * 2000; r++) {
    for (int i = 0; i < 5; i++)
      for (int j = i + 1; j < 5; j++) {
        double dx = x[i] - x[j], dy = y[i] - y[j], dz = z[i] - z[j];
        double d2 = dx * dx + dy * dy + dz * dz + 0.01;
        double mag = 0.001 / (d2 * std::sqrt(d2));
        vx[i] -= dx * m[j] * mag; vy[i] -= dy * m[j] * mag; vz[i] -= dz * m[j] * mag;
        vx[j] += dx * m[i] * mag; vy[j] += dy * m[i] * mag; vz[j] += dz * m[i] * mag;
      }
    for (int i = 0; i < 5; i++) { x[i] += 0.001 * vx[i]; y[i] += 0.001 * vy[i]; z[i] += 0.001 * vz[i]; }
  }
  return x[0] + y[1] + z[2];
}

int main(int argc, char** argv) {
  if (argc != 5) {
    std::fprintf(stderr, "usage: kernels matmul|sieve|bodies REPS SAMPLES WARMUP\n");
    return 2;
  }
  const char* name = argv[1];
  long reps = std::atol(argv[2]);
  int samples = std::atoi(argv[3]), warmup = std::atoi(argv[4]);
  double (*kernel)(long) = std::strcmp(name, "matmul") == 0 ? matmul
                           : std::strcmp(name, "sieve") == 0 ? sieve
                           : std::strcmp(name, "bodies") == 0 ? bodies
                           : nullptr;
  if (kernel == nullptr || reps <= 0 || samples <= 0 || warmup < 0) {
    std::fprintf(stderr, "kernels: unknown kernel or bad counts\n");
    return 2;
  }
  double check = 0;
  for (int i = 0; i < warmup; i++) check += kernel(reps);
  std::printf("{\"wall\":[");
  std::vector<double> walls, cpus;
  for (int i = 0; i < samples; i++) {
    double w0 = wall_ms(), c0 = cpu_ms();
    check += kernel(reps);
    walls.push_back(wall_ms() - w0);
    cpus.push_back(cpu_ms() - c0);
  }
  for (int i = 0; i < samples; i++) std::printf("%s%.4f", i ? "," : "", walls[i]);
  std::printf("],\"cpu\":[");
  for (int i = 0; i < samples; i++) std::printf("%s%.4f", i ? "," : "", cpus[i]);
  std::printf("],\"check\":%.6g}\n", check);
  return 0;
}
