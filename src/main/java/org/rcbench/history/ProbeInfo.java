package org.rcbench.history;

/**
 * The probe a run was captured with and the clock calibration applied to it.
 *
 * @param probeId             the probe's identity (its hello frame's id, or the capture header's
 *                            {@code probe}), or null when unknown
 * @param firmware            the probe firmware's version text, or null when unknown
 * @param clockOffsetPpm      known offset of the probe clock applied to the capture, ppm (0 when none)
 * @param clockUncertaintyPpm standard uncertainty of the probe clock after the offset, ppm, &ge; 0,
 *                            or NaN when not stated
 * @param calibrationSource   where the offset came from in plain words (e.g. {@code capture header},
 *                            {@code probe calibration 2025-01-10 against a 1 Hz reference}), or null
 */
public record ProbeInfo(String probeId, String firmware, double clockOffsetPpm, double clockUncertaintyPpm,
        String calibrationSource) {

    /** Nothing known about the probe. */
    public static final ProbeInfo UNKNOWN = new ProbeInfo(null, null, 0, Double.NaN, null);

    public ProbeInfo {
        if (!Double.isFinite(clockOffsetPpm)) {
            throw new IllegalArgumentException("clockOffsetPpm not finite: " + clockOffsetPpm);
        }
        if (clockUncertaintyPpm < 0 || Double.isInfinite(clockUncertaintyPpm)) {
            throw new IllegalArgumentException("clockUncertaintyPpm < 0 or infinite: " + clockUncertaintyPpm);
        }
    }

    public ProbeInfo withProbeId(String id) {
        return new ProbeInfo(id, firmware, clockOffsetPpm, clockUncertaintyPpm, calibrationSource);
    }

    public ProbeInfo withFirmware(String text) {
        return new ProbeInfo(probeId, text, clockOffsetPpm, clockUncertaintyPpm, calibrationSource);
    }

    /** The clock calibration applied: offset and its standard uncertainty in ppm, and its source. */
    public ProbeInfo withClock(double offsetPpm, double uncertaintyPpm, String source) {
        return new ProbeInfo(probeId, firmware, offsetPpm, uncertaintyPpm, source);
    }
}
