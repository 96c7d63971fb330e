package org.rcbench.probe;

import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.Objects;

/**
 * A probe clock calibration kept by the host, under the probe's id.
 *
 * @param probeId        the probe's id as 16 lowercase hex digits ({@link org.rcbench.protocol.Hello#probeIdHex()})
 * @param offsetPpm      how fast the probe's clock runs, ppm (positive: fast), as {@link org.rcbench.edge.Timebase} uses it
 * @param uncertaintyPpm standard uncertainty of that offset, ppm, &ge; 0
 * @param reference      what it was calibrated against, in plain words
 * @param measuredAt     when (to the millisecond)
 */
public record StoredCalibration(String probeId, double offsetPpm, double uncertaintyPpm, String reference,
        Instant measuredAt) {
    public StoredCalibration {
        if (probeId == null || probeId.isBlank()) {
            throw new IllegalArgumentException("probeId is blank: " + probeId);
        }
        if (!Double.isFinite(offsetPpm) || Math.abs(offsetPpm) >= 1e6) {
            throw new IllegalArgumentException("offsetPpm out of range: " + offsetPpm);
        }
        if (!(uncertaintyPpm >= 0) || Double.isInfinite(uncertaintyPpm)) {
            throw new IllegalArgumentException("uncertaintyPpm < 0: " + uncertaintyPpm);
        }
        Objects.requireNonNull(reference, "reference");
        measuredAt = Objects.requireNonNull(measuredAt, "measuredAt").truncatedTo(ChronoUnit.MILLIS);
    }
}
