package org.rcbench.source;

import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.Objects;
import org.rcbench.design.Design;
import org.rcbench.probe.ProbeProfile;
import org.rcbench.sim.Pace;
import org.rcbench.sim.ProbeOptions;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;
import org.rcbench.units.SiFormat;

/** What a {@link LiveSource} reads: a serial probe, a simulated board, or a capture file. Immutable. */
public sealed interface SourceSpec permits SourceSpec.Port, SourceSpec.Simulated, SourceSpec.CaptureFile {

    /** What to call the source in messages and status lines. */
    String name();

    /**
     * A probe on a serial port.
     *
     * @param port    a device path ({@code /dev/ttyACM0}, a {@code /dev/serial/by-id} link, a pty) or a USB id
     *                {@code vvvv:pppp[:serial]}
     * @param profile how the probe behaves when the port opens (DTR, boot time)
     */
    record Port(String port, ProbeProfile profile) implements SourceSpec {
        public Port {
            Objects.requireNonNull(port, "port");
            Objects.requireNonNull(profile, "profile");
        }

        @Override
        public String name() {
            return port;
        }
    }

    /**
     * A simulated board on a simulated probe, through the real wire protocol.
     *
     * @param label       how the user named it, e.g. {@code demo:piper-mk2}
     * @param design      the board's design, or null for a reference signal
     * @param referenceHz the reference signal's frequency when {@code design} is null, else NaN
     * @param simulation  deviations, noise, probe clock, seed
     * @param probe       the simulated probe's identity, pace and injected faults
     */
    record Simulated(String label, Design design, double referenceHz, SimulationSpec simulation, ProbeOptions probe)
            implements SourceSpec {
        public Simulated {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(simulation, "simulation");
            Objects.requireNonNull(probe, "probe");
            if (design == null && !(referenceHz > 0)) {
                throw new IllegalArgumentException("a simulated source needs a design or a reference frequency");
            }
        }

        /** A simulated copy of {@code design} (label {@code design.source()}). */
        public static Simulated of(Design design, SimulationSpec simulation, ProbeOptions probe) {
            return new Simulated(design.source(), design, Double.NaN, simulation, probe);
        }

        /** A fresh board, at power-up (throws a one-line error when a deviation does not fit the design). */
        public VirtualBoard board() {
            return design == null ? VirtualBoard.reference(referenceHz, simulation) : VirtualBoard.of(design, simulation);
        }

        /**
         * The simulation in one line, for capture headers: label, deviations, noise, probe clock,
         * seed, e.g. {@code demo:piper-mk2 C1=-25% jitter=2.000µs clock=16000000Hz+0ppm seed=3}.
         */
        public String description() {
            StringBuilder sb = new StringBuilder(label);
            for (org.rcbench.sim.Deviation d : simulation.deviations()) {
                sb.append(' ').append(d);
            }
            SimulationSpec s = simulation;
            if (s.jitterSeconds() > 0) {
                sb.append(" jitter=").append(SiFormat.format(s.jitterSeconds(), "s", 4).replace(" ", ""));
            }
            if (s.rippleVolts() > 0) {
                sb.append(" ripple=").append(num(s.rippleVolts())).append("V@").append(num(s.rippleHz())).append("Hz");
            }
            if (s.warmUpFraction() != 0) {
                sb.append(" warm-up=").append(s.warmUpFraction() > 0 ? "+" : "").append(num(s.warmUpFraction() * 100))
                        .append("%@").append(num(s.warmUpSeconds())).append('s');
            }
            sb.append(" clock=").append(num(s.clockHz())).append("Hz")
                    .append(s.clockOffsetPpm() >= 0 ? "+" : "").append(num(s.clockOffsetPpm())).append("ppm");
            sb.append(" seed=").append(s.seed());
            return sb.toString();
        }

        private static String num(double v) {
            return new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros().toPlainString();
        }

        @Override
        public String name() {
            return "simulated " + (design == null ? "reference " + referenceHz + " Hz" : design.title()) + " (" + label + ")";
        }
    }

    /**
     * A capture file replayed as if live.
     *
     * @param file an rcbench edge capture (plain or gzip) or IEEE 1364 VCD file
     * @param pace {@link Pace#REALTIME} to replay at the speed it was recorded, {@link Pace#FAST} at once
     */
    record CaptureFile(Path file, Pace pace) implements SourceSpec {
        public CaptureFile {
            Objects.requireNonNull(file, "file");
            Objects.requireNonNull(pace, "pace");
        }

        @Override
        public String name() {
            return file.toString();
        }
    }
}
