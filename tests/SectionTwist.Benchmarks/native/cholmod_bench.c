/* Native baseline for the sparse Cholesky comparison (issue 18): CHOLMOD supernodal analyze + factorize + solve with
 * AMD ordering on a symmetric matrix read from a Matrix Market file (written by
 * `SectionTwist.Benchmarks native`), best of N runs. Prints one line per run and a final "best" line:
 *   run k analyze A factorize F solve S total T cpu C residual R nnzL Z flops G
 * Times are seconds (wall, CLOCK_MONOTONIC; cpu = CLOCK_PROCESS_CPUTIME_ID, all threads).
 * Usage: cholmod_bench matrix.mtx [runs]. BLAS threads follow OPENBLAS_NUM_THREADS. */
#include <stdio.h>
#include <stdlib.h>
#include <time.h>
#include <math.h>
#include <suitesparse/cholmod.h>

static double now(clockid_t id)
{
    struct timespec t;
    clock_gettime(id, &t);
    return t.tv_sec + 1e-9 * t.tv_nsec;
}

int main(int argc, char **argv)
{
    if (argc < 2) { fprintf(stderr, "usage: %s matrix.mtx [runs]\n", argv[0]); return 2; }
    int runs = argc > 2 ? atoi(argv[2]) : 3;
    cholmod_common c;
    cholmod_start(&c);
    FILE *f = fopen(argv[1], "r");
    if (!f) { perror(argv[1]); return 2; }
    cholmod_sparse *a = cholmod_read_sparse(f, &c);
    fclose(f);
    if (!a) { fprintf(stderr, "cannot read %s\n", argv[1]); return 2; }
    size_t n = a->nrow;
    cholmod_dense *ones = cholmod_ones(n, 1, CHOLMOD_REAL, &c);
    cholmod_dense *b = cholmod_zeros(n, 1, CHOLMOD_REAL, &c);
    double alpha[2] = {1, 0}, beta[2] = {0, 0}, mone[2] = {-1, 0}, one[2] = {1, 0};
    cholmod_sdmult(a, 0, alpha, beta, ones, b, &c);
    double best = 1e300;
    for (int r = 0; r < runs; r++)
    {
        c.nmethods = 1;
        c.method[0].ordering = CHOLMOD_AMD;
        c.postorder = 1;
        c.supernodal = CHOLMOD_SUPERNODAL;
        double w0 = now(CLOCK_MONOTONIC), c0 = now(CLOCK_PROCESS_CPUTIME_ID);
        cholmod_factor *l = cholmod_analyze(a, &c);
        double w1 = now(CLOCK_MONOTONIC);
        cholmod_factorize(a, l, &c);
        double w2 = now(CLOCK_MONOTONIC);
        cholmod_dense *x = cholmod_solve(CHOLMOD_A, l, b, &c);
        double w3 = now(CLOCK_MONOTONIC), c3 = now(CLOCK_PROCESS_CPUTIME_ID);
        if (c.status != CHOLMOD_OK || !x) { fprintf(stderr, "cholmod status %d\n", c.status); return 1; }
        cholmod_dense *res = cholmod_copy_dense(b, &c);
        cholmod_sdmult(a, 0, mone, one, x, res, &c);
        double rn = cholmod_norm_dense(res, 2, &c), bn = cholmod_norm_dense(b, 2, &c);
        printf("run %d analyze %.4f factorize %.4f solve %.4f total %.4f cpu %.4f residual %.2e nnzL %.0f flops %.3e\n",
               r + 1, w1 - w0, w2 - w1, w3 - w2, w3 - w0, c3 - c0, rn / bn, c.lnz, c.fl);
        if (w3 - w0 < best) best = w3 - w0;
        cholmod_free_dense(&res, &c);
        cholmod_free_dense(&x, &c);
        cholmod_free_factor(&l, &c);
    }
    printf("best %.4f\n", best);
    cholmod_free_dense(&b, &c);
    cholmod_free_dense(&ones, &c);
    cholmod_free_sparse(&a, &c);
    cholmod_finish(&c);
    return 0;
}
