package org.rcbench.protocol;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Decodes the worked examples of {@code firmware-notes/protocol.md}, read from its fenced
 * {@code hex} blocks, and checks each against the values the document states in words. The CRCs
 * and COBS of these blocks were also checked with Python's {@code binascii.crc_hqx(frame, 0xFFFF)}
 * and an independent COBS decoder while the document was written.
 */
class ProtocolDocumentTest {
    static Map<String, String> hex;

    @BeforeAll
    static void readDocument() throws IOException {
        hex = Hex.blocks("hex");
    }

    static byte[] example(String name) {
        assertThat(hex).containsKey(name);
        return Hex.parse(hex.get(name));
    }

    @Test
    void documentHasAnExampleOfEveryFrameType() {
        assertThat(hex.keySet()).contains("hello-boot", "edges", "heartbeat", "overrun", "wrap", "adc", "ack",
                "note", "cmd-hello", "cmd-edges", "cmd-adc", "cmd-start", "cmd-stop");
    }

    @Test
    void everyExampleIsOneFrameWithAGoodCrc() {
        for (Map.Entry<String, String> e : hex.entrySet()) {
            Recorder r = new Recorder();
            StreamDecoder d = new StreamDecoder(r, r, StreamDecoder.Mode.BINARY);
            byte[] b = Hex.parse(e.getValue());
            d.feed(b);
            assertThat(d.counters().framesOk()).as(e.getKey()).isEqualTo(1);
            assertThat(d.counters().bytesDiscarded()).as(e.getKey()).isZero();
            assertThat(b[b.length - 1]).as(e.getKey()).isZero();
        }
    }

    @Test
    void helloAtBoot() {
        Recorder r = Recorder.decode(example("hello-boot"));
        assertThat(r.hellos).hasSize(1);
        Hello h = r.hellos.get(0);
        assertThat(h.protocolVersion()).isEqualTo(1);
        assertThat(h.atBoot()).isTrue();
        assertThat(h.sendsHeartbeats()).isTrue();
        assertThat(h.calibrated()).isFalse();
        assertThat(h.firmwareVersion()).isEqualTo("1.0.0");
        assertThat(h.probeId()).isEqualTo(0x5242000000000017L);
        assertThat(h.clockHz()).isEqualTo(16_000_000L);
        assertThat(h.clockSource()).isEqualTo(ClockSource.CRYSTAL);
        assertThat(h.channelCount()).isEqualTo(1);
        assertThat(h.edgeCapabilities()).isEqualTo(0x0F);
        assertThat(h.maxEdgeRate()).isEqualTo(100_000);
        assertThat(h.adcChannels()).isZero();
        assertThat(h.name()).isEqualTo("rcb-328p");
    }

    @Test
    void edgesDecodeToTheStatedTicks() {
        // Stated: 1 000 000, 1 012 000, 1 023 188 (channel 0), 1 023 193 (channel 1); the host's
        // timeline starts at the first base, so these are 0, 12 000, 23 188, 23 193.
        Recorder r = Recorder.decode(example("edges"));
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "12000 0 0", "23188 0 1", "23193 1 1");
        assertThat(example("edges")).hasSize(24);
    }

    @Test
    void heartbeatThenOverrunMarksAGapOnBothChannels() {
        byte[] stream = concat(example("hello-boot"), example("edges"), example("heartbeat"), example("overrun"));
        Recorder r = Recorder.decode(stream);
        // The heartbeat vouches up to 1 027 188 (timeline 27 188); three edges were then lost, so both
        // channels are unknown from there; then channel 0 falls at 1 100 000 (timeline 100 000).
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "12000 0 0", "23188 0 1", "23193 1 1",
                "27188 0 ?", "27188 1 ?", "100000 0 0");
        assertThat(r.troubles).containsExactly(Trouble.OVERRUN);
        StreamDecoder d = new StreamDecoder(new Recorder(), new Recorder());
        d.feed(stream);
        assertThat(d.counters().overruns()).isEqualTo(3);
        assertThat(d.counters().sequenceGaps()).isZero();
        assertThat(d.lastTick()).isEqualTo(100_000);
    }

    @Test
    void wrapOfTheFortyEightBitCounterIsAForwardStep() {
        Recorder r = Recorder.decode(example("wrap"));
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "512 0 0");
        assertThat(r.troubles).isEmpty();
    }

    @Test
    void adcSamples() {
        Recorder r = Recorder.decode(example("adc"));
        // channel 0, 10 bits, 5000 mV, first tick (timeline 0: nothing earlier), every 16 000 ticks.
        assertThat(r.adc).containsExactly("0 10 5000 0 16000: 512 1023 0 700");
    }

    @Test
    void ackAndNote() {
        assertThat(Recorder.decode(example("ack")).acks).containsExactly(new Ack(Wire.T_SET_EDGES, 2, Wire.ACK_OK));
        assertThat(Recorder.decode(example("note")).notes).containsExactly("ring full");
    }

    @Test
    void hostCommandsDecodeOnTheProbeSide() {
        StringBuilder seen = new StringBuilder();
        CommandReader reader = new CommandReader((command, seq) -> seen.append(seq).append(' ')
                .append(command.describe()).append('\n'));
        for (String name : new String[] {"cmd-hello", "cmd-edges", "cmd-adc", "cmd-start", "cmd-stop"}) {
            byte[] b = example(name);
            reader.feed(b, 0, b.length);
        }
        assertThat(seen.toString()).isEqualTo("0 hello?\n1 edges channels=01 rising=01 falling=01\n"
                + "2 adc channels=01 rate=1000 Hz\n3 start\n4 stop\n");
    }

    @Test
    void encoderReproducesTheDocumentBytes() throws IOException {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        FrameEncoder probe = new FrameEncoder(out);
        probe.hello(new Hello(1, Wire.HELLO_AT_BOOT | Wire.HELLO_HEARTBEAT, "1.0.0", 0x5242000000000017L,
                16_000_000L, ClockSource.CRYSTAL, 0, 0, 1, 0x0F, 100_000, 0, 0, 0, "rcb-328p"));
        assertThat(Hex.format(out.toByteArray())).isEqualTo(Hex.format(example("hello-boot")));
        out.reset();
        probe.edge(1_000_000, 0, 1);
        probe.edge(1_012_000, 0, 0);
        probe.edge(1_023_188, 0, 1);
        probe.edge(1_023_193, 1, 1);
        probe.flush();
        assertThat(Hex.format(out.toByteArray())).isEqualTo(Hex.format(example("edges")));
        out.reset();
        probe.heartbeat(1_027_188);
        assertThat(Hex.format(out.toByteArray())).isEqualTo(Hex.format(example("heartbeat")));
        out.reset();
        probe.dropped(3);
        probe.edge(1_100_000, 0, 0);
        probe.flush();
        assertThat(Hex.format(out.toByteArray())).isEqualTo(Hex.format(example("overrun")));
        out.reset();
        probe.edge(0xFFFF_FFFF_FF00L, 0, 1);
        probe.edge(0xFFFF_FFFF_FF00L + 512, 0, 0);
        probe.flush();
        assertThat(Hex.format(out.toByteArray())).isEqualTo(Hex.format(example("wrap")));
        out.reset();
        probe.adc(0, 10, 5000, 16_000, 1_000_000, 0, new int[] {512, 1023, 0, 700}, 0, 4);
        assertThat(Hex.format(out.toByteArray())).isEqualTo(Hex.format(example("adc")));
        out.reset();
        probe.ack(new Ack(Wire.T_SET_EDGES, 2, 0));
        assertThat(Hex.format(out.toByteArray())).isEqualTo(Hex.format(example("ack")));
        out.reset();
        probe.note("ring full");
        assertThat(Hex.format(out.toByteArray())).isEqualTo(Hex.format(example("note")));
    }

    @Test
    void textExampleIsDetectedAndDecoded() throws IOException {
        String text = Hex.blocks("text").get("text-example");
        Recorder r = Recorder.decode(text.getBytes(StandardCharsets.US_ASCII));
        assertThat(r.hellos).hasSize(1);
        assertThat(r.hellos.get(0).clockHz()).isEqualTo(16_000_000L);
        assertThat(r.hellos.get(0).clockSource()).isEqualTo(ClockSource.RESONATOR);
        assertThat(r.hellos.get(0).probeId()).isEqualTo(0x2A);
        assertThat(r.edgeCalls()).containsExactly("0 0 1", "12000 0 0", "23188 0 1");
        assertThat(r.endTick).isEqualTo(27_188);
    }

    static byte[] concat(byte[]... parts) {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        for (byte[] p : parts) {
            out.writeBytes(p);
        }
        return out.toByteArray();
    }
}
