package org.rcbench.gui;

import java.nio.file.Path;
import java.util.Arrays;
import org.rcbench.circuit.TimerModels;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.probe.CalibrationStore;
import org.rcbench.probe.ProbeProfile;
import org.rcbench.probe.SessionConfig;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.Pace;
import org.rcbench.sim.ProbeOptions;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.source.DemoDesigns;
import org.rcbench.source.LiveSource;
import org.rcbench.source.SourceSpec;

/** Makes the window's sources from its choices, through rcbench's shared live sources. */
public final class Sources {
    private Sources() {
    }

    /**
     * Every kind through {@link LiveSource}, applying the probe calibrations in {@code store}: a
     * choice's exact spec when it has one, else one built from its fields (a reset-on-open probe
     * on a port; a simulated board with {@link #benchConditions}; a file in real time or fast).
     */
    public static SourceFactory standard(CalibrationStore store) {
        return choice -> {
            SourceSpec spec = choice.exact() != null ? choice.exact() : spec(choice);
            SessionConfig config = SessionConfig.defaults();
            if (!(spec instanceof SourceSpec.Port)) {
                config = config.withReconnectPollMillis(50);
            }
            return new SharedSource(LiveSource.of(spec, config, store));
        };
    }

    /** The spec a choice's fields describe. */
    static SourceSpec spec(SourceChoice c) {
        switch (c.kind()) {
            case PORT:
                if (c.target().isBlank()) {
                    throw new BadInputException("serial port", "choose a port first ('rcbench ports' lists them)");
                }
                return new SourceSpec.Port(c.target(), ProbeProfile.RESET_ON_OPEN);
            case FILE:
                if (c.target().isBlank()) {
                    throw new BadInputException("capture file", "choose a file first");
                }
                return new SourceSpec.CaptureFile(Path.of(c.target()), c.fast() ? Pace.FAST : Pace.REALTIME);
            case SIMULATED: {
                String label = c.target().isBlank() ? DemoDesigns.DEFAULT : c.target();
                Design d = DemoDesigns.resolve(label);
                SimulationSpec s = benchConditions(SimulationSpec.defaults(), d);
                String f = c.fault().strip();
                if (!f.isEmpty()) {
                    s = s.withDeviations(Deviation.parseAll(Arrays.asList(f.split("[\\s,]+"))));
                }
                return new SourceSpec.Simulated(label, d, Double.NaN, s, ProbeOptions.defaults());
            }
            default:
                throw new IllegalArgumentException(c.kind().name());
        }
    }

    /**
     * The window's simulated bench: a little timing noise (50 ppm of the nominal period, rms) and a
     * warm-up that settles within seconds (+0.4 %, 3 s), so the trend, the stability plot and the
     * "settling" state have something to show. Demo conditions, not measured ones.
     */
    public static SimulationSpec benchConditions(SimulationSpec s, Design d) {
        double period = TimerModels.build(d.circuit()).evaluateNominal().periodSeconds();
        SimulationSpec out = s.withWarmUp(0.004, 3);
        return Double.isFinite(period) ? out.withJitterSeconds(50e-6 * period) : out;
    }
}
