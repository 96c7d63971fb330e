package org.rcbench.measure;

import java.util.List;
import org.rcbench.stability.StabilityPoint;

/**
 * Everything measured on one channel, in SI units. Figures with no data are {@code NaN}.
 *
 * @param channel      the channel measured
 * @param cycles       cycles accepted into the figures (settling, glitches and broken cycles excluded)
 * @param edges        edges seen on the channel, glitch edges included
 * @param spanSeconds  from the first to the last accepted rising edge, gaps and stalls included
 * @param frequency    the least-squares frequency and its uncertainty budget
 * @param period       period statistics; its standard uncertainty is that of the fitted period
 * @param high         high-time statistics (positive pulse width)
 * @param low          low-time statistics
 * @param duty         mean high over mean period, 0..1
 * @param dutyStandardUncertainty standard uncertainty of {@code duty} (the probe clock cancels)
 * @param jitter       period and cycle-to-cycle jitter, raw and corrected for quantization
 * @param timeError    TIE and MTIE
 * @param allan        overlapping Allan deviation at octave averaging times
 * @param drift        trend of the period and warm-up
 * @param irregularities what was set aside: settling, glitches, gaps, stalls
 * @param rolling      the same main figures over the most recent cycles
 * @param warnings     plain-language cautions about this measurement
 */
public record Measurement(int channel, long cycles, long edges, double spanSeconds, FrequencyEstimate frequency,
        TimeStats period, TimeStats high, TimeStats low, double duty, double dutyStandardUncertainty,
        Jitter jitter, TimeError timeError, List<StabilityPoint> allan, Drift drift, Irregularities irregularities,
        Rolling rolling, List<String> warnings) {

    public Measurement {
        allan = List.copyOf(allan);
        warnings = List.copyOf(warnings);
    }

    /**
     * Frequency from the least-squares slope of rising-edge time against cycle index, with a GUM
     * (JCGM 100:2008) budget; all uncertainties are standard (k = 1) except {@code expandedHz}.
     *
     * @param frequencyHz              {@code 1 / period}
     * @param periodSeconds            the fitted mean period
     * @param statisticalHz            from the timing noise of the data (white phase and white
     *                                 frequency noise estimated from the Allan variance)
     * @param quantizationHz           from the probe clock's tick
     * @param clockHz                  from the probe clock's stated uncertainty
     * @param combinedHz               root sum of squares of the three
     * @param expandedHz               {@code coverageFactor * combinedHz}
     * @param coverageFactor           2
     * @param quantizationDecorrelated true when the timing noise spreads the period readings over at
     *                                 least one tick, so that successive quantization errors are
     *                                 independent and average down
     * @param whitePhaseNoiseSeconds   estimated white phase noise per edge (standard deviation)
     * @param whiteFrequencyNoiseSeconds estimated white frequency noise per period (standard deviation)
     * @param periodStandardUncertaintySeconds standard uncertainty of {@code periodSeconds}
     */
    public record FrequencyEstimate(double frequencyHz, double periodSeconds, double statisticalHz,
            double quantizationHz, double clockHz, double combinedHz, double expandedHz, double coverageFactor,
            boolean quantizationDecorrelated, double whitePhaseNoiseSeconds, double whiteFrequencyNoiseSeconds,
            double periodStandardUncertaintySeconds) {
    }

    /**
     * Statistics of one kind of interval over the accepted cycles.
     *
     * @param count        intervals
     * @param meanSeconds  mean
     * @param stdDevSeconds sample standard deviation (divisor n - 1)
     * @param minSeconds   shortest
     * @param maxSeconds   longest
     * @param standardUncertaintySeconds standard uncertainty of the mean: spread over root n (or the
     *                     quantization floor tick/sqrt(6) when the readings are not decorrelated)
     *                     and the probe clock, combined
     */
    public record TimeStats(long count, double meanSeconds, double stdDevSeconds, double minSeconds,
            double maxSeconds, double standardUncertaintySeconds) {
    }

    /**
     * Jitter (JEDEC JESD65B definitions): period jitter is the deviation of each period from the
     * mean, cycle-to-cycle jitter the difference of successive periods.
     *
     * @param periodRmsSeconds               sample standard deviation of the period
     * @param periodPeakToPeakSeconds        longest minus shortest period
     * @param cycleToCycleRmsSeconds         root mean square of successive differences
     * @param cycleToCycleMaxSeconds         largest absolute successive difference
     * @param periodRmsCorrectedSeconds      period jitter with the quantization variance tick^2/6
     *                                       removed in quadrature, clamped at zero
     * @param cycleToCycleRmsCorrectedSeconds the same for cycle-to-cycle, variance tick^2/2 removed
     * @param quantizationPerPeriodSeconds   tick/sqrt(6), the quantization noise of one period
     * @param periodCorrectionClamped        the period correction reached zero: jitter below resolution
     * @param cycleToCycleCorrectionClamped  the cycle-to-cycle correction reached zero
     */
    public record Jitter(double periodRmsSeconds, double periodPeakToPeakSeconds, double cycleToCycleRmsSeconds,
            double cycleToCycleMaxSeconds, double periodRmsCorrectedSeconds, double cycleToCycleRmsCorrectedSeconds,
            double quantizationPerPeriodSeconds, boolean periodCorrectionClamped,
            boolean cycleToCycleCorrectionClamped) {
    }

    /**
     * Time interval error of the rising edges against the fitted period (ITU-T G.810 TIE with the
     * frequency offset removed by the fit) and MTIE.
     *
     * @param tieRmsSeconds        RMS of the fit residuals
     * @param mtieSeconds          largest peak-to-peak TIE within one segment (the whole capture when
     *                             there are no gaps)
     * @param windows              MTIE at chosen window lengths; empty in a {@link CycleMeter#snapshot()}
     * @param resolutionCycles     block length of the bounded record: 1 while MTIE is exact
     */
    public record TimeError(double tieRmsSeconds, double mtieSeconds, List<MtiePoint> windows,
            long resolutionCycles) {
        public TimeError {
            windows = List.copyOf(windows);
        }
    }

    /** MTIE over windows of {@code windowCycles} cycles ({@code windowSeconds} long). */
    public record MtiePoint(long windowCycles, double windowSeconds, double mtieSeconds) {
    }

    /**
     * Trend of the period.
     *
     * @param ppmPerSecond         least-squares slope of period against time over all accepted cycles,
     *                             in parts per million of the mean period per second
     * @param warmUp               the period moved at the start and then settled
     * @param settledAtCycle       accepted cycles before the period settled (0 without warm-up)
     * @param settledPpmPerSecond  slope after settling
     */
    public record Drift(double ppmPerSecond, boolean warmUp, long settledAtCycle, double settledPpmPerSecond) {
    }

    /**
     * What was set aside, with counts.
     *
     * @param settlingCycles cycles at the start excluded as settling (e.g. the long first cycle after power-up)
     * @param glitches       runt pulses dropped
     * @param gaps           gaps in the data (level unknown)
     * @param stalls         intervals with no edge for many periods
     * @param stalledSeconds total length of the stalls
     * @param missedEdges    places where the level repeated, so an edge must have been lost
     * @param segments       unbroken runs of cycles
     */
    public record Irregularities(long settlingCycles, long glitches, long gaps, long stalls, double stalledSeconds,
            long missedEdges, int segments) {
    }

    /** The main figures over the newest {@code cycles} accepted cycles. */
    public record Rolling(int cycles, double frequencyHz, double periodSeconds, double highSeconds,
            double lowSeconds, double duty, double periodJitterRmsSeconds, double cycleToCycleRmsSeconds) {
    }
}
