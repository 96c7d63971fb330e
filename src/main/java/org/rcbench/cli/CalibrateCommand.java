package org.rcbench.cli;

import java.io.PrintWriter;
import java.time.Instant;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MeterConfig;
import org.rcbench.probe.SessionStatus;
import org.rcbench.probe.StoredCalibration;
import org.rcbench.source.DurationGate;
import org.rcbench.source.LiveSource;
import org.rcbench.source.StreamStart;
import org.rcbench.units.SiFormat;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench calibrate}: measures the probe's clock against a reference signal of known
 * frequency and stores the offset, with its uncertainty, under the probe's id; later sessions with
 * that probe apply it.
 *
 * <p>The probe counts {@code clockHz (1 + d)} ticks per true second when its clock runs {@code d}
 * fast, so a reference of {@code f_ref} reads {@code f_m = f_ref / (1 + d)} on the nominal clock and
 * {@code d = f_ref / f_m - 1}. Uncertainty (GUM, JCGM 100:2008): {@code u_m(d) = f_ref u(f_m) / f_m^2}
 * from the least-squares frequency fit (its statistical and quantization parts; the clock's own
 * part is what is being measured), and the reference's stated limit {@code ±a} taken as a rectangular
 * distribution, {@code u_ref = a / sqrt(3)} (JCGM 100:2008, 4.3.7); combined in quadrature.
 */
@Command(name = "calibrate", mixinStandardHelpOptions = true,
        description = {"Measure the probe's clock offset against a reference signal of known frequency (a 1 Hz"
            + " pulse-per-second output, a crystal oscillator) and store it under the probe's id.",
            "Later sessions with the same probe apply it, with its uncertainty."})
public final class CalibrateCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    SourceOptions source;

    @Mixin
    DatabaseOption database;

    @Option(names = "--reference", paramLabel = "FREQ", required = true, converter = ValueConverters.Frequency.class,
            description = "The reference signal's frequency (e.g. 1Hz, 10MHz).")
    double referenceHz;

    @Option(names = "--reference-ppm", paramLabel = "PPM", required = true,
            description = "The reference's own accuracy, ±PPM as its maker states it (a GPS pulse-per-second output"
                + " is typically far below 0.1; a plain crystal oscillator 20-100).")
    double referencePpm;

    @Option(names = "--duration", paramLabel = "TIME", defaultValue = "60s", converter = ValueConverters.Time.class,
            description = "How long to measure, probe time (default: ${DEFAULT-VALUE}); longer averages down the noise.")
    double duration;

    @Option(names = "--channel", paramLabel = "N", defaultValue = "0",
            description = "The channel the reference is on (default: ${DEFAULT-VALUE}).")
    int channel;

    @Option(names = "--probe-id", paramLabel = "HEX",
            description = "Store under this probe id (for a replayed capture, or a probe that states none).")
    String probeId;

    @Option(names = "--dry-run", description = "Measure and print, but store nothing.")
    boolean dryRun;

    @Option(names = "--plain", description = "Progress as appended lines even on a terminal.")
    boolean plain;

    /** A measured frequency further than this from the reference is not the reference (a wrong signal). */
    static final double PLAUSIBLE_FRACTION = 0.02;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!(referencePpm >= 0) || Double.isInfinite(referencePpm)) {
            throw new BadInputException("--reference-ppm", "must be zero or more, not " + referencePpm);
        }
        if (probeId != null && !probeId.matches("[0-9a-fA-F]{1,16}")) {
            throw new BadInputException("--probe-id", "\"" + probeId + "\" is not up to 16 hex digits");
        }
        Terminal term = new Terminal(err, !plain && Terminal.detect());
        LiveSource src = source.open(err, database.calibrations());
        DurationGate gate = new DurationGate(duration);
        CycleMeter[] meter = new CycleMeter[1];
        try (ShutdownGuard guard = new ShutdownGuard(src::close)) {
            src.start(start -> {
                // The raw clock: nominal rate, no offset, no uncertainty (the offset is what is measured).
                meter[0] = new CycleMeter(MeterConfig.of(channel, Timebase.of(start.timebase().clockHz())));
                return gate.wrap(meter[0], start.timebase().clockHz());
            }, gate);
            StreamStart start = src.awaitStreaming(source.streamTimeout());
            long begun = System.nanoTime();
            LiveLoop.run(src, gate, guard, source, duration, 250, () -> false, () -> {
                SessionStatus st = src.status();
                term.status(String.format(Locale.ROOT, "calibrating against %s: %.0f of %.0f s | %s",
                        SiFormat.format(referenceHz, "Hz", 6), Math.min(duration, (System.nanoTime() - begun) * 1e-9),
                        duration, st.line()), st.state().name());
            });
            boolean stopped = guard.triggered();
            src.close();
            term.finish();
            return report(out, err, start, meter[0].result(), stopped);
        } finally {
            src.close();
        }
    }

    private int report(PrintWriter out, PrintWriter err, StreamStart start, Measurement m, boolean stopped) {
        if (m.cycles() < 2) {
            throw new BadInputException(start.source(), "no reference cycles measured on channel " + channel
                    + (stopped ? " before the stop" : " in " + SiFormat.format(duration, "s", 3))
                    + ": check the wiring and --reference");
        }
        double fm = m.frequency().frequencyHz();
        if (Math.abs(fm / referenceHz - 1) > PLAUSIBLE_FRACTION) {
            throw new BadInputException("--reference", "the signal reads " + SiFormat.format(fm, "Hz", 6)
                    + ", not the stated " + SiFormat.format(referenceHz, "Hz", 6)
                    + " reference: check the wiring and the frequency; nothing was stored");
        }
        double offsetPpm = (referenceHz / fm - 1) * 1e6;
        double uMeasurePpm = referenceHz * m.frequency().combinedHz() / (fm * fm) * 1e6;
        double uReferencePpm = referencePpm / Math.sqrt(3);
        double uPpm = Math.hypot(uMeasurePpm, uReferencePpm);
        String id = probeId != null ? String.format(Locale.ROOT, "%016x", Long.parseUnsignedLong(probeId, 16))
                : start.hello() != null && start.hello().probeId() != 0 ? start.hello().probeIdHex() : null;
        out.println(String.format(Locale.ROOT, "probe %s clock offset %+.4f ppm, standard uncertainty %.4f ppm"
                + " (expanded ±%.3f ppm, k = 2)", id == null ? "(no id)" : id, offsetPpm, uPpm, 2 * uPpm));
        out.println(String.format(Locale.ROOT, "  reference %s read as %s over %d cycles (%s);"
                + " uncertainty from the measurement %.4f ppm, from the reference (±%s ppm, rectangular) %.4f ppm",
                SiFormat.format(referenceHz, "Hz", 6), SiFormat.format(fm, "Hz", 10), m.cycles(),
                SiFormat.format(m.spanSeconds(), "s", 3), uMeasurePpm, trim(referencePpm), uReferencePpm));
        if (dryRun) {
            out.println("  not stored (--dry-run)");
        } else if (id == null) {
            err.println("rcbench: warning: the probe states no id, so the calibration cannot be stored; give --probe-id");
        } else {
            String reference = SiFormat.format(referenceHz, "Hz", 6) + " reference ±" + trim(referencePpm) + " ppm, "
                    + m.cycles() + " cycles";
            database.calibrations().save(new StoredCalibration(id, offsetPpm, uPpm, reference, Instant.now()));
            out.println("  stored in the history " + database.path() + "; sessions with this probe apply it from now on");
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static String trim(double v) {
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
