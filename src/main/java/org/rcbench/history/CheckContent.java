package org.rcbench.history;

import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.rcbench.units.Tolerance;

/**
 * The parts of a check result the history keeps as rows: verdict, measurements with uncertainties,
 * prediction, per-quantity checks, part estimates, suspects, ambiguities and the plot data. Numbers
 * not given in the document are {@code NaN}. Built by {@link CheckDocument#parse}; immutable.
 *
 * @param verdict      {@code pass}, {@code marginal}, {@code fail} or {@code stopped}
 * @param measurements measured quantities in document order
 * @param predictions  predicted quantities (nominal, worst-case and statistical band)
 * @param oscillates   whether the prediction says the circuit runs, or null when not stated
 * @param reason       the prediction's reason text, or null
 * @param checks       per-quantity comparison of measured against band
 * @param estimates    estimated actual part values, by designator
 * @param suspects     ranked suspects, most probable first
 * @param ambiguities  plain-words statements of what the data cannot separate
 * @param histogram    period histogram, or null when the document has none
 * @param trend        frequency over the capture (decimated), empty when the document has none
 */
public record CheckContent(String verdict, List<Measured> measurements, List<Predicted> predictions,
        Boolean oscillates, String reason, List<QuantityCheck> checks, List<Estimate> estimates,
        List<Suspect> suspects, List<String> ambiguities, PeriodHistogram histogram, List<FrequencyPoint> trend) {

    /** The verdicts a check can give, in order of severity. */
    public static final List<String> VERDICTS = List.of("pass", "marginal", "fail", "stopped");

    public CheckContent {
        if (verdict == null || !VERDICTS.contains(verdict)) {
            throw new IllegalArgumentException("verdict not one of " + VERDICTS + ": " + verdict);
        }
        measurements = List.copyOf(measurements);
        predictions = List.copyOf(predictions);
        checks = List.copyOf(checks);
        estimates = List.copyOf(estimates);
        suspects = List.copyOf(suspects);
        ambiguities = List.copyOf(ambiguities);
        trend = List.copyOf(trend);
    }

    /** The measured value of {@code quantity} (a measure key such as {@code frequency_hz}). */
    public Optional<Measured> measurement(String quantity) {
        return measurements.stream().filter(m -> m.quantity().equals(quantity)).findFirst();
    }

    /** The prediction of {@code quantity} (a prediction key such as {@code frequency_hz}). */
    public Optional<Predicted> prediction(String quantity) {
        return predictions.stream().filter(p -> p.quantity().equals(quantity)).findFirst();
    }

    /** The same content with these estimates. */
    public CheckContent withEstimates(List<Estimate> e) {
        return new CheckContent(verdict, measurements, predictions, oscillates, reason, checks, e, suspects,
                ambiguities, histogram, trend);
    }

    /** The same content with the given plot data (for a check document that carried none). */
    public CheckContent withPlots(PeriodHistogram h, List<FrequencyPoint> t) {
        return new CheckContent(verdict, measurements, predictions, oscillates, reason, checks, estimates, suspects,
                ambiguities, h, t);
    }

    /**
     * One measured quantity.
     *
     * @param quantity    the measure key, e.g. {@code frequency_hz}, {@code high_s}
     * @param value       the value in SI units ({@code unit})
     * @param uncertainty expanded uncertainty at {@code coverageFactor}, same unit, or NaN when not stated
     * @param coverage    the coverage factor k of {@code uncertainty} (2), or NaN with no uncertainty
     * @param unit        {@code Hz}, {@code s}, {@code ppm/s}, {@code count}, {@code 1} (a ratio) ...
     */
    public record Measured(String quantity, double value, double uncertainty, double coverage, String unit) {
        public Measured {
            Objects.requireNonNull(quantity, "quantity");
            Objects.requireNonNull(unit, "unit");
        }
    }

    /**
     * One predicted quantity.
     *
     * @param quantity  the prediction key, e.g. {@code period_s}
     * @param nominal   the value with every part at nominal
     * @param worstLow  low end of the worst-case band
     * @param worstHigh high end of the worst-case band
     * @param statLow   low end of the statistical band (2.5 %)
     * @param statHigh  high end of the statistical band (97.5 %)
     */
    public record Predicted(String quantity, double nominal, double worstLow, double worstHigh, double statLow,
            double statHigh) {
        public Predicted {
            Objects.requireNonNull(quantity, "quantity");
        }
    }

    /**
     * The comparison of one measured quantity with its band.
     *
     * @param quantity the key, e.g. {@code frequency_hz}
     * @param measured the measured value
     * @param bandLow  low end of the band it was compared with
     * @param bandHigh high end of that band
     * @param status   the check's word for it ({@code pass}, {@code marginal}, {@code fail} ...)
     */
    public record QuantityCheck(String quantity, double measured, double bandLow, double bandHigh, String status) {
        public QuantityCheck {
            Objects.requireNonNull(quantity, "quantity");
            Objects.requireNonNull(status, "status");
        }
    }

    /**
     * The estimated actual value of one part.
     *
     * @param part      designator, e.g. {@code C1}
     * @param value     estimated value in {@code unit}
     * @param unit      {@code F}, {@code Ω}, ... as the document gives it (may be empty)
     * @param nominal   the design's value
     * @param low       low end of the estimate's interval
     * @param high      high end of the estimate's interval
     * @param tolerance the part's tolerance band (from the document, else from the design), or null
     *                  when neither gives one
     */
    public record Estimate(String part, double value, String unit, double nominal, double low, double high,
            Tolerance tolerance) {
        public Estimate {
            Objects.requireNonNull(part, "part");
            Objects.requireNonNull(unit, "unit");
        }
    }

    /**
     * One ranked suspect.
     *
     * @param rank        1 for the most probable
     * @param part        designator or latent fault, e.g. {@code C1}
     * @param value       its estimated value
     * @param nominal     its design value
     * @param deviation   deviation from nominal as the document gives it, or NaN
     * @param probability posterior probability, 0..1
     */
    public record Suspect(int rank, String part, double value, double nominal, double deviation, double probability) {
        public Suspect {
            Objects.requireNonNull(part, "part");
        }
    }

    /**
     * A histogram of cycle periods: {@code counts[i]} periods in {@code [edges[i], edges[i+1])}.
     *
     * @param edgesSeconds bin edges in seconds, increasing, one more than the counts
     * @param counts       periods per bin, each &ge; 0
     * @param below        periods below the first edge (outliers left out of the plot), &ge; 0
     * @param above        periods at or above the last edge, &ge; 0
     */
    public record PeriodHistogram(double[] edgesSeconds, long[] counts, long below, long above) {
        public PeriodHistogram {
            if (edgesSeconds.length < 2 || counts.length != edgesSeconds.length - 1) {
                throw new IllegalArgumentException("need n+1 edges for n >= 1 counts: " + edgesSeconds.length
                        + " edges, " + counts.length + " counts");
            }
            for (int i = 1; i < edgesSeconds.length; i++) {
                if (!(edgesSeconds[i] > edgesSeconds[i - 1])) {
                    throw new IllegalArgumentException("edges not increasing at " + i + ": " + edgesSeconds[i]);
                }
            }
            for (long c : counts) {
                if (c < 0) {
                    throw new IllegalArgumentException("negative count: " + c);
                }
            }
            if (below < 0 || above < 0) {
                throw new IllegalArgumentException("negative outlier count: " + below + ", " + above);
            }
            edgesSeconds = edgesSeconds.clone();
            counts = counts.clone();
        }

        @Override
        public double[] edgesSeconds() {
            return edgesSeconds.clone();
        }

        @Override
        public long[] counts() {
            return counts.clone();
        }

        /** Periods counted in the bins (outliers excluded). */
        public long total() {
            long t = 0;
            for (long c : counts) {
                t += c;
            }
            return t;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof PeriodHistogram h && Arrays.equals(edgesSeconds, h.edgesSeconds)
                    && Arrays.equals(counts, h.counts) && below == h.below && above == h.above;
        }

        @Override
        public int hashCode() {
            return 31 * Arrays.hashCode(edgesSeconds) + Arrays.hashCode(counts) + Long.hashCode(below + 7 * above);
        }

        @Override
        public String toString() {
            return "PeriodHistogram" + Arrays.toString(edgesSeconds) + Arrays.toString(counts) + " below=" + below
                    + " above=" + above;
        }
    }

    /**
     * The frequency over one stretch of the capture.
     *
     * @param tSeconds    time of the stretch's middle since the capture started, s
     * @param frequencyHz mean frequency over the stretch, Hz
     */
    public record FrequencyPoint(double tSeconds, double frequencyHz) {
    }
}
