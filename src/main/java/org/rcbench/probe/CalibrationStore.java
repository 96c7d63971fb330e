package org.rcbench.probe;

import java.util.Optional;
import org.rcbench.edge.Timebase;
import org.rcbench.protocol.Hello;

/**
 * Where the host keeps probe clock calibrations, by probe id, so that later sessions with the same
 * probe apply them. The commands and the GUI use the history database
 * ({@code org.rcbench.source.HistoryCalibrations}); tests may use any map.
 */
public interface CalibrationStore {
    /** Saves a calibration; the newest one of a probe is the one applied. */
    void save(StoredCalibration calibration);

    /** The newest calibration of {@code probeIdHex}, if any. */
    Optional<StoredCalibration> latest(String probeIdHex);

    /** A store that keeps nothing. */
    static CalibrationStore none() {
        return new CalibrationStore() {
            @Override
            public void save(StoredCalibration calibration) {
                throw new UnsupportedOperationException("this calibration store keeps nothing");
            }

            @Override
            public Optional<StoredCalibration> latest(String probeIdHex) {
                return Optional.empty();
            }
        };
    }

    /**
     * The timebase for a probe: the host's newest stored calibration of its id when there is one
     * (it is more recent than anything in the probe), else what the hello implies
     * ({@link ProbeClock#timebase}). A probe id of 0 ("none") never matches a stored calibration.
     */
    static Timebase timebase(Hello hello, CalibrationStore store) {
        if (hello.probeId() != 0) {
            Optional<StoredCalibration> c = store.latest(hello.probeIdHex());
            if (c.isPresent()) {
                return new Timebase(hello.clockHz(), c.get().offsetPpm(), c.get().uncertaintyPpm());
            }
        }
        return ProbeClock.timebase(hello);
    }
}
