package dev.tether.benchmarks;

import java.util.SplittableRandom;

/**
 * What two threads give on this machine for work that shares nothing: two copies of one task run side by side against
 * one copy alone, for arithmetic (registers only) and for random reads and writes over a 16 MB array each (each
 * thread its own; what a pipeline's count-table lookups are like). On a machine whose cores share caches and memory
 * bandwidth, the second figure is the ceiling for memory-bound work, and the collection benchmark's two-thread ratio
 * is read against it. Medians of {@code rounds} alternating measurements.
 */
final class MachineScaling {
    private static final int ARRAY = 1 << 22;

    private MachineScaling() {
    }

    /** A sink for results, so that the work is not optimized away. */
    private static volatile double sink;

    private static void arithmetic() {
        double x = 0;
        for (long i = 1; i <= 150_000_000L; i++) x += Math.sqrt(i) / i;
        sink += x;
    }

    private static void memory() {
        int[] a = new int[ARRAY];
        SplittableRandom r = new SplittableRandom(1);
        long s = 0;
        for (int i = 0; i < 6 << 20; i++) {
            int j = r.nextInt(ARRAY);
            a[j]++;
            s += a[(j * 31) & (ARRAY - 1)];
        }
        sink += s;
    }

    /** One copy's time over two copies' time side by side, times two. */
    private static double scaling(Runnable task) throws InterruptedException {
        long t0 = System.nanoTime();
        task.run();
        long one = System.nanoTime() - t0;
        Thread a = new Thread(task);
        Thread b = new Thread(task);
        long t1 = System.nanoTime();
        a.start();
        b.start();
        a.join();
        b.join();
        long two = System.nanoTime() - t1;
        return 2.0 * one / two;
    }

    /** Prints the two ratios (medians of {@code rounds}). */
    static void report(int rounds) throws InterruptedException {
        double[] arithmetic = new double[rounds];
        double[] memory = new double[rounds];
        scaling(MachineScaling::arithmetic); // warm-up
        scaling(MachineScaling::memory);
        for (int r = 0; r < rounds; r++) {
            arithmetic[r] = scaling(MachineScaling::arithmetic);
            memory[r] = scaling(MachineScaling::memory);
        }
        System.out.printf("this machine, 2 threads vs 1 on work that shares nothing: arithmetic %.2fx, random memory %.2fx%n",
                CollectionThroughputMain.median(arithmetic), CollectionThroughputMain.median(memory));
    }
}
