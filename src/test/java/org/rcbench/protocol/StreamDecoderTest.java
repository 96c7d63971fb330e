package org.rcbench.protocol;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

class StreamDecoderTest {
    static final StreamFixture FIXTURE = new StreamFixture(42, 20_000);

    @Test
    void cleanStreamDeliversEveryEdgeAndNoGap() {
        Recorder r = Recorder.decode(FIXTURE.bytes);
        assertThat(r.edgeCalls()).isEqualTo(FIXTURE.truth);
        assertThat(r.troubles).isEmpty();
        assertThat(r.hellos).hasSize(1);
        assertThat(r.ended).isTrue();
    }

    @Test
    void wholeByteByByteAndRandomChunksGiveIdenticalCalls() throws IOException {
        Recorder whole = Recorder.decode(FIXTURE.bytes);

        Recorder single = new Recorder();
        StreamDecoder d1 = new StreamDecoder(single, single);
        for (int i = 0; i < FIXTURE.bytes.length; i++) {
            d1.feed(FIXTURE.bytes, i, 1);
        }
        d1.end();

        Recorder chunked = new Recorder();
        StreamDecoder d2 = new StreamDecoder(chunked, chunked);
        Random random = new Random(7);
        for (int at = 0; at < FIXTURE.bytes.length; ) {
            int n = Math.min(FIXTURE.bytes.length - at, random.nextInt(300));
            d2.feed(FIXTURE.bytes, at, n);
            at += n;
        }
        d2.end();

        Recorder streamed = new Recorder();
        new StreamDecoder(streamed, streamed).decodeAll(new ByteArrayInputStream(FIXTURE.bytes));

        assertThat(single.calls).isEqualTo(whole.calls);
        assertThat(chunked.calls).isEqualTo(whole.calls);
        assertThat(streamed.calls).isEqualTo(whole.calls);
        assertThat(d1.counters()).isEqualTo(d2.counters());
    }

    @Test
    void corruptionDropsAndDuplicatesResynchroniseWithGapsAndNoMergedCycles() {
        Random random = new Random(11);
        byte[] damaged = damage(FIXTURE.bytes, random, 60, FIXTURE.frameEnds.get(1));
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder(r, r);
        d.feed(damaged);
        d.end();
        DecoderCounters c = d.counters();
        assertThat(c.resyncs()).isPositive();
        assertThat(c.crcErrors()).isPositive();
        assertThat(c.gapMarks()).isPositive();
        assertThat(r.monotonic).isTrue();
        // Most of the stream survives: 60 damaged spots cost at most a few frames each.
        assertThat(r.edges).isGreaterThan(FIXTURE.truth.size() / 2);
        assertRunsAreContiguous(r.edgeCalls(), FIXTURE.truth);
    }

    @Test
    void aMissingFrameIsASequenceGap() {
        int from = FIXTURE.frameEnds.get(4);
        int to = FIXTURE.frameEnds.get(5);
        byte[] cut = new byte[FIXTURE.bytes.length - (to - from)];
        System.arraycopy(FIXTURE.bytes, 0, cut, 0, from);
        System.arraycopy(FIXTURE.bytes, to, cut, from, FIXTURE.bytes.length - to);
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder(r, r);
        d.feed(cut);
        assertThat(d.counters().sequenceGaps()).isEqualTo(1);
        assertThat(d.counters().framesMissed()).isEqualTo(1);
        assertThat(d.counters().crcErrors()).isZero();
        assertThat(r.troubles).containsExactly(Trouble.SEQUENCE_GAP);
        assertRunsAreContiguous(r.edgeCalls(), FIXTURE.truth);
    }

    @Test
    void bootNoiseBeforeTheFirstFrameIsDiscardedWithoutTrouble() {
        byte[] noise = "\u00ff\u00fe boot v2 \r\n\u0001\u0002\u0003".getBytes(StandardCharsets.ISO_8859_1);
        Recorder r = Recorder.decode(ProtocolDocumentTest.concat(noise, new byte[] {0}, FIXTURE.bytes));
        assertThat(r.edgeCalls()).isEqualTo(FIXTURE.truth);
        assertThat(r.troubles).isEmpty();
        StreamDecoder d = new StreamDecoder(new Recorder(), new Recorder());
        d.feed(ProtocolDocumentTest.concat(noise, new byte[] {0}, FIXTURE.bytes));
        assertThat(d.mode()).isEqualTo(StreamDecoder.Mode.BINARY);
        assertThat(d.counters().bytesDiscarded()).isEqualTo(noise.length);
    }

    @Test
    void aBootHelloWhileStreamingIsAProbeRestart() throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        FrameEncoder enc = new FrameEncoder(out);
        Hello hello = Hello.basic(9, 16_000_000L, ClockSource.CRYSTAL, "x").withFlags(Wire.HELLO_AT_BOOT);
        enc.hello(hello);
        enc.edge(50_000, 0, 1);
        enc.edge(60_000, 0, 0);
        enc.flush();
        FrameEncoder rebooted = new FrameEncoder(out);
        rebooted.hello(hello);
        rebooted.edge(1_000, 0, 1);
        rebooted.flush();
        Recorder r = Recorder.decode(out.toByteArray());
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "10000 0 0", "10000 0 ?", "10000 0 1");
        assertThat(r.troubles).containsExactly(Trouble.PROBE_RESTART);
    }

    @Test
    void ticksGoingBackwardsWithoutHelloAreARestartAndStayMonotonic() throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        FrameEncoder enc = new FrameEncoder(out);
        enc.edge(900_000, 0, 1);
        enc.edge(910_000, 0, 0);
        enc.flush();
        enc.edge(100, 0, 1);
        enc.edge(600, 0, 0);
        enc.flush();
        Recorder r = Recorder.decode(out.toByteArray());
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "10000 0 0", "10000 0 ?", "10000 0 1", "10500 0 0");
        assertThat(r.monotonic).isTrue();
    }

    @Test
    void malformedPayloadWithGoodCrcIsAGap() throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        FrameEncoder enc = new FrameEncoder(out);
        enc.edge(100, 0, 1);
        enc.flush();
        // An edge item whose varint never ends.
        byte[] p = {0, 1, 0, 0, 0, 0, 0, 0, 0, 0, (byte) 0x81};
        enc.frame(Wire.T_EDGES, p, 0, p.length);
        enc.edge(300, 0, 0);
        enc.flush();
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder(r, r);
        d.feed(out.toByteArray());
        assertThat(d.counters().malformed()).isEqualTo(1);
        assertThat(r.troubles).containsExactly(Trouble.MALFORMED);
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "0 0 ?", "200 0 0");
    }

    @Test
    void unknownFrameTypesAreIgnoredWithoutGap() throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        FrameEncoder enc = new FrameEncoder(out);
        enc.edge(100, 0, 1);
        enc.flush();
        enc.frame(0x7E, new byte[] {1, 2, 3}, 0, 3);
        enc.edge(300, 0, 0);
        enc.flush();
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder(r, r);
        d.feed(out.toByteArray());
        assertThat(d.counters().unknownFrames()).isEqualTo(1);
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "200 0 0");
    }

    @Test
    void markGapAndRestartPlaceTheNextSegmentAfterTheEstimatedPause() throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        FrameEncoder enc = new FrameEncoder(out);
        enc.edge(7_000, 0, 1);
        enc.edge(8_000, 0, 0);
        enc.flush();
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder(r, r);
        d.feed(out.toByteArray());
        d.feed(new byte[] {5, 1, 2}, 0, 3); // half a frame when the cable was pulled
        d.markGap(Trouble.DISCONNECT);
        d.restartTimeline(50_000);
        out.reset();
        FrameEncoder after = new FrameEncoder(out);
        after.edge(10, 0, 1);
        after.edge(20, 0, 0);
        after.flush();
        d.feed(out.toByteArray());
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "1000 0 0", "1000 0 ?", "51000 0 1", "51010 0 0");
        assertThat(r.troubles).containsExactly(Trouble.GARBAGE, Trouble.DISCONNECT);
    }

    @Test
    void textModeIsDetectedAfterNoiseAndHandlesEveryLineKind() {
        String text = "\u0000\u00ffgarbage\r\n"
                + "H clock_hz=8000000 probe_id=ab channels=2 clock_source=crystal cal_ppm=-12.5 cal_u_ppm=0.5 name=hand\r\n"
                + "# a comment\n"
                + "E 100 0 1\n"
                + "E  200\t0 0\n"
                + "T 250\n"
                + "E 300 1 1\n"
                + "E 4x0 0 1\n"
                + "E 500 0 1\n"
                + "D 0\n"
                + "D 2\n"
                + "E 900 0 0\n";
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder(r, r);
        d.feed(text.getBytes(StandardCharsets.ISO_8859_1));
        d.end();
        assertThat(d.mode()).isEqualTo(StreamDecoder.Mode.TEXT);
        Hello h = r.hellos.get(0);
        assertThat(h.clockHz()).isEqualTo(8_000_000L);
        assertThat(h.probeId()).isEqualTo(0xAB);
        assertThat(h.channelCount()).isEqualTo(2);
        assertThat(h.calibrationPpb()).isEqualTo(-12_500);
        assertThat(h.calibrationUncertaintyPpb()).isEqualTo(500);
        assertThat(h.calibrated()).isTrue();
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "100 0 0", "200 1 1", "200 0 ?", "200 1 ?",
                "400 0 1", "400 0 ?", "800 0 0");
        assertThat(r.troubles).containsExactly(Trouble.BAD_LINE, Trouble.OVERRUN);
        DecoderCounters c = d.counters();
        assertThat(c.linesBad()).isEqualTo(2); // the garbage line before detection and "E 4x0"
        assertThat(c.overruns()).isEqualTo(2);
        assertThat(c.crcErrors()).isZero();
        assertThat(r.endTick).isEqualTo(800);
    }

    @Test
    void textEncoderLinesRoundTrip() {
        Hello hello = Hello.basic(0xBEEF, 48_000_000L, ClockSource.REFERENCE, "pio").withCalibration(1500, 200)
                .withFlags(Wire.HELLO_AT_BOOT | Wire.HELLO_CALIBRATED);
        String text = TextLines.hello(hello) + TextLines.edge(5, 0, 1) + TextLines.heartbeat(9)
                + TextLines.edge(12, 0, 0);
        Recorder r = Recorder.decode(TextLines.bytes(text));
        Hello back = r.hellos.get(0);
        assertThat(back.probeId()).isEqualTo(0xBEEF);
        assertThat(back.clockSource()).isEqualTo(ClockSource.REFERENCE);
        assertThat(back.calibrationPpb()).isEqualTo(1500);
        assertThat(back.atBoot()).isTrue();
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "7 0 0");
    }

    /** Flips, drops and duplicates bytes at {@code spots} random places after {@code protect}. */
    static byte[] damage(byte[] in, Random random, int spots, int protect) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        double p = spots / (double) (in.length - protect);
        for (int i = 0; i < in.length; i++) {
            if (i >= protect && random.nextDouble() < p) {
                switch (random.nextInt(3)) {
                    case 0 -> out.write(in[i] ^ (1 + random.nextInt(255)));
                    case 1 -> {
                        // dropped
                    }
                    default -> {
                        out.write(in[i]);
                        out.write(in[i]);
                    }
                }
            } else {
                out.write(in[i]);
            }
        }
        return out.toByteArray();
    }

    /**
     * Between two gaps, the edges delivered on each channel must be consecutive edges of the truth:
     * nothing lost may be hidden inside a run, so no cycle can span a loss.
     */
    static void assertRunsAreContiguous(List<String> delivered, List<String> truth) {
        Map<Integer, List<String>> truthByChannel = new HashMap<>();
        for (String t : truth) {
            truthByChannel.computeIfAbsent(Integer.parseInt(t.split(" ")[1]), k -> new ArrayList<>()).add(t);
        }
        Map<Integer, Integer> lastIndex = new HashMap<>();
        for (String call : delivered) {
            String[] f = call.split(" ");
            int ch = Integer.parseInt(f[1]);
            if (f[2].equals("?")) {
                lastIndex.remove(ch);
                continue;
            }
            int index = truthByChannel.get(ch).indexOf(call);
            assertThat(index).as("delivered edge %s is a true edge", call).isGreaterThanOrEqualTo(0);
            Integer prev = lastIndex.get(ch);
            if (prev != null) {
                assertThat(index).as("edge %s follows the previous one with no loss between", call)
                        .isEqualTo(prev + 1);
            }
            lastIndex.put(ch, index);
        }
    }
}
