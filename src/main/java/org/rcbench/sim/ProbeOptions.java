package org.rcbench.sim;

import java.util.Objects;
import org.rcbench.protocol.ClockSource;

/**
 * Who a simulated probe says it is, how fast it runs and what it does wrong. Immutable; start from
 * {@link #defaults()}.
 *
 * @param probeId                   the probe id in its hello (calibrations are stored under it)
 * @param name                      the name in its hello (ASCII, at most 32 characters)
 * @param clockSource               the clock source it states
 * @param calibrated                whether its hello carries a stored calibration
 * @param calibrationPpb            that calibration, parts per billion (positive: the clock runs fast)
 * @param calibrationUncertaintyPpb its standard uncertainty, parts per billion
 * @param pace                      real time or as fast as the link takes it
 * @param faults                    corruption, loss, overruns and unplugs to inject
 */
public record ProbeOptions(long probeId, String name, ClockSource clockSource, boolean calibrated,
        int calibrationPpb, long calibrationUncertaintyPpb, Pace pace, LinkFaults faults) {

    /** The simulated probe's default identity ("rcbsim" in ASCII, then 1). */
    public static final long DEFAULT_PROBE_ID = 0x7263_6273_696d_0001L;

    public ProbeOptions {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(clockSource, "clockSource");
        Objects.requireNonNull(pace, "pace");
        Objects.requireNonNull(faults, "faults");
        if (calibrationUncertaintyPpb < 0) {
            throw new IllegalArgumentException("calibrationUncertaintyPpb < 0: " + calibrationUncertaintyPpb);
        }
    }

    /** Id {@link #DEFAULT_PROBE_ID}, name {@code rcbench-sim}, a crystal, no stored calibration, real time, clean link. */
    public static ProbeOptions defaults() {
        return new ProbeOptions(DEFAULT_PROBE_ID, "rcbench-sim", ClockSource.CRYSTAL, false, 0, 0, Pace.REALTIME,
                LinkFaults.none());
    }

    public ProbeOptions withProbeId(long id) {
        return new ProbeOptions(id, name, clockSource, calibrated, calibrationPpb, calibrationUncertaintyPpb, pace,
                faults);
    }

    public ProbeOptions withName(String n) {
        return new ProbeOptions(probeId, n, clockSource, calibrated, calibrationPpb, calibrationUncertaintyPpb, pace,
                faults);
    }

    public ProbeOptions withClockSource(ClockSource s) {
        return new ProbeOptions(probeId, name, s, calibrated, calibrationPpb, calibrationUncertaintyPpb, pace, faults);
    }

    /** A calibration stored in the probe and stated in its hello. */
    public ProbeOptions withStoredCalibration(int ppb, long uncertaintyPpb) {
        return new ProbeOptions(probeId, name, clockSource, true, ppb, uncertaintyPpb, pace, faults);
    }

    public ProbeOptions withPace(Pace p) {
        return new ProbeOptions(probeId, name, clockSource, calibrated, calibrationPpb, calibrationUncertaintyPpb, p,
                faults);
    }

    public ProbeOptions withFaults(LinkFaults f) {
        return new ProbeOptions(probeId, name, clockSource, calibrated, calibrationPpb, calibrationUncertaintyPpb, pace,
                f);
    }
}
