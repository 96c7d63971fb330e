package org.rcbench.history;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import org.rcbench.units.Tolerance;

/**
 * The estimated value of one part of one unit over its runs, oldest first.
 *
 * @param board     board name
 * @param serial    unit serial, or null (then runs of different units without a serial may be mixed)
 * @param part      designator, e.g. {@code C1}
 * @param unit      the estimates' unit, e.g. {@code F}
 * @param nominal   the design value (from the latest run)
 * @param tolerance the part's tolerance band from the latest run, or null when unknown
 * @param points    one estimate per run, in time order
 */
public record PartTrend(String board, String serial, String part, String unit, double nominal, Tolerance tolerance,
        List<Point> points) {

    public PartTrend {
        Objects.requireNonNull(board, "board");
        Objects.requireNonNull(part, "part");
        unit = unit == null ? "" : unit;
        points = List.copyOf(points);
    }

    /**
     * One run's estimate.
     *
     * @param runId      the run
     * @param recordedAt when it ran
     * @param value      estimated value
     * @param low        low end of the estimate's interval (NaN when not given)
     * @param high       high end of the estimate's interval (NaN when not given)
     */
    public record Point(long runId, Instant recordedAt, double value, double low, double high) {
    }

    /** The fitted drift and projection, looking {@code horizonYears} ahead of the last run (see {@link TrendAnalysis}). */
    public TrendAnalysis analyse(double horizonYears) {
        return TrendAnalysis.of(this, horizonYears);
    }
}
