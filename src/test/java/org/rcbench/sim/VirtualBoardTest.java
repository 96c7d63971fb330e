package org.rcbench.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.ControlPin;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.FamilyParameters;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.TimerFamily;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.Topology;
import org.rcbench.circuit.Trigger;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.edge.EdgeSink;
import org.rcbench.measure.BistableMeter;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MeterConfig;
import org.rcbench.measure.MonostableMeter;
import org.rcbench.testing.RecordingSink;
import org.rcbench.testing.RecordingSink.Edge;

/**
 * The virtual board against outside numbers: closed forms and worked values from
 * /work/shared/reference/check-values.md ("RC timing", "Jitter and time error"), with the timer
 * idealised (exact 1/3 and 2/3 thresholds) where a case is a closed form; jitter statistics against
 * chi-square bounds from Commons Math.
 */
class VirtualBoardTest {
    static final double CLOCK = 16e6;
    static final double TICK = 1 / CLOCK;

    static CircuitSpec idealAstable(double ra, double rb, double c, double vs) {
        return new CircuitSpec(Topology.ASTABLE, TimerFamily.BIPOLAR, FamilyParameters.ideal(), vs,
                List.of(Element.resistor("R1", Role.CHARGE, ra), Element.resistor("R2", Role.SHARED, rb),
                        Element.capacitor("C1", Role.TIMING, c)), ControlPin.open(), Trigger.UNSPECIFIED);
    }

    static Design piper() {
        return DesignReader.read(Path.of("captures/piper-mk2.toml"));
    }

    static RecordingSink run(VirtualBoard board, double seconds) {
        RecordingSink sink = new RecordingSink();
        board.runFor(seconds, sink);
        return sink;
    }

    /** Intervals in seconds between consecutive edges of channel 0 that go to {@code level}, from the previous edge. */
    static List<Double> phases(RecordingSink sink, int channel, int endingLevel) {
        List<Double> out = new ArrayList<>();
        Edge prev = null;
        for (Edge e : sink.edges) {
            if (e.channel() != channel) {
                continue;
            }
            if (prev != null && e.level() == endingLevel) {
                out.add((e.tick() - prev.tick()) * TICK);
            }
            prev = e;
        }
        return out;
    }

    static Measurement measure(VirtualBoard board, double seconds) {
        CycleMeter meter = new CycleMeter(MeterConfig.of(0, board.trueTimebase()));
        board.runFor(seconds, meter);
        return meter.result();
    }

    // check-values.md: astable Ra = 1k, Rb = 10k, C = 10n: high (Ra+Rb) C ln 2 = 76.24619 us, low
    // Rb C ln 2 = 69.31472 us, f = 6869.976 Hz, duty 0.5238095.
    @Test
    void noiselessAstableReadsTheClosedFormsWithinOneTick() {
        VirtualBoard board = VirtualBoard.of(idealAstable(1e3, 10e3, 10e-9, 5), "ideal", SimulationSpec.defaults());
        RecordingSink sink = run(board, 0.5);
        List<Double> highs = phases(sink, 0, EdgeSink.LOW);
        List<Double> lows = phases(sink, 0, EdgeSink.HIGH);
        assertThat(highs).hasSizeGreaterThan(3000);
        for (double h : highs.subList(1, highs.size())) {
            assertThat(h).isCloseTo(76.24619e-6, within(TICK));
        }
        for (double l : lows) {
            assertThat(l).isCloseTo(69.31472e-6, within(TICK));
        }
        Measurement m = measure(VirtualBoard.of(idealAstable(1e3, 10e3, 10e-9, 5), "ideal", SimulationSpec.defaults()),
                0.5);
        assertThat(m.high().meanSeconds()).isCloseTo(76.24619e-6, within(TICK));
        assertThat(m.low().meanSeconds()).isCloseTo(69.31472e-6, within(TICK));
        assertThat(m.frequency().frequencyHz()).isCloseTo(6869.976, within(6869.976 * 1e-6));
        assertThat(m.duty()).isCloseTo(0.5238095, within(1e-5));
        assertThat(m.irregularities().settlingCycles()).as("the long first cycle is set aside").isEqualTo(1);
    }

    // check-values.md: first high period after power-up (Ra+Rb) C ln 3 = 120.8474 us, +58.5 %.
    @Test
    void firstHighAfterPowerUpIsTheChargeFromZeroVolts() {
        VirtualBoard board = VirtualBoard.of(idealAstable(1e3, 10e3, 10e-9, 5), "ideal", SimulationSpec.defaults());
        RecordingSink sink = run(board, 0.01);
        Edge powerUp = sink.edges.get(0);
        assertThat(powerUp.level()).isEqualTo(EdgeSink.HIGH);
        assertThat(powerUp.tick()).isEqualTo((long) Math.floor(1e-3 * CLOCK));
        double first = phases(sink, 0, EdgeSink.LOW).get(0);
        double second = phases(sink, 0, EdgeSink.LOW).get(1);
        assertThat(first).isCloseTo(120.8474e-6, within(TICK));
        assertThat(first / second - 1).isCloseTo(0.585, within(0.001));
    }

    @Test
    void ticksAreTheFloorOfTrueTimeOnTheOffsetClock() {
        // A 1 MHz probe clock running 100 ppm fast; the true edge times summed exactly from the model's
        // own phase times (which CheckValuesTest checks against the closed forms).
        SimulationSpec spec = SimulationSpec.defaults().withClockHz(1e6).withClockOffsetPpm(100);
        VirtualBoard board = VirtualBoard.of(idealAstable(1e3, 10e3, 10e-9, 5), "ideal", spec);
        Timing t = board.predicted();
        RecordingSink sink = run(board, 0.05);
        BigDecimal rate = new BigDecimal("1e6").multiply(new BigDecimal("1.0001"));
        BigDecimal time = new BigDecimal("0.001");
        BigDecimal high = new BigDecimal(t.highSeconds());
        BigDecimal low = new BigDecimal(t.lowSeconds());
        int nearBoundary = 0;
        for (int i = 0; i < sink.edges.size(); i++) {
            BigDecimal exact = time.multiply(rate, MathContext.DECIMAL128);
            long expected = exact.setScale(0, RoundingMode.FLOOR).longValueExact();
            double frac = exact.subtract(new BigDecimal(expected)).doubleValue();
            if (frac > 1e-6 && frac < 1 - 1e-6) {
                assertThat(sink.edges.get(i).tick()).as("edge %d", i).isEqualTo(expected);
            } else {
                nearBoundary++;
            }
            time = time.add(i == 0 ? new BigDecimal(t.firstHighSeconds()) : i % 2 == 0 ? high : low);
        }
        assertThat(nearBoundary).isLessThan(3);
        // Floor, not round: a fraction above one half still counts down.
        assertThat(board.tickAt(0.9999e-6 / 1.0001)).isEqualTo(0);
    }

    // check-values.md, "Signatures": a pure capacitance change scales high and low by the same factor.
    @Test
    void capacitorFaultScalesHighAndLowAlike() {
        SimulationSpec spec = SimulationSpec.defaults().withDeviation(Deviation.parse("C1=-35%"));
        Measurement m = measure(VirtualBoard.of(idealAstable(1e3, 10e3, 10e-9, 5), "ideal", spec), 0.5);
        assertThat(m.high().meanSeconds()).isCloseTo(0.65 * 76.24619e-6, within(TICK));
        assertThat(m.low().meanSeconds()).isCloseTo(0.65 * 69.31472e-6, within(TICK));
        SimulationSpec absolute = SimulationSpec.defaults().withDeviation(Deviation.parse("C1=6n8"));
        Measurement a = measure(VirtualBoard.of(idealAstable(1e3, 10e3, 10e-9, 5), "ideal", absolute), 0.5);
        assertThat(a.high().meanSeconds()).isCloseTo(0.68 * 76.24619e-6, within(TICK));
    }

    // check-values.md: leakage R_L across C, astable Ra = 1k, Rb = 10k, C = 10u, 5 V: R_L = 1M:
    // 77.23693 / 68.62843 ms; 100k: 87.70649 / 63.01338 ms.
    @Test
    void leakageLengthensHighAndShortensLowAsTheCheckValues() {
        for (String[] c : new String[][] {{"leak=1M", "77.23693e-3", "68.62843e-3"},
            {"leak=100k", "87.70649e-3", "63.01338e-3"}}) {
            SimulationSpec spec = SimulationSpec.defaults().withDeviation(Deviation.parse(c[0]));
            Measurement m = measure(VirtualBoard.of(idealAstable(1e3, 10e3, 10e-6, 5), "ideal", spec), 6);
            assertThat(m.cycles()).isGreaterThan(20);
            assertThat(m.high().meanSeconds()).as(c[0]).isCloseTo(Double.parseDouble(c[1]), within(1e-8));
            assertThat(m.low().meanSeconds()).as(c[0]).isCloseTo(Double.parseDouble(c[2]), within(1e-8));
        }
    }

    // check-values.md: control pin loaded by Rx = 4.7k to ground at Vcc = 5 (bipolar divider of three
    // 5k): Vc = 1.95021 V; then high (Ra+Rb) C ln((Vcc - Vc/2)/(Vcc - Vc)), low stays Rb C ln 2.
    @Test
    void controlPinLoadMovesOnlyTheHighTime() {
        SimulationSpec spec = SimulationSpec.defaults().withDeviation(Deviation.parse("control=4k7"));
        Measurement m = measure(VirtualBoard.of(idealAstable(1e3, 10e3, 10e-9, 5), "ideal", spec), 0.5);
        double vc = 1.95021;
        double high = 11e3 * 10e-9 * Math.log((5 - vc / 2) / (5 - vc));
        assertThat(m.high().meanSeconds()).isCloseTo(high, within(TICK));
        assertThat(m.low().meanSeconds()).isCloseTo(69.31472e-6, within(TICK));
    }

    // Period jitter (JEDEC JESD65B: deviation of each period from the mean): for white period noise of
    // sigma, the sample variance over n periods follows sigma^2 chi2(n-1)/(n-1); bounds from Commons
    // Math at 0.05 % and 99.95 %. Cycle-to-cycle differences of white period noise have RMS sqrt(2)
    // sigma (derived: Var(T2 - T1) = 2 sigma^2).
    @Test
    void measuredPeriodJitterMatchesTheConfiguredRms() {
        double sigma = 2e-6;
        SimulationSpec spec = SimulationSpec.defaults().withJitterSeconds(sigma).withSeed(42);
        Measurement m = measure(VirtualBoard.of(piper(), spec), 30);
        long n = m.cycles();
        assertThat(n).isGreaterThan(15_000);
        ChiSquaredDistribution chi = new ChiSquaredDistribution(n - 1);
        double lo = sigma * Math.sqrt(chi.inverseCumulativeProbability(0.0005) / (n - 1));
        double hi = sigma * Math.sqrt(chi.inverseCumulativeProbability(0.9995) / (n - 1));
        assertThat(m.jitter().periodRmsCorrectedSeconds()).isBetween(lo, hi);
        assertThat(m.jitter().cycleToCycleRmsCorrectedSeconds() / (Math.sqrt(2) * sigma)).isCloseTo(1, within(0.05));
    }

    @Test
    void sameSeedGivesTheSameEdgesAndAnotherSeedOthers() {
        SimulationSpec spec = SimulationSpec.defaults().withJitterSeconds(1e-6).withRipple(0.5, 100).withSeed(7);
        List<Edge> a = run(VirtualBoard.of(piper(), spec), 2).edges;
        List<Edge> b = run(VirtualBoard.of(piper(), spec), 2).edges;
        List<Edge> c = run(VirtualBoard.of(piper(), spec.withSeed(8)), 2).edges;
        assertThat(a).hasSizeGreaterThan(2000).isEqualTo(b);
        assertThat(c).isNotEqualTo(a);
    }

    @Test
    void advancingInStepsGivesTheSameEdgesAsOneRun() {
        SimulationSpec spec = SimulationSpec.defaults().withJitterSeconds(1e-6).withSeed(3);
        List<Edge> whole = run(VirtualBoard.of(piper(), spec), 1).edges;
        VirtualBoard stepped = VirtualBoard.of(piper(), spec);
        RecordingSink sink = new RecordingSink();
        for (double t = 0; t < 1; t += 0.0137) {
            stepped.advanceTo(t, sink);
        }
        stepped.runFor(1, sink);
        assertThat(sink.edges).isEqualTo(whole);
    }

    @Test
    void rippleModulatesEachPhaseThroughTheSupply() {
        // The bipolar Piper's low time depends on the supply through the discharge saturation voltage.
        Design d = piper();
        SimulationSpec spec = SimulationSpec.defaults().withRipple(1.0, 5);
        VirtualBoard board = VirtualBoard.of(d, spec);
        RecordingSink sink = run(board, 1);
        org.rcbench.circuit.TimerModel model = board.model();
        double[] p = board.parameters();
        int iSupply = model.parameters().index(ParameterTable.SUPPLY);
        double shortest = Double.POSITIVE_INFINITY;
        double longest = 0;
        Edge prev = null;
        for (Edge e : sink.edges) {
            if (prev != null && e.level() == EdgeSink.HIGH) {
                double fall = prev.tick() * TICK;
                p[iSupply] = 9 + Math.sin(2 * Math.PI * 5 * fall);
                double expected = model.evaluate(p).lowSeconds();
                double low = (e.tick() - prev.tick()) * TICK;
                assertThat(low).isCloseTo(expected, within(1.01 * TICK));
                shortest = Math.min(shortest, low);
                longest = Math.max(longest, low);
            }
            prev = e;
        }
        assertThat((longest - shortest) / TICK).as("ripple moves the low time by many ticks").isGreaterThan(10);
    }

    @Test
    void warmUpStretchesTheStartAndSettlesExponentially() {
        SimulationSpec spec = SimulationSpec.defaults().withWarmUp(0.05, 2);
        VirtualBoard board = VirtualBoard.of(piper(), spec);
        Timing t = board.predicted();
        RecordingSink sink = run(board, 8);
        Edge prev = null;
        int checked = 0;
        for (Edge e : sink.edges) {
            if (prev != null && e.level() == EdgeSink.HIGH) {
                double fall = prev.tick() * TICK;
                double expected = t.lowSeconds() * (1 + 0.05 * Math.exp(-(fall - 1e-3) / 2));
                assertThat((e.tick() - prev.tick()) * TICK).isCloseTo(expected, within(1.01 * TICK));
                checked++;
            }
            prev = e;
        }
        assertThat(checked).isGreaterThan(5000);
    }

    // check-values.md: monostable t = R C ln 3; R = 100k, C = 1u: 109.8612 ms.
    @Test
    void monostablePulsesAreRcLn3OnePerTrigger() {
        CircuitSpec mono = new CircuitSpec(Topology.MONOSTABLE, TimerFamily.BIPOLAR, FamilyParameters.ideal(), 5,
                List.of(Element.resistor("R1", Role.CHARGE, 100e3), Element.capacitor("C1", Role.TIMING, 1e-6)),
                ControlPin.open(), Trigger.UNSPECIFIED);
        SimulationSpec spec = SimulationSpec.defaults()
                .withStimulus(Stimulus.defaults().withTriggerIntervalSeconds(0.5).withTriggerWidthSeconds(1e-3));
        VirtualBoard board = VirtualBoard.of(mono, "mono", spec);
        assertThat(board.channelNames()).containsEntry(VirtualBoard.TRIGGER, "trigger");
        MonostableMeter meter = new MonostableMeter(VirtualBoard.TRIGGER, VirtualBoard.OUTPUT, EdgeSink.LOW,
                board.trueTimebase());
        board.runFor(10, meter);
        MonostableMeter.MonostableResult r = meter.result();
        assertThat(r.triggers()).isEqualTo(20);
        assertThat(r.pulses()).isEqualTo(20);
        assertThat(r.ignoredTriggers()).isZero();
        assertThat(r.pulseWidth().meanSeconds()).isCloseTo(109.8612e-3, within(TICK));
        assertThat(r.pulseWidth().maxSeconds() - r.pulseWidth().minSeconds()).isLessThanOrEqualTo(TICK * 1.01);
    }

    // check-values.md: the monostable is not retriggerable; with triggers every 60 ms and a 109.9 ms
    // pulse, every second trigger is ignored and the output repeats every 120 ms (ceil(width/interval)).
    @Test
    void triggersDuringAPulseAreIgnored() {
        CircuitSpec mono = new CircuitSpec(Topology.MONOSTABLE, TimerFamily.BIPOLAR, FamilyParameters.ideal(), 5,
                List.of(Element.resistor("R1", Role.CHARGE, 100e3), Element.capacitor("C1", Role.TIMING, 1e-6)),
                ControlPin.open(), Trigger.UNSPECIFIED);
        SimulationSpec spec = SimulationSpec.defaults()
                .withStimulus(Stimulus.defaults().withTriggerIntervalSeconds(0.06).withTriggerWidthSeconds(1e-3));
        RecordingSink sink = run(VirtualBoard.of(mono, "mono", spec), 3);
        List<Long> rises = new ArrayList<>();
        for (Edge e : sink.edges) {
            if (e.channel() == VirtualBoard.OUTPUT && e.level() == EdgeSink.HIGH) {
                rises.add(e.tick());
            }
        }
        for (int i = 1; i < rises.size(); i++) {
            assertThat((rises.get(i) - rises.get(i - 1)) * TICK).isCloseTo(0.120, within(TICK));
        }
        assertThat(rises).hasSizeGreaterThan(20);
    }

    @Test
    void latchFollowsTheFirstContactOfEachPressAndIgnoresBounce() {
        Design latch = DesignReader.read(Path.of("captures/latchkey.toml"));
        VirtualBoard board = VirtualBoard.of(latch, SimulationSpec.defaults().withSeed(5));
        RecordingSink sink = run(board, 10);
        int buttonEdges = 0;
        for (Edge e : sink.edges) {
            if (e.channel() != VirtualBoard.OUTPUT) {
                buttonEdges++;
            }
        }
        BistableMeter meter = new BistableMeter(VirtualBoard.SET, VirtualBoard.RESET, VirtualBoard.OUTPUT,
                EdgeSink.LOW, (long) (20e-3 * CLOCK), board.trueTimebase());
        sink.edges.forEach(e -> meter.onEdge(e.tick(), e.channel(), e.level()));
        BistableMeter.BistableResult r = meter.result();
        assertThat(r.setPresses()).isEqualTo(10);
        assertThat(r.resetPresses()).isEqualTo(10);
        // Two initial levels, then a press and a release per press; every other button edge is bounce.
        assertThat(r.setBounces() + r.resetBounces()).isEqualTo(buttonEdges - 2 - 2 * 20).isPositive();
        assertThat(r.spontaneous()).isZero();
        assertThat(r.noChange()).isZero();
        // Response: the bipolar family's propagation delay, 100 ns (from memory, see TimerFamily).
        assertThat(r.setResponse().meanSeconds()).isCloseTo(100e-9, within(TICK));
        assertThat(r.resetResponse().meanSeconds()).isCloseTo(100e-9, within(TICK));
    }

    @Test
    void referenceKeepsTrueTimeAndTheOffsetClockCountsFast() {
        SimulationSpec spec = SimulationSpec.defaults().withClockOffsetPpm(37).withJitterSeconds(50e-9);
        VirtualBoard ref = VirtualBoard.reference(1, spec);
        CycleMeter meter = new CycleMeter(MeterConfig.of(0, ref.timebase()));
        ref.runFor(120, meter);
        Measurement m = meter.result();
        // A clock 37 ppm fast counts 37 ppm more ticks: the nominal timebase reads 1/(1 + 37e-6) Hz.
        assertThat(m.frequency().frequencyHz()).isCloseTo(1 / (1 + 37e-6), within(2e-7));
    }

    @Test
    void aCircuitThatCannotRunHoldsItsOutputHigh() {
        // check-values.md: leakage stops the astable when R_L <= 2 (Ra + Rb): 22k here.
        SimulationSpec spec = SimulationSpec.defaults().withDeviation(Deviation.parse("leak=20k"));
        VirtualBoard board = VirtualBoard.of(idealAstable(1e3, 10e3, 10e-9, 5), "ideal", spec);
        assertThat(board.predicted().oscillates()).isFalse();
        RecordingSink sink = run(board, 0.1);
        assertThat(sink.edges).containsExactly(new Edge((long) Math.floor(1e-3 * CLOCK), 0, EdgeSink.HIGH));
    }

    @Test
    void playingInStepWithTheClockGivesTheSameEdges() {
        SimulationSpec spec = SimulationSpec.defaults().withJitterSeconds(1e-6).withSeed(9);
        RecordingSink played = new RecordingSink();
        VirtualBoard.of(piper(), spec).play(0.2, played, () -> true);
        assertThat(played.edges).hasSizeGreaterThan(200).isEqualTo(run(VirtualBoard.of(piper(), spec), 0.2).edges);
        assertThat(played.endCalls).isEqualTo(1);
    }
}
