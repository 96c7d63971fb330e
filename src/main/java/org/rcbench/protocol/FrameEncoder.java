package org.rcbench.protocol;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;

/**
 * Writes binary frames of every type to an {@link OutputStream}, numbering them with its own
 * sequence counter: probe-side frames (hello, edges, ADC, ack, note) for simulators and tests, and
 * host commands for the host. Edges are collected into edge frames: a frame is written when it is
 * full, when the step to the next edge does not fit, on {@link #flush()}, {@link #heartbeat(long)}
 * or {@link #dropped(long)}. Not thread-safe; {@link #edge} allocates nothing.
 */
public final class FrameEncoder {
    private final OutputStream out;
    private final byte[] raw = new byte[Wire.MAX_FRAME];
    private final byte[] encoded = new byte[Wire.MAX_ENCODED + 1];
    /** The edge payload being built: base and dropped total are filled in when it is written. */
    private final byte[] edgePayload = new byte[Wire.MAX_PAYLOAD];
    private int seq;
    private int itemEnd = Wire.EDGES_FIXED;
    private int pendingEdges;
    private long frameBase;
    private long lastEdgeTick;
    private long droppedTotal;
    private long framesWritten;

    public FrameEncoder(OutputStream out) {
        this.out = out;
    }

    /** The sequence number the next frame will carry, 0..255. */
    public int nextSeq() {
        return seq;
    }

    /** Sets the sequence number of the next frame (a probe starts at 0 after reset). */
    public FrameEncoder seq(int next) {
        seq = next & 0xFF;
        return this;
    }

    /** Frames written so far. */
    public long framesWritten() {
        return framesWritten;
    }

    /**
     * Encodes one frame: type, sequence, payload and CRC, COBS-encoded and followed by the
     * delimiter, into {@code dst} from {@code dstOff}; returns the bytes written (at most 256).
     */
    public static int encodeFrame(int type, int seq, byte[] payload, int off, int len, byte[] scratch,
            byte[] dst, int dstOff) {
        if (len < 0 || len > Wire.MAX_PAYLOAD) {
            throw new IllegalArgumentException("payload length out of 0.." + Wire.MAX_PAYLOAD + ": " + len);
        }
        scratch[0] = (byte) type;
        scratch[1] = (byte) seq;
        System.arraycopy(payload, off, scratch, Wire.HEADER, len);
        int n = Wire.HEADER + len;
        Bytes.put16(scratch, n, Crc16.of(scratch, 0, n));
        n += Wire.TRAILER;
        int m = Cobs.encode(scratch, 0, n, dst, dstOff);
        dst[dstOff + m] = (byte) Wire.DELIMITER;
        return m + 1;
    }

    /** One complete frame as new bytes (tests, documentation). */
    public static byte[] frame(int type, int seq, byte[] payload) {
        byte[] scratch = new byte[Wire.MAX_FRAME];
        byte[] dst = new byte[Wire.MAX_ENCODED + 1];
        int n = encodeFrame(type, seq, payload, 0, payload.length, scratch, dst, 0);
        return java.util.Arrays.copyOf(dst, n);
    }

    /** Writes one frame of any type with the next sequence number. */
    public void frame(int type, byte[] payload, int off, int len) throws IOException {
        int n = encodeFrame(type, seq, payload, off, len, raw, encoded, 0);
        seq = (seq + 1) & 0xFF;
        framesWritten++;
        out.write(encoded, 0, n);
    }

    /** The hello payload for {@code hello}. */
    public static byte[] helloPayload(Hello hello) {
        byte[] name = hello.name().getBytes(StandardCharsets.US_ASCII);
        byte[] p = new byte[Wire.HELLO_FIXED + name.length];
        String[] fw = (hello.firmwareVersion() + ".0.0").split("\\.");
        int at = Bytes.put8(p, 0, hello.protocolVersion());
        at = Bytes.put8(p, at, hello.flags());
        for (int i = 0; i < 3; i++) {
            at = Bytes.put8(p, at, parseOr0(fw[i]));
        }
        at = Bytes.put64(p, at, hello.probeId());
        at = Bytes.put32(p, at, hello.clockHz());
        at = Bytes.put8(p, at, hello.clockSource().code());
        at = Bytes.put32(p, at, hello.calibrationPpb());
        at = Bytes.put32(p, at, hello.calibrationUncertaintyPpb());
        at = Bytes.put8(p, at, hello.channelCount());
        at = Bytes.put8(p, at, hello.edgeCapabilities());
        at = Bytes.put32(p, at, hello.maxEdgeRate());
        at = Bytes.put8(p, at, hello.adcChannels());
        at = Bytes.put8(p, at, hello.adcResolutionBits());
        at = Bytes.put32(p, at, hello.adcMaxRateHz());
        at = Bytes.put8(p, at, name.length);
        System.arraycopy(name, 0, p, at, name.length);
        return p;
    }

    private static int parseOr0(String s) {
        try {
            return Math.max(0, Math.min(255, Integer.parseInt(s)));
        } catch (NumberFormatException e) {
            return 0;
        }
    }

    public void hello(Hello hello) throws IOException {
        byte[] p = helloPayload(hello);
        frame(Wire.T_HELLO, p, 0, p.length);
    }

    public void ack(Ack ack) throws IOException {
        byte[] p = {(byte) ack.commandType(), (byte) ack.commandSeq(), (byte) ack.status()};
        frame(Wire.T_ACK, p, 0, p.length);
    }

    /** A free-text note; characters outside printable ASCII become '?', longer text is cut. */
    public void note(String text) throws IOException {
        byte[] p = text.getBytes(StandardCharsets.US_ASCII);
        frame(Wire.T_NOTE, p, 0, Math.min(p.length, Wire.MAX_PAYLOAD));
    }

    public void command(HostCommand command) throws IOException {
        byte[] p = command.payload();
        frame(command.type(), p, 0, p.length);
    }

    /**
     * One ADC frame: {@code count} samples from {@code off} (at most 116), the first taken at
     * probe tick {@code firstTick}, then one every {@code periodTicks}.
     */
    public void adc(int channel, int resolutionBits, int fullScaleMv, long periodTicks, long firstTick,
            long droppedSamplesTotal, int[] samples, int off, int count) throws IOException {
        if (count < 0 || Wire.ADC_FIXED + 2 * count > Wire.MAX_PAYLOAD) {
            throw new IllegalArgumentException("ADC samples per frame out of 0.."
                    + (Wire.MAX_PAYLOAD - Wire.ADC_FIXED) / 2 + ": " + count);
        }
        byte[] p = new byte[Wire.ADC_FIXED + 2 * count];
        int at = Bytes.put8(p, 0, channel);
        at = Bytes.put8(p, at, resolutionBits);
        at = Bytes.put16(p, at, fullScaleMv);
        at = Bytes.put32(p, at, periodTicks);
        at = Bytes.put48(p, at, firstTick);
        at = Bytes.put32(p, at, droppedSamplesTotal);
        for (int i = 0; i < count; i++) {
            at = Bytes.put16(p, at, samples[off + i]);
        }
        frame(Wire.T_ADC, p, 0, p.length);
    }

    /**
     * Adds one edge at probe tick {@code tick} (non-decreasing, only its low 48 bits are sent) on
     * {@code channel} 0..7 with {@code level} 0 or 1; writes the pending frame first when this
     * edge does not fit in it.
     */
    public void edge(long tick, int channel, int level) throws IOException {
        if (channel < 0 || channel >= Wire.MAX_EDGE_CHANNELS || (level & ~1) != 0) {
            throw new IllegalArgumentException("channel 0..7 and level 0/1 expected: " + channel + " " + level);
        }
        if (pendingEdges > 0 && (tick < lastEdgeTick || tick - lastEdgeTick >= Wire.MAX_DELTA)) {
            flush();
        }
        if (pendingEdges == 0) {
            frameBase = tick;
            lastEdgeTick = tick;
        }
        long v = (tick - lastEdgeTick) << 4 | (long) channel << 1 | level;
        if (itemEnd + varintLength(v) > edgePayload.length) {
            flush();
            frameBase = tick;
            lastEdgeTick = tick;
            v = (long) channel << 1 | level;
        }
        while ((v & ~0x7FL) != 0) {
            edgePayload[itemEnd++] = (byte) (v | 0x80);
            v >>>= 7;
        }
        edgePayload[itemEnd++] = (byte) v;
        lastEdgeTick = tick;
        pendingEdges++;
    }

    /** Edges waiting for {@link #flush()}. */
    public int pendingEdges() {
        return pendingEdges;
    }

    /** Writes the pending edges as one edge frame (nothing when there are none). */
    public void flush() throws IOException {
        if (pendingEdges > 0) {
            writeEdges(frameBase);
        }
    }

    /** Writes pending edges, then an edge frame with no edges vouching that none occurred up to {@code tick}. */
    public void heartbeat(long tick) throws IOException {
        flush();
        writeEdges(tick);
    }

    /**
     * Sets the probe's dropped-edge total (edges lost since reset); pending edges are written
     * first, so the rise shows before the next frame's first edge, as the protocol requires.
     */
    public void dropped(long total) throws IOException {
        flush();
        droppedTotal = total & 0xFFFF_FFFFL;
    }

    private void writeEdges(long base) throws IOException {
        Bytes.put48(edgePayload, 0, base);
        Bytes.put32(edgePayload, 6, droppedTotal);
        int len = itemEnd;
        itemEnd = Wire.EDGES_FIXED;
        pendingEdges = 0;
        frame(Wire.T_EDGES, edgePayload, 0, len);
    }

    static int varintLength(long v) {
        int n = 1;
        while ((v >>>= 7) != 0) {
            n++;
        }
        return n;
    }
}
