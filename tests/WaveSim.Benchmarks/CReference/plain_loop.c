/*
 * The leapfrog update of `wavesim bench` written as the plain C loops a compiler auto-vectorises: the same line, the same
 * coefficients, the same step, so `side-by-side.sh` can time both on one machine in one sitting.
 *
 * Line (as KernelBench.TestLine): 1 m, 50 ohm, delay = cells x 1 ps, dt = 1 ps (Courant number 1); lossy: 10 ohm/m and
 * 1 mS/m, near end held at 1 V, far end at 0 V; lossless: R = G = 0 and both ends at 0 V. Starting state V[k] = sin(pi k/n).
 * Step: I[k] = Ci1 I[k] + Ci2 (V[k] - V[k+1]) for k < n, then V[k] = Cv1 V[k] + Cv2 (I[k-1] - I[k]) for 0 < k < n.
 *
 * Usage: plain_loop CELLS STEPS REPEATS LOSSLESS(0|1). Prints one JSON object with the fastest repetition, the same four keys
 * as `wavesim bench --json`.
 */
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

static double now(void)
{
    struct timespec t;
    clock_gettime(CLOCK_MONOTONIC, &t);
    return t.tv_sec + 1e-9 * t.tv_nsec;
}

/* Not inlined into main, so the compiler vectorises it as it would a library routine it cannot see the sizes of. */
__attribute__((noinline)) static void step(double *restrict v, double *restrict i, int n, double ci1, double ci2, double cv1, double cv2)
{
    for (int k = 0; k < n; k++) i[k] = ci1 * i[k] + ci2 * (v[k] - v[k + 1]);
    for (int k = 1; k < n; k++) v[k] = cv1 * v[k] + cv2 * (i[k - 1] - i[k]);
}

int main(int argc, char **argv)
{
    if (argc != 5) { fprintf(stderr, "usage: plain_loop CELLS STEPS REPEATS LOSSLESS(0|1)\n"); return 1; }
    int n = atoi(argv[1]), steps = atoi(argv[2]), repeats = atoi(argv[3]), lossless = atoi(argv[4]);
    if (n < 2 || steps < 1 || repeats < 1) { fprintf(stderr, "plain_loop: CELLS >= 2, STEPS >= 1, REPEATS >= 1\n"); return 1; }
    const double dt = 1e-12, z0 = 50, length = 1, delay = n * dt;
    double r = lossless ? 0 : 10, g = lossless ? 0 : 1e-3;
    double l = z0 * delay / length, c = delay / (z0 * length), dz = length / n;
    double li = l / dt + r / 2, cvv = c / dt + g / 2;
    double ci1 = (l / dt - r / 2) / li, ci2 = 1 / (dz * li), cv1 = (c / dt - g / 2) / cvv, cv2 = 1 / (dz * cvv);
    double *v = malloc(sizeof(double) * (n + 1)), *i = calloc(n, sizeof(double));
    for (int k = 1; k < n; k++) v[k] = sin(M_PI * k / n);
    v[0] = lossless ? 0 : 1;
    v[n] = 0;

    int warm = (int)fmin(steps, 1e8 / n);
    if (warm < 1) warm = 1;
    for (int s = 0; s < warm; s++) step(v, i, n, ci1, ci2, cv1, cv2);
    double best = INFINITY;
    for (int rep = 0; rep < repeats; rep++)
    {
        double t0 = now();
        for (int s = 0; s < steps; s++) step(v, i, n, ci1, ci2, cv1, cv2);
        double t = now() - t0;
        if (t < best) best = t;
    }
    for (int k = 0; k < n; k++)
        if (!isfinite(v[k]) || !isfinite(i[k])) { fprintf(stderr, "plain_loop: not finite at cell %d\n", k); return 2; }
    printf("{\"cells\": %d, \"steps\": %d, \"seconds\": %.9g, \"cell_updates_per_s\": %.9g}\n", n, steps, best, (double)n * steps / best);
    free(v);
    free(i);
    return 0;
}
