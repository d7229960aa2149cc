package dev.tether.ranking;

/** A function to minimize, with its gradient. */
public interface DifferentiableFunction {
    int dimension();

    /** The value at {@code x}; writes the gradient at {@code x} into {@code gradient}. */
    double valueAndGradient(double[] x, double[] gradient);
}
