package org.rcbench.probe;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.LinkedBlockingQueue;
import org.junit.jupiter.api.Test;
import org.rcbench.common.BadInputException;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.testing.ProbeEmulator;
import org.rcbench.testing.TransportStreams;

class ProbeSessionTest {
    static final SessionConfig FAST = SessionConfig.defaults().withProfile(ProbeProfile.STREAM)
            .withReadTimeoutMillis(50).withReconnectPollMillis(20);

    /** Opens the next link of a queue each time; the test plugs probes in by adding links. */
    static final class Plugs implements TransportOpener {
        final LinkedBlockingQueue<MemoryLink> links = new LinkedBlockingQueue<>();

        @Override
        public ByteTransport open() {
            MemoryLink link = links.poll();
            if (link == null) {
                throw new BadInputException("bench-link", "no such port");
            }
            return link.hostEnd();
        }

        @Override
        public String name() {
            return "bench-link";
        }
    }

    static ProbeEmulator plugIn(Plugs plugs, long probeId, boolean boot) {
        MemoryLink link = new MemoryLink("bench-link");
        ProbeEmulator emulator = new ProbeEmulator(TransportStreams.output(link.probeEnd()), probeId);
        TransportStreams.pump(link.probeEnd(), emulator);
        if (boot) {
            emulator.raw(new byte[] {(byte) 0xF0, 0x7F, 0x13, '\r', '\n'}); // bootloader noise
            emulator.boot();
        }
        plugs.links.add(link);
        lastLink = link;
        return emulator;
    }

    static MemoryLink lastLink;

    @Test
    void bootHelloThroughNoiseThenEdgesArriveIntact() throws Exception {
        Plugs plugs = new Plugs();
        ProbeEmulator probe = plugIn(plugs, 0xA1, true);
        CollectingSink sink = new CollectingSink();
        List<SessionStatus> statuses = new CopyOnWriteArrayList<>();
        try (ProbeSession session = new ProbeSession(plugs, FAST, sink, new ProbeEvents() { })) {
            session.addStatusListener(statuses::add);
            session.start();
            Hello hello = session.awaitStreaming(Duration.ofSeconds(10));
            assertThat(hello.probeId()).isEqualTo(0xA1);
            assertThat(session.timebase().clockHz()).isEqualTo(16e6);
            assertThat(probe.awaitStart(10_000)).isTrue();
            probe.edges(new long[] {1000, 9000, 17_000, 25_000}, 1);
            assertThat(CollectingSink.await(() -> sink.size() == 4)).isTrue();
            assertThat(sink.calls()).containsExactly("0 0 1", "8000 0 0", "16000 0 1", "24000 0 0");
            assertThat(CollectingSink.await(() -> session.counters().edges() == 4)).isTrue();
            assertThat(session.counters().bytesDiscarded()).isEqualTo(5);
            assertThat(session.counters().crcErrors()).isZero();
        }
        assertThat(sink.ended()).isTrue();
        assertThat(statuses).extracting(SessionStatus::state).contains(SessionState.CONNECTING,
                SessionState.STREAMING, SessionState.CLOSED);
    }

    @Test
    void probeThatSaysNothingUntilAskedIsAskedForItsHello() throws Exception {
        Plugs plugs = new Plugs();
        ProbeEmulator probe = plugIn(plugs, 0xB2, false);
        CollectingSink sink = new CollectingSink();
        try (ProbeSession session = new ProbeSession(plugs, FAST.withProfile(ProbeProfile.NATIVE_USB), sink,
                new ProbeEvents() { })) {
            session.start();
            assertThat(session.awaitStreaming(Duration.ofSeconds(10)).probeId()).isEqualTo(0xB2);
            assertThat(probe.awaitStart(10_000)).isTrue();
        }
    }

    @Test
    void noHelloFailsWithOneLineNamingThePort() throws Exception {
        Plugs plugs = new Plugs();
        ProbeEmulator probe = plugIn(plugs, 0xC3, false);
        probe.answerHelloRequests(false);
        probe.raw("garbage without a frame".getBytes(java.nio.charset.StandardCharsets.US_ASCII));
        ProbeProfile impatient = ProbeProfile.STREAM.withHelloTimeout(Duration.ofMillis(400));
        try (ProbeSession session = new ProbeSession(plugs, FAST.withProfile(impatient), new CollectingSink(),
                new ProbeEvents() { })) {
            session.start();
            assertThatThrownBy(() -> session.awaitStreaming(Duration.ofSeconds(10)))
                    .isInstanceOf(BadInputException.class)
                    .hasMessageStartingWith("bench-link: no hello from the probe after 0.4 s (23 bytes received");
            assertThat(session.state()).isEqualTo(SessionState.FAILED);
        }
    }

    @Test
    void missingPortFailsWithTheOpenersMessage() throws Exception {
        try (ProbeSession session = new ProbeSession(new Plugs(), FAST, new CollectingSink(), new ProbeEvents() { })) {
            session.start();
            assertThatThrownBy(() -> session.awaitStreaming(Duration.ofSeconds(10)))
                    .isInstanceOf(BadInputException.class).hasMessage("bench-link: no such port");
        }
    }

    @Test
    void unplugMarksAGapAndTheSameProbeIsPickedUpAgain() throws Exception {
        Plugs plugs = new Plugs();
        ProbeEmulator first = plugIn(plugs, 0xD4, true);
        MemoryLink firstLink = lastLink;
        CollectingSink sink = new CollectingSink();
        try (ProbeSession session = new ProbeSession(plugs, FAST, sink, new ProbeEvents() { })) {
            session.start();
            session.awaitStreaming(Duration.ofSeconds(10));
            assertThat(first.awaitStart(10_000)).isTrue();
            first.edges(new long[] {100, 200, 300}, 1);
            assertThat(CollectingSink.await(() -> sink.size() == 3)).isTrue();
            firstLink.unplug();
            assertThat(CollectingSink.await(() -> session.state() == SessionState.RECONNECTING)).isTrue();
            assertThat(sink.calls()).containsExactly("0 0 1", "100 0 0", "200 0 1", "200 0 ?");

            ProbeEmulator again = plugIn(plugs, 0xD4, true);
            assertThat(again.awaitStart(10_000)).isTrue();
            assertThat(CollectingSink.await(() -> session.state() == SessionState.STREAMING)).isTrue();
            again.edges(new long[] {50, 60}, 1);
            assertThat(CollectingSink.await(() -> sink.size() == 6)).isTrue();
            List<String> after = sink.calls().subList(4, 6);
            long t0 = Long.parseLong(after.get(0).split(" ")[0]);
            assertThat(t0).isGreaterThan(200); // placed after the pause, on the same timeline
            assertThat(after.get(1)).isEqualTo((t0 + 10) + " 0 0");
            assertThat(session.status().reconnects()).isEqualTo(1);
            assertThat(sink.monotonic()).isTrue();
        }
    }

    @Test
    void aDifferentProbeOnThePortIsNotTakenForTheFirst() throws Exception {
        Plugs plugs = new Plugs();
        ProbeEmulator first = plugIn(plugs, 0xE5, true);
        MemoryLink firstLink = lastLink;
        CollectingSink sink = new CollectingSink();
        List<String> lines = new ArrayList<>();
        try (ProbeSession session = new ProbeSession(plugs, FAST, sink, new ProbeEvents() { })) {
            session.addStatusListener(s -> {
                synchronized (lines) {
                    lines.add(s.line());
                }
            });
            session.start();
            session.awaitStreaming(Duration.ofSeconds(10));
            assertThat(first.awaitStart(10_000)).isTrue();
            firstLink.unplug();
            ProbeEmulator stranger = plugIn(plugs, 0x99, true);
            assertThat(CollectingSink.await(() -> {
                synchronized (lines) {
                    return lines.stream().anyMatch(l -> l.contains("a different probe (0000000000000099)"));
                }
            })).isTrue();
            assertThat(stranger.running()).isFalse();
            assertThat(session.state()).isEqualTo(SessionState.RECONNECTING);
        }
    }

    @Test
    void memoryPortPlugsUnplugsAndReplugsASimulatedBoard() throws Exception {
        MemoryPort port = new MemoryPort("simulated board");
        ByteTransport board = port.plugIn();
        ProbeEmulator probe = new ProbeEmulator(TransportStreams.output(board), 0x51);
        TransportStreams.pump(board, probe);
        probe.boot();
        CollectingSink sink = new CollectingSink();
        try (ProbeSession session = new ProbeSession(port, FAST, sink, new ProbeEvents() { })) {
            session.start();
            session.awaitStreaming(Duration.ofSeconds(10));
            assertThat(probe.awaitStart(10_000)).isTrue();
            probe.edges(new long[] {10, 20}, 1);
            assertThat(CollectingSink.await(() -> sink.size() == 2)).isTrue();
            port.unplug();
            assertThat(CollectingSink.await(() -> session.state() == SessionState.RECONNECTING)).isTrue();
            assertThat(session.status().line()).startsWith("simulated board disconnected");
            ByteTransport again = port.plugIn();
            ProbeEmulator back = new ProbeEmulator(TransportStreams.output(again), 0x51);
            TransportStreams.pump(again, back);
            back.boot();
            assertThat(back.awaitStart(10_000)).isTrue();
            assertThat(sink.calls()).containsExactly("0 0 1", "10 0 0", "10 0 ?");
        }
    }

    @Test
    void sinkMadeFromTheHelloExistsBeforeTheFirstEdge() throws Exception {
        Plugs plugs = new Plugs();
        ProbeEmulator probe = plugIn(plugs, 0x61, true);
        CollectingSink made = new CollectingSink();
        long[] clock = new long[1];
        SinkOnHello sink = new SinkOnHello(hello -> {
            clock[0] = hello.clockHz();
            return made;
        }, new ProbeEvents() { });
        try (ProbeSession session = new ProbeSession(plugs, FAST, sink, sink)) {
            session.start();
            session.awaitStreaming(Duration.ofSeconds(10));
            assertThat(probe.awaitStart(10_000)).isTrue();
            probe.edges(new long[] {5, 9}, 0);
            assertThat(CollectingSink.await(() -> made.size() == 2)).isTrue();
        }
        assertThat(clock[0]).isEqualTo(16_000_000L);
        assertThat(made.calls()).containsExactly("0 0 0", "4 0 1");
        assertThat(made.ended()).isTrue();
    }

    @Test
    void aProbeThatResetsWhileStreamingIsStartedAgainAfterAGap() throws Exception {
        Plugs plugs = new Plugs();
        ProbeEmulator probe = plugIn(plugs, 0x71, true);
        CollectingSink sink = new CollectingSink();
        try (ProbeSession session = new ProbeSession(plugs, FAST, sink, new ProbeEvents() { })) {
            session.start();
            session.awaitStreaming(Duration.ofSeconds(10));
            assertThat(probe.awaitStart(10_000)).isTrue();
            probe.edges(new long[] {1000, 2000}, 1);
            assertThat(CollectingSink.await(() -> sink.size() == 2)).isTrue();
            probe.boot(); // a brown-out: the probe comes back stopped, with a boot hello
            assertThat(CollectingSink.await(() -> probe.starts() == 2)).isTrue();
            probe.edges(new long[] {70, 90}, 1);
            assertThat(CollectingSink.await(() -> sink.size() == 5)).isTrue();
            assertThat(sink.calls()).containsExactly("0 0 1", "1000 0 0", "1000 0 ?", "1000 0 1", "1020 0 0");
            assertThat(CollectingSink.await(() -> session.counters().probeRestarts() == 1)).isTrue();
        }
    }
}
