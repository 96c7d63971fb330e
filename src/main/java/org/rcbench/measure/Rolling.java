package org.rcbench.measure;

/** Builds the rolling figures from the ring of recent cycles. Stateless. */
final class Rolling {
    private Rolling() {
    }

    static Measurement.Rolling of(RecentCycles recent, int window, double ticksPerSecond) {
        int n = Math.min(window, recent.size());
        if (n == 0) {
            return new Measurement.Rolling(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN);
        }
        double sumH = 0;
        double sumL = 0;
        for (int j = 0; j < n; j++) {
            sumH += recent.highBack(j);
            sumL += recent.lowBack(j);
        }
        double meanH = sumH / n;
        double meanL = sumL / n;
        double meanP = meanH + meanL;
        double ss = 0;
        double c2c = 0;
        int pairs = 0;
        for (int j = 0; j < n; j++) {
            double p = recent.highBack(j) + recent.lowBack(j);
            ss += (p - meanP) * (p - meanP);
            if (j + 1 < n && !recent.breakBeforeBack(j)) {
                double d = p - (recent.highBack(j + 1) + recent.lowBack(j + 1));
                c2c += d * d;
                pairs++;
            }
        }
        double jitter = n >= 2 ? Math.sqrt(ss / (n - 1)) / ticksPerSecond : Double.NaN;
        double c2cRms = pairs > 0 ? Math.sqrt(c2c / pairs) / ticksPerSecond : Double.NaN;
        return new Measurement.Rolling(n, ticksPerSecond / meanP, meanP / ticksPerSecond, meanH / ticksPerSecond,
                meanL / ticksPerSecond, meanH / meanP, jitter, c2cRms);
    }
}
