package org.rcbench.history;

import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.Objects;

/**
 * One clock calibration of a probe against a reference of known frequency.
 *
 * @param id             the calibration's number in the history, or 0 before it is saved
 * @param probeId        the probe's identity (never blank)
 * @param offsetPpm      how fast the probe clock runs, ppm (positive: fast), as {@link org.rcbench.edge.Timebase} uses it
 * @param uncertaintyPpm standard uncertainty of that offset, ppm, &ge; 0
 * @param reference      what it was calibrated against, in plain words (e.g. {@code 1 Hz GPS pulse-per-second})
 * @param measuredAt     when (stored in UTC, to the millisecond)
 */
public record ProbeCalibration(long id, String probeId, double offsetPpm, double uncertaintyPpm, String reference,
        Instant measuredAt) {
    public ProbeCalibration {
        if (probeId == null || probeId.isBlank()) {
            throw new IllegalArgumentException("probeId is blank: " + probeId);
        }
        if (!Double.isFinite(offsetPpm)) {
            throw new IllegalArgumentException("offsetPpm not finite: " + offsetPpm);
        }
        if (!(uncertaintyPpm >= 0) || Double.isInfinite(uncertaintyPpm)) {
            throw new IllegalArgumentException("uncertaintyPpm < 0: " + uncertaintyPpm);
        }
        Objects.requireNonNull(reference, "reference");
        measuredAt = Objects.requireNonNull(measuredAt, "measuredAt").truncatedTo(ChronoUnit.MILLIS);
    }

    /** A calibration to save (id 0). */
    public static ProbeCalibration of(String probeId, double offsetPpm, double uncertaintyPpm, String reference,
            Instant measuredAt) {
        return new ProbeCalibration(0, probeId, offsetPpm, uncertaintyPpm, reference, measuredAt);
    }
}
