package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MeterConfig;
import org.rcbench.probe.ByteTransport;
import org.rcbench.probe.MemoryPort;
import org.rcbench.probe.ProbeClock;
import org.rcbench.probe.ProbeProfile;
import org.rcbench.probe.ProbeSession;
import org.rcbench.probe.SessionConfig;
import org.rcbench.protocol.ClockSource;
import org.rcbench.protocol.Hello;
import org.rcbench.testing.ProbeEmulator;
import org.rcbench.testing.TransportStreams;

/** A probe session as the window's source: hello gives the clock, status becomes the source strip. */
class SessionSourceTest {
    private static final SessionConfig FAST = SessionConfig.defaults().withProfile(ProbeProfile.STREAM)
            .withReadTimeoutMillis(20).withReconnectPollMillis(20).withAckTimeoutMillis(300);

    private BenchModel model;

    @AfterEach
    void close() {
        if (model != null) {
            model.close();
        }
    }

    @Test
    void aProbeOnAPortStreamsIntoTheReadingsAndAnUnplugIsShown() throws Exception {
        MemoryPort port = new MemoryPort("bench port");
        ByteTransport end = port.plugIn();
        ProbeEmulator probe = new ProbeEmulator(TransportStreams.output(end), 0xC0FFEE01L);
        TransportStreams.pump(end, probe);
        probe.boot();
        SourceFactory factory = choice -> new SessionSource(choice.target(),
                (sink, events) -> new ProbeSession(port, FAST, sink, events), () -> { });
        model = new BenchModel(BenchServices.standard().withSources(factory).withWorker(Runnable::run),
                BenchSettings.inMemory(true), 5_000_000L);
        model.choose(SourceChoice.port("bench port"));
        model.start();
        assertThat(ModelDriver.pollUntil(model, () -> model.statusProperty().get().state() == ConnectionState.STREAMING,
                Duration.ofSeconds(10))).isTrue();
        assertThat(probe.awaitStart(10_000)).isTrue();

        // 400 cycles of 23 189 ticks, high 12 000, as the probe would timestamp them.
        long[] ticks = new long[801];
        for (int i = 0; i < ticks.length; i++) {
            ticks[i] = 1000 + (i / 2) * 23_189L + (i % 2) * 12_000L;
        }
        probe.edges(ticks, EdgeSink.HIGH);
        assertThat(ModelDriver.pollUntil(model, () -> model.frameProperty().get() != null
                && model.frameProperty().get().measurement().edges() == ticks.length, Duration.ofSeconds(10))).isTrue();
        ModelDriver.settleReadouts(model);

        SourceStatus s = model.statusProperty().get();
        assertThat(s.probe()).isEqualTo("probe 00000000c0ffee01 \"emulator\" fw 1.0.0");
        assertThat(s.probeId()).isEqualTo("00000000c0ffee01");
        // An uncalibrated crystal: ±50 ppm rectangular, standard uncertainty 50/sqrt(3) = 28.9 ppm (JCGM 100 4.3.7).
        assertThat(s.clock()).isEqualTo("16 MHz crystal, not calibrated (± 29 ppm standard uncertainty)");

        Timebase tb = ProbeClock.timebase(Hello.basic(0xC0FFEE01L, 16_000_000L, ClockSource.CRYSTAL, "emulator"));
        CycleMeter core = new CycleMeter(MeterConfig.of(0, tb));
        int level = EdgeSink.HIGH;
        for (long t : ticks) {
            core.onEdge(t, 0, level);
            level ^= 1;
        }
        Measurement m = core.snapshot(256);
        assertThat(model.readings().reading(TimingQuantity.FREQUENCY).measured()).isEqualTo(m.rolling().frequencyHz());

        port.unplug();
        assertThat(ModelDriver.pollUntil(model, () -> model.statusProperty().get().state() == ConnectionState.RECONNECTING,
                Duration.ofSeconds(10))).isTrue();
        assertThat(model.statusProperty().get().line()).startsWith("bench port disconnected");
        assertThat(model.statusProperty().get().gaps()).isEqualTo(1);
        assertThat(model.runningProperty().get()).isTrue();
    }
}
