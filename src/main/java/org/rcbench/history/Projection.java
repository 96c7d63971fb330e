package org.rcbench.history;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

/**
 * When a part is projected to leave its tolerance band, or why no date is given.
 *
 * @param kind                 the outcome
 * @param edge                 the band edge concerned (an end of the tolerance band), or NaN
 * @param crossing             the fitted line's crossing, or null
 * @param earliest             early end of the 95 % range of the crossing, or null
 * @param latest               late end of that range, or null
 * @param yearsFromLastRun     crossing minus the last run, years (NaN without a crossing)
 * @param earliestFromLastRun  early end minus the last run, years (may be negative: possibly outside already)
 * @param latestFromLastRun    late end minus the last run, years
 * @param horizonYears         how far ahead a date is given
 */
public record Projection(Kind kind, double edge, Instant crossing, Instant earliest, Instant latest,
        double yearsFromLastRun, double earliestFromLastRun, double latestFromLastRun, double horizonYears) {

    /** What the projection says. */
    public enum Kind {
        /** The crossing falls within the horizon: {@link #crossing()} with its range. */
        LEAVES_BAND,
        /** The fitted line stays inside the band for the whole horizon. */
        NOT_WITHIN_HORIZON,
        /** The latest estimate or the fitted line at the latest run is outside the band. */
        ALREADY_OUTSIDE,
        /** The slope is not significantly different from zero: no drift shown. */
        NOT_SIGNIFICANT,
        /** Fewer than {@link TrendAnalysis#MIN_RUNS} runs at distinct times. */
        TOO_FEW_RUNS,
        /** The part's tolerance is not known, so there is no band. */
        NO_TOLERANCE
    }

    private static final DateTimeFormatter MONTH =
            DateTimeFormatter.ofPattern("uuuu-MM", Locale.ROOT).withZone(ZoneOffset.UTC);

    static Projection none(Kind kind, double horizon) {
        return new Projection(kind, Double.NaN, null, null, null, Double.NaN, Double.NaN, Double.NaN, horizon);
    }

    static Projection outside(double edge, double horizon) {
        return new Projection(Kind.ALREADY_OUTSIDE, edge, null, null, null, Double.NaN, Double.NaN, Double.NaN,
                horizon);
    }

    static Projection crossing(double edge, Instant at, Instant earliest, Instant latest, double years,
            double earliestYears, double latestYears, double horizon) {
        Kind kind = years <= horizon ? Kind.LEAVES_BAND : Kind.NOT_WITHIN_HORIZON;
        return new Projection(kind, edge, at, earliest, latest, years, earliestYears, latestYears, horizon);
    }

    /** One plain sentence, e.g. {@code leaves its band (90 nF) around 2027-04, 95 % range 2026-09 to 2028-06}. */
    public String text(String edgeText) {
        String horizon = String.format(Locale.ROOT, "%.0f", horizonYears);
        return switch (kind) {
            case LEAVES_BAND -> "leaves its band (" + edgeText + ") around " + MONTH.format(crossing)
                    + ", 95 % range " + (earliestFromLastRun <= 0 ? "already now" : MONTH.format(earliest))
                    + " to " + MONTH.format(latest) + " if it keeps drifting as it has";
            case NOT_WITHIN_HORIZON -> "not projected to leave its band within the next " + horizon + " years"
                    + (earliestFromLastRun <= horizonYears
                            ? " (but the 95 % range starts " + (earliestFromLastRun <= 0 ? "now" : MONTH.format(earliest)) + ")"
                            : "");
            case ALREADY_OUTSIDE -> "already outside its band (" + edgeText + ")";
            case NOT_SIGNIFICANT -> "no drift shown: the slope is not significantly different from zero, so no projection";
            case TOO_FEW_RUNS -> "too few runs for a projection (need " + TrendAnalysis.MIN_RUNS + " at different times)";
            case NO_TOLERANCE -> "tolerance not known, so no projection";
        };
    }
}
