package org.rcbench.sim;

import java.util.Map;
import java.util.Random;
import java.util.concurrent.locks.LockSupport;
import java.util.function.BooleanSupplier;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.Topology;
import org.rcbench.circuit.Trigger;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * A simulated board: a design with chosen deviations ({@link SimulationSpec}), producing the edges
 * a probe would timestamp, in probe ticks, into any {@link EdgeSink}.
 *
 * <p>Use: {@code VirtualBoard b = VirtualBoard.of(design, SimulationSpec.defaults().withDeviation(
 * Deviation.parse("C1=-35%")).withSeed(7)); b.runFor(10.0, meter);}
 *
 * <h2>What it computes</h2>
 * <ul>
 * <li>Timing from {@link TimerModel#evaluate} with the deviations applied: once, or per phase when
 * the supply ripples (the supply parameter follows {@code V + a sin(2 pi f t)}).</li>
 * <li>Astables: the output rises at power-up ({@link SimulationSpec#powerUpSeconds()}); the first high
 * time is the model's power-up value (capacitor from 0 V: {@code (Ra+Rb) C ln 3} instead of
 * {@code ln 2} for the ideal astable, +58.5 %); then high and low alternate.</li>
 * <li>Monostables: a trigger channel ({@link #TRIGGER}) with presses at the stimulus rate and the
 * output pulse one propagation delay after each accepted trigger. Bistables: set ({@link #SET}) and
 * reset ({@link #RESET}) button channels with contact bounce.</li>
 * <li>Warm-up stretches each interval by {@code 1 + a exp(-t/tau)}; jitter adds white Gaussian noise
 * to each period (see {@link SimulationSpec#jitterSeconds()}).</li>
 * <li>Quantization to the probe clock like a real capture: an edge at true time {@code t} seconds
 * after the probe's tick 0 gets {@code tick = floor(t * clockHz * (1 + clockOffsetPpm * 1e-6))}.</li>
 * </ul>
 * Random draws come from {@link java.util.Random} seeded from the spec (its algorithm is fixed by its
 * specification, so a seed gives the same edges on every Java version): one stream for the timing
 * noise, another for the buttons, so changing one does not reshuffle the other.
 *
 * <p>Not thread-safe: one thread advances a board. Advancing allocates nothing in steady state
 * (one model evaluation per phase with ripple, under a microsecond each).
 */
public final class VirtualBoard {
    /** The timer's output. */
    public static final int OUTPUT = 0;
    /** Monostable: the trigger input. */
    public static final int TRIGGER = 1;
    /** Bistable: the set button. */
    public static final int SET = 1;
    /** Bistable: the reset button. */
    public static final int RESET = 2;

    private static final long NOISE_STREAM = 0x6a09e667f3bcc909L;
    private static final long BUTTON_STREAM = 0xbb67ae8584caa73bL;
    private static final double DEFAULT_TRIGGER_WIDTH = 1e-3;

    private final String title;
    private final SimulationSpec spec;
    private final TimerModel model;
    private final double[] parameters;
    private final Conditions conditions;
    private final BoardProcess process;
    private final Map<Integer, String> channelNames;
    private final Topology topology;
    private final double ticksPerSecond;
    private final EventQueue queue = new EventQueue();
    private double now;
    private long lastTick;

    private VirtualBoard(String title, SimulationSpec spec, TimerModel model, double[] parameters, Topology topology,
            double referenceHz) {
        this.title = title;
        this.spec = spec;
        this.model = model;
        this.parameters = parameters;
        this.topology = topology;
        this.ticksPerSecond = spec.ticksPerSecond();
        this.conditions = new Conditions(model, parameters, spec, new Random(spec.seed() ^ NOISE_STREAM));
        double on = spec.powerUpSeconds();
        if (topology == null) {
            process = new ReferenceWave(conditions, OUTPUT, on, referenceHz);
            channelNames = Map.of(OUTPUT, "reference");
        } else if (topology == Topology.MONOSTABLE) {
            Trigger trig = model.spec().trigger();
            double delay = parameters[model.parameters().index(ParameterTable.DELAY)];
            process = new OneShot(conditions, OUTPUT, TRIGGER, on, trig.intervalSeconds(), trig.widthSeconds(), delay);
            channelNames = Map.of(OUTPUT, "output", TRIGGER, "trigger");
        } else if (topology == Topology.BISTABLE) {
            double delay = parameters[model.parameters().index(ParameterTable.DELAY)];
            process = new Latch(OUTPUT, SET, RESET, on, spec.stimulus(), delay,
                    new Random(spec.seed() ^ BUTTON_STREAM));
            channelNames = Map.of(OUTPUT, "output", SET, "set", RESET, "reset");
        } else {
            process = new Oscillator(conditions, OUTPUT, on);
            channelNames = Map.of(OUTPUT, "output");
        }
    }

    /**
     * The board of {@code design} with the deviations of {@code spec}. Throws a one-line
     * {@link BadInputException} when a deviation names no part of the design or has a bad value.
     */
    public static VirtualBoard of(Design design, SimulationSpec spec) {
        return of(design.circuit(), design.title(), spec);
    }

    /** As {@link #of(Design, SimulationSpec)} for a bare circuit; {@code title} names it in messages. */
    public static VirtualBoard of(CircuitSpec circuit, String title, SimulationSpec spec) {
        CircuitSpec c = circuit;
        if (c.topology() == Topology.MONOSTABLE) {
            c = c.withTrigger(trigger(c, title, spec));
        }
        TimerModel model = TimerModels.build(c);
        double[] nominal = model.nominal();
        double[] p = nominal.clone();
        for (Deviation d : spec.deviations()) {
            d.resolve(model.parameters(), nominal, title).applyTo(p);
        }
        return new VirtualBoard(title, spec, model, p, c.topology(), Double.NaN);
    }

    /**
     * A reference signal of exactly {@code frequencyHz} in true time, for calibrating the probe
     * clock (see {@link ReferenceWave}); the spec's clock offset and jitter apply, its deviations,
     * ripple and warm-up do not.
     */
    public static VirtualBoard reference(double frequencyHz, SimulationSpec spec) {
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
            throw new IllegalArgumentException("frequencyHz <= 0: " + frequencyHz);
        }
        return new VirtualBoard("reference " + frequencyHz + " Hz", spec, null, null, null, frequencyHz);
    }

    /**
     * The trigger the simulated monostable gets: the stimulus's values, else the design's, else 1 ms
     * presses every 2.5 pulse widths (computed at nominal with the stimulus's width).
     */
    private static Trigger trigger(CircuitSpec c, String title, SimulationSpec spec) {
        Stimulus s = spec.stimulus();
        double width = !Double.isNaN(s.triggerWidthSeconds()) ? s.triggerWidthSeconds()
                : !Double.isNaN(c.trigger().widthSeconds()) ? c.trigger().widthSeconds() : DEFAULT_TRIGGER_WIDTH;
        double interval = !Double.isNaN(s.triggerIntervalSeconds()) ? s.triggerIntervalSeconds()
                : c.trigger().intervalSeconds();
        if (Double.isNaN(interval)) {
            Timing t = TimerModels.build(c.withTrigger(new Trigger(width, Double.NaN))).evaluateNominal();
            if (!t.runs()) {
                throw new BadInputException(title, "the design's monostable does not run (" + t.reasonText()
                        + "); give a trigger interval");
            }
            interval = 2.5 * t.pulseWidthSeconds();
        }
        if (!(width < interval)) {
            throw new BadInputException(title, "the trigger width must be shorter than the trigger interval");
        }
        return new Trigger(width, interval);
    }

    /** The board's name, e.g. {@code Piper Mk2}. */
    public String title() {
        return title;
    }

    public SimulationSpec spec() {
        return spec;
    }

    /** The circuit's topology, or null for a reference signal. */
    public Topology topology() {
        return topology;
    }

    /** The circuit model (with the simulated trigger for a monostable), or null for a reference signal. */
    public TimerModel model() {
        return model;
    }

    /** A copy of the parameter vector with the deviations applied (laid out as {@link TimerModel#parameters()}). */
    public double[] parameters() {
        return parameters == null ? null : parameters.clone();
    }

    /**
     * What the model predicts for this board at the mean supply, before warm-up and noise (a new
     * holder), or null for a reference signal.
     */
    public Timing predicted() {
        return model == null ? null : model.evaluate(parameters);
    }

    /** Names of the channels this board drives, by channel number. */
    public Map<Integer, String> channelNames() {
        return channelNames;
    }

    /** What the probe believes: its nominal clock with no known offset. */
    public Timebase timebase() {
        return Timebase.of(spec.clockHz());
    }

    /** The exact conversion, offset included: measuring with it recovers true time. */
    public Timebase trueTimebase() {
        return new Timebase(spec.clockHz(), spec.clockOffsetPpm(), 0);
    }

    /** How far the board has been advanced, true seconds since the probe's tick 0. */
    public double seconds() {
        return now;
    }

    /** The probe tick of true time {@code seconds}: {@code floor(seconds * clockHz * (1 + ppm * 1e-6))}. */
    public long tickAt(double seconds) {
        return (long) Math.floor(seconds * ticksPerSecond);
    }

    /**
     * Delivers every edge up to and including true time {@code seconds} to {@code sink}, in time
     * order (channels interleaved), and returns how many. Going backwards does nothing.
     */
    public long advanceTo(double seconds, EdgeSink sink) {
        long n = 0;
        while (true) {
            double limit = Math.min(queue.peekTime(), seconds);
            while (process.nextStep() <= limit) {
                process.step(queue);
                limit = Math.min(queue.peekTime(), seconds);
            }
            if (queue.isEmpty() || queue.peekTime() > seconds) {
                break;
            }
            long tick = tickAt(queue.peekTime());
            int channel = queue.peekChannel();
            int level = queue.peekLevel();
            queue.pop();
            lastTick = tick;
            sink.onEdge(tick, channel, level);
            n++;
        }
        now = Math.max(now, seconds);
        return n;
    }

    /** Advances to {@code seconds} and ends the sink there: {@code sink.onEnd(tickAt(seconds))}. */
    public long runFor(double seconds, EdgeSink sink) {
        long n = advanceTo(seconds, sink);
        sink.onEnd(Math.max(lastTick, tickAt(seconds)));
        return n;
    }

    /**
     * Advances in step with the wall clock (true time of the board = elapsed wall time) until
     * {@code seconds} or until {@code keepGoing} turns false, delivering edges about every 10 ms,
     * then ends the sink. Blocks the calling thread.
     */
    public long play(double seconds, EdgeSink sink, BooleanSupplier keepGoing) {
        long startNanos = System.nanoTime();
        double from = now;
        long n = 0;
        while (keepGoing.getAsBoolean()) {
            double target = Math.min(seconds, from + (System.nanoTime() - startNanos) * 1e-9);
            n += advanceTo(target, sink);
            if (target >= seconds) {
                break;
            }
            LockSupport.parkNanos(10_000_000L);
        }
        sink.onEnd(Math.max(lastTick, tickAt(now)));
        return n;
    }
}
