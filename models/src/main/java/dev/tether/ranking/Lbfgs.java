package dev.tether.ranking;

/**
 * Limited-memory BFGS (Nocedal 1980; Liu &amp; Nocedal 1989): the two-loop recursion over the last {@link #MEMORY}
 * steps gives a quasi-Newton direction, and a backtracking line search enforces the Armijo condition. Plain
 * sequential arithmetic, so the same start and function give the same result bits on every run.
 */
public final class Lbfgs {
    /** Steps remembered for the curvature estimate. */
    static final int MEMORY = 10;
    private static final double ARMIJO = 1e-4;

    private final int maxIterations;
    private final double tolerance;

    /**
     * @param maxIterations most iterations
     * @param tolerance     stop when the objective falls by less than this fraction over an iteration, or the
     *                      gradient norm is below {@code tolerance · max(1, ||x||)}
     */
    public Lbfgs(int maxIterations, double tolerance) {
        this.maxIterations = maxIterations;
        this.tolerance = tolerance;
    }

    /** How a minimization ended. */
    public record Result(double[] x, double value, int iterations, boolean converged) {
    }

    public Result minimize(DifferentiableFunction f, double[] start) {
        int n = f.dimension();
        double[] x = start.clone();
        double[] g = new double[n];
        double value = f.valueAndGradient(x, g);
        double[][] s = new double[MEMORY][];
        double[][] y = new double[MEMORY][];
        double[] rho = new double[MEMORY];
        double[] alpha = new double[MEMORY];
        int stored = 0;
        int newest = -1;
        double[] direction = new double[n];
        double[] xNew = new double[n];
        double[] gNew = new double[n];
        for (int iteration = 1; iteration <= maxIterations; iteration++) {
            if (norm(g) <= tolerance * Math.max(1, norm(x))) return new Result(x, value, iteration - 1, true);
            // Two-loop recursion: direction = -H g.
            for (int i = 0; i < n; i++) direction[i] = -g[i];
            for (int k = 0; k < stored; k++) {
                int j = Math.floorMod(newest - k, MEMORY);
                alpha[j] = rho[j] * dot(s[j], direction);
                axpy(-alpha[j], y[j], direction);
            }
            double gamma = stored > 0 ? dot(s[newest], y[newest]) / dot(y[newest], y[newest]) : 1 / Math.max(1, norm(g));
            for (int i = 0; i < n; i++) direction[i] *= gamma;
            for (int k = stored - 1; k >= 0; k--) {
                int j = Math.floorMod(newest - k, MEMORY);
                double beta = rho[j] * dot(y[j], direction);
                axpy(alpha[j] - beta, s[j], direction);
            }
            double slope = dot(g, direction);
            if (slope >= 0) {
                // Not a descent direction (curvature information went stale): restart from steepest descent.
                for (int i = 0; i < n; i++) direction[i] = -g[i] / Math.max(1, norm(g));
                slope = dot(g, direction);
                stored = 0;
            }
            double step = 1;
            double newValue;
            int tries = 0;
            while (true) {
                for (int i = 0; i < n; i++) xNew[i] = x[i] + step * direction[i];
                newValue = f.valueAndGradient(xNew, gNew);
                if (newValue <= value + ARMIJO * step * slope) break;
                step *= 0.5;
                if (++tries > 40) return new Result(x, value, iteration, false);
            }
            double[] sk = new double[n];
            double[] yk = new double[n];
            for (int i = 0; i < n; i++) {
                sk[i] = xNew[i] - x[i];
                yk[i] = gNew[i] - g[i];
            }
            double sy = dot(sk, yk);
            if (sy > 1e-12) {
                int slot = (newest + 1) % MEMORY;
                s[slot] = sk;
                y[slot] = yk;
                rho[slot] = 1 / sy;
                newest = slot;
                stored = Math.min(stored + 1, MEMORY);
            }
            double previous = value;
            System.arraycopy(xNew, 0, x, 0, n);
            System.arraycopy(gNew, 0, g, 0, n);
            value = newValue;
            if (previous - value <= tolerance * Math.max(1, Math.abs(previous))) return new Result(x, value, iteration, true);
        }
        return new Result(x, value, maxIterations, false);
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) s += a[i] * b[i];
        return s;
    }

    private static void axpy(double a, double[] x, double[] y) {
        for (int i = 0; i < x.length; i++) y[i] += a * x[i];
    }

    private static double norm(double[] a) {
        return Math.sqrt(dot(a, a));
    }
}
