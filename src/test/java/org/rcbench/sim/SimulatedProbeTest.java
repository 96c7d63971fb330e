package org.rcbench.sim;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.BooleanSupplier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.edge.EdgeSink;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MeterConfig;
import org.rcbench.probe.ProbeSession;
import org.rcbench.probe.SessionConfig;
import org.rcbench.probe.SessionState;
import org.rcbench.protocol.DecoderCounters;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.testing.RecordingSink.Edge;

/**
 * The simulated probe through a real {@link ProbeSession}: the bytes go through the same decoder as
 * a serial port's. The board's own edges (straight into a sink) are the truth every test compares with.
 */
class SimulatedProbeTest {
    static final Design PIPER = DesignReader.read(Path.of("captures/piper-mk2.toml"));
    static final SimulationSpec SPEC = SimulationSpec.defaults().withJitterSeconds(300e-9).withSeed(11);

    final List<AutoCloseable> open = new ArrayList<>();

    @AfterEach
    void closeAll() throws Exception {
        for (int i = open.size() - 1; i >= 0; i--) {
            open.get(i).close();
        }
    }

    /** Thread-safe edge collector (the session delivers on its reader thread). */
    static final class Collector implements EdgeSink {
        final List<Edge> edges = new CopyOnWriteArrayList<>();
        volatile boolean ended;

        @Override
        public void onEdge(long tick, int channel, int level) {
            edges.add(new Edge(tick, channel, level));
        }

        @Override
        public void onEnd(long lastTick) {
            ended = true;
        }

        long known() {
            return edges.stream().filter(e -> e.level() != UNKNOWN).count();
        }

        long gaps() {
            return edges.stream().filter(e -> e.level() == UNKNOWN).count();
        }
    }

    static List<Edge> truth(Design design, SimulationSpec spec, double seconds) {
        org.rcbench.testing.RecordingSink sink = new org.rcbench.testing.RecordingSink();
        VirtualBoard.of(design, spec).runFor(seconds, sink);
        return sink.edges;
    }

    ProbeSession session(SimulatedProbe probe, SessionConfig config, EdgeSink sink, ProbeEvents events) {
        ProbeSession s = probe.session(config.withReconnectPollMillis(20), sink, events);
        open.add(s);
        s.start();
        return s;
    }

    SimulatedProbe probe(Design design, SimulationSpec spec, ProbeOptions options) {
        SimulatedProbe p = new SimulatedProbe(VirtualBoard.of(design, spec), options);
        open.add(p);
        p.start();
        return p;
    }

    static void await(BooleanSupplier condition, String what) throws InterruptedException {
        long deadline = System.nanoTime() + 60_000_000_000L;
        while (!condition.getAsBoolean()) {
            assertThat(System.nanoTime()).as("waiting for " + what).isLessThan(deadline);
            Thread.sleep(5);
        }
    }

    /** The shift from session ticks to board ticks that makes {@code edges[from..from+5]} land on true edges. */
    static long shift(List<Edge> edges, int from, Map<Long, Edge> truthByTick, List<Edge> truth) {
        return shift(edges, from, truthByTick, truth, Long.MIN_VALUE);
    }

    static long shift(List<Edge> edges, int from, Map<Long, Edge> truthByTick, List<Edge> truth, long hint) {
        Edge first = edges.get(from);
        List<Long> candidates = new ArrayList<>();
        if (hint != Long.MIN_VALUE) {
            candidates.add(hint);
        }
        truth.forEach(t -> candidates.add(t.tick() - first.tick()));
        for (long s : candidates) {
            Edge t = truthByTick.get(first.tick() + s);
            if (t == null) {
                continue;
            }
            boolean all = true;
            for (int i = from; i < Math.min(edges.size(), from + 6) && all; i++) {
                Edge e = edges.get(i);
                Edge match = truthByTick.get(e.tick() + s);
                all = e.level() == EdgeSink.UNKNOWN || (match != null && match.level() == e.level());
            }
            if (all && t.level() == first.level()) {
                return s;
            }
        }
        throw new AssertionError("no true edge lines up with session edge " + from);
    }

    static Map<Long, Integer> indexByTick(List<Edge> truth) {
        Map<Long, Integer> m = new HashMap<>();
        for (int i = 0; i < truth.size(); i++) {
            m.put(truth.get(i).tick(), i);
        }
        return m;
    }

    /**
     * Every known session edge is a true edge (after its segment's shift), and two known edges with no
     * gap between them are consecutive true edges: nothing was silently skipped. Returns the segments.
     */
    static int assertNoEdgeInventedOrSkipped(List<Edge> session, List<Edge> truth) {
        Map<Long, Integer> index = indexByTick(truth);
        Map<Long, Edge> byTick = new HashMap<>();
        truth.forEach(e -> byTick.put(e.tick(), e));
        int segments = 0;
        long shift = Long.MIN_VALUE;
        int prev = -1;
        boolean fresh = true;
        for (int i = 0; i < session.size(); i++) {
            Edge e = session.get(i);
            if (e.level() == EdgeSink.UNKNOWN) {
                fresh = true;
                continue;
            }
            if (fresh) {
                shift = shift(session, i, byTick, truth, segments == 0 ? Long.MIN_VALUE : shift);
                segments++;
                prev = -1;
                fresh = false;
            }
            Integer at = index.get(e.tick() + shift);
            assertThat(at).as("session edge %d (%s) is a true edge", i, e).isNotNull();
            assertThat(truth.get(at).level()).isEqualTo(e.level());
            if (prev >= 0) {
                assertThat(at).as("edge %d follows the previous one with nothing skipped", i).isEqualTo(prev + 1);
            }
            prev = at;
        }
        return segments;
    }

    @Test
    void aSessionOnTheSimulatedProbeYieldsTheBoardsOwnEdges() throws Exception {
        List<Edge> truth = truth(PIPER, SPEC, 12);
        SimulatedProbe probe = probe(PIPER, SPEC, ProbeOptions.defaults().withPace(Pace.FAST));
        Collector sink = new Collector();
        ProbeSession s = session(probe, SessionConfig.defaults(), sink, new ProbeEvents() { });
        assertThat(s.awaitStreaming(Duration.ofSeconds(10)).probeId()).isEqualTo(ProbeOptions.DEFAULT_PROBE_ID);
        await(() -> sink.edges.size() >= 10_000, "10 000 edges");
        s.close();
        List<Edge> got = sink.edges.subList(0, 10_000);
        long first = truth.get(0).tick();
        assertThat(got.get(0).tick()).as("the timeline starts at the board's power-up edge").isZero();
        for (int i = 0; i < got.size(); i++) {
            Edge t = truth.get(i);
            assertThat(got.get(i)).isEqualTo(new Edge(t.tick() - first, t.channel(), t.level()));
        }
        assertThat(s.counters().clean()).isTrue();
        assertThat(probe.stats().boots()).isEqualTo(1);
    }

    @Test
    void corruptionAndLostBytesBecomeGapsNeverMergedCycles() throws Exception {
        LinkFaults faults = LinkFaults.none().withByteFlipRate(3e-4).withByteDropRate(1e-4).withSeed(5);
        List<Edge> truth = truth(PIPER, SPEC, 80);
        SimulatedProbe probe = probe(PIPER, SPEC, ProbeOptions.defaults().withPace(Pace.FAST).withFaults(faults));
        Collector sink = new Collector();
        ProbeSession s = session(probe, SessionConfig.defaults(), sink, new ProbeEvents() { });
        s.awaitStreaming(Duration.ofSeconds(20));
        await(() -> sink.edges.size() >= 60_000, "60 000 edges");
        s.close();
        List<Edge> got = new ArrayList<>(sink.edges.subList(0, 60_000));
        DecoderCounters c = s.counters();
        assertThat(c.crcErrors() + c.resyncs()).as("the damage was seen").isPositive();
        assertThat(sink.gaps()).as("and marked as gaps").isPositive();
        assertThat(probe.stats().bytesFlipped()).isPositive();
        assertNoEdgeInventedOrSkipped(got, truth);

        CycleMeter meter = new CycleMeter(MeterConfig.of(0, probe.board().trueTimebase()));
        got.forEach(e -> meter.onEdge(e.tick(), e.channel(), e.level()));
        meter.onEnd(got.get(got.size() - 1).tick());
        Measurement m = meter.result();
        double period = VirtualBoard.of(PIPER, SPEC).predicted().periodSeconds();
        assertThat(m.irregularities().gaps()).isPositive();
        assertThat(m.period().maxSeconds()).as("no cycle spans a gap").isLessThan(1.05 * period);
        assertThat(m.period().minSeconds()).isGreaterThan(0.95 * period);
    }

    @Test
    void overrunsRaiseTheDroppedTotalAndBecomeGaps() throws Exception {
        LinkFaults faults = LinkFaults.none().withOverrunRate(2e-3).withSeed(9);
        List<Edge> truth = truth(PIPER, SPEC, 40);
        SimulatedProbe probe = probe(PIPER, SPEC, ProbeOptions.defaults().withPace(Pace.FAST).withFaults(faults));
        Collector sink = new Collector();
        ProbeSession s = session(probe, SessionConfig.defaults(), sink, new ProbeEvents() { });
        s.awaitStreaming(Duration.ofSeconds(10));
        await(() -> sink.known() >= 30_000, "30 000 edges");
        s.close();
        List<Edge> got = new ArrayList<>(sink.edges);
        long lastKnown = got.stream().filter(e -> e.level() != EdgeSink.UNKNOWN).mapToLong(Edge::tick).max().getAsLong();
        assertThat(s.counters().overruns()).isPositive();
        assertThat(sink.gaps()).isPositive();
        int segments = assertNoEdgeInventedOrSkipped(got, truth);
        assertThat(segments).isGreaterThan(1);
        assertThat(lastKnown).isPositive();
    }

    @Test
    void unplugThenReplugReconnectsWithAGap() throws Exception {
        LinkFaults faults = LinkFaults.none().withUnplug(3.0, 0.5);
        List<Edge> truth = truth(PIPER, SPEC, 20);
        SimulatedProbe probe = probe(PIPER, SPEC, ProbeOptions.defaults().withPace(Pace.FAST).withFaults(faults));
        Collector sink = new Collector();
        List<SessionState> states = new CopyOnWriteArrayList<>();
        ProbeSession s = probe.session(SessionConfig.defaults().withReconnectPollMillis(20), sink,
                new ProbeEvents() { });
        open.add(s);
        s.addStatusListener(st -> states.add(st.state()));
        s.start();
        s.awaitStreaming(Duration.ofSeconds(10));
        await(() -> s.status().reconnects() == 1 && sink.known() > 12_000, "the probe back and 12 000 edges");
        s.close();
        List<Edge> got = new ArrayList<>(sink.edges);
        assertThat(states).contains(SessionState.RECONNECTING);
        assertThat(probe.stats().boots()).isEqualTo(2);
        assertThat(sink.gaps()).isPositive();
        int segments = assertNoEdgeInventedOrSkipped(got, truth);
        assertThat(segments).isEqualTo(2);
        // Nothing of the 0.5 s the cable was out: about 690 cycles, 1380 edges, are missing.
        int gapAt = 0;
        while (got.get(gapAt).level() != EdgeSink.UNKNOWN) {
            gapAt++;
        }
        long before = gapAt;
        long after = got.stream().skip(gapAt).filter(e -> e.level() != EdgeSink.UNKNOWN).count();
        Map<Long, Integer> index = indexByTick(truth);
        Map<Long, Edge> byTick = new HashMap<>();
        truth.forEach(e -> byTick.put(e.tick(), e));
        int lastBefore = index.get(got.get(gapAt - 1).tick() + shift(got, 0, byTick, truth));
        int firstAfter = gapAt + 1;
        while (got.get(firstAfter).level() == EdgeSink.UNKNOWN) {
            firstAfter++;
        }
        int resumed = index.get(got.get(firstAfter).tick() + shift(got, firstAfter, byTick, truth));
        double outSeconds = (truth.get(resumed).tick() - truth.get(lastBefore).tick()) / 16e6;
        assertThat(outSeconds).isGreaterThanOrEqualTo(0.5);
        assertThat(before + after).isGreaterThan(12_000);
    }

    @Test
    void theHostsChannelAndPolaritySelectionIsObeyed() throws Exception {
        SimulatedProbe probe = probe(PIPER, SPEC, ProbeOptions.defaults().withPace(Pace.FAST));
        Collector sink = new Collector();
        ProbeSession s = session(probe, SessionConfig.defaults().withEdges(1, 1, 0).withAdc(1, 1000), sink,
                new ProbeEvents() { });
        s.awaitStreaming(Duration.ofSeconds(10));
        await(() -> sink.edges.size() >= 500, "500 edges");
        await(() -> s.status().line().contains("not supported by this probe"), "the ADC refusal in the status");
        s.close();
        assertThat(sink.edges).allMatch(e -> e.level() == EdgeSink.HIGH);
    }

    @Test
    void aQuietInputStillGetsHeartbeatsEveryQuarterSecond() throws Exception {
        // The Wren monostable: a 5 s pulse every 13 s or so leaves long stretches without edges.
        Design wren = DesignReader.read(Path.of("captures/wren.toml"));
        SimulatedProbe probe = probe(wren, SimulationSpec.defaults(), ProbeOptions.defaults().withPace(Pace.FAST));
        List<Long> times = new CopyOnWriteArrayList<>();
        Collector sink = new Collector();
        ProbeSession s = session(probe, SessionConfig.defaults(), sink, new ProbeEvents() {
            @Override
            public void onProbeTime(long tick) {
                times.add(tick);
            }
        });
        s.awaitStreaming(Duration.ofSeconds(10));
        await(() -> !times.isEmpty() && times.get(times.size() - 1) > 60 * 16e6, "a minute of probe time");
        s.close();
        List<Long> t = new ArrayList<>(times);
        for (int i = 1; i < t.size(); i++) {
            assertThat((t.get(i) - t.get(i - 1)) / 16e6).isLessThanOrEqualTo(
                    SimulatedProbe.HEARTBEAT_SECONDS + SimulatedProbe.FRAME_SECONDS + 1e-6); // the last edge of a frame may precede its sending by one frame interval
        }
        assertThat(sink.known()).as("pulses and triggers still arrive").isGreaterThan(8);
    }

    @Test
    void realTimePaceStreamsToo() throws Exception {
        SimulatedProbe probe = probe(PIPER, SPEC, ProbeOptions.defaults());
        Collector sink = new Collector();
        ProbeSession s = session(probe, SessionConfig.defaults(), sink, new ProbeEvents() { });
        s.awaitStreaming(Duration.ofSeconds(10));
        await(() -> sink.known() >= 200, "200 edges");
        s.close();
        List<Edge> truth = truth(PIPER, SPEC, 2);
        long first = truth.get(0).tick();
        for (int i = 0; i < 200; i++) {
            Edge t = truth.get(i);
            assertThat(sink.edges.get(i)).isEqualTo(new Edge(t.tick() - first, t.channel(), t.level()));
        }
    }
}
