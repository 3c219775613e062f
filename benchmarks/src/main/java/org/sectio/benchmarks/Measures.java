package org.sectio.benchmarks;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.List;

/** What every benchmark here measures the same way: peak heap and fitted growth exponents. */
final class Measures {

    private Measures() {
    }

    /** Starts a new peak-heap measurement. */
    static void resetPeaks() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            pool.resetPeakUsage();
        }
    }

    /** @return the sum of the heap pools' peaks since {@link #resetPeaks()}, bytes (an upper bound) */
    static long peakHeapBytes() {
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                sum += pool.getPeakUsage().getUsed();
            }
        }
        return sum;
    }

    /** @return the least-squares slope of y on x over the points {x, y} */
    static double slope(List<double[]> points) {
        double mx = 0;
        double my = 0;
        for (double[] p : points) {
            mx += p[0];
            my += p[1];
        }
        mx /= points.size();
        my /= points.size();
        double sxy = 0;
        double sxx = 0;
        for (double[] p : points) {
            sxy += (p[0] - mx) * (p[1] - my);
            sxx += (p[0] - mx) * (p[0] - mx);
        }
        return sxy / sxx;
    }
}
