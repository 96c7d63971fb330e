package org.rcbench.protocol;

import java.nio.charset.StandardCharsets;

/**
 * Turns good binary frames into edges, hello, ADC blocks, acknowledgements and notes, and every
 * sign of loss (sequence skip, overrun, malformed payload, probe reset) into a gap. The 48-bit
 * probe ticks are turned into steps modulo 2^48, so the counter's wrap needs no special case.
 * Not thread-safe; allocation-free per edge.
 */
final class BinaryInterpreter implements FrameReader.Handler {
    private static final long MASK48 = Wire.TICK_MODULUS - 1;

    private final Timeline timeline;
    private final ProbeEvents events;
    private final int[] samples = new int[Wire.MAX_PAYLOAD / 2];
    private final long[] adcDroppedTotal = new long[256];

    /** Whether {@link #prevTick} holds the probe tick of the last event of this segment. */
    private boolean havePrev;
    private long prevTick;
    private int expectedSeq = -1;
    private boolean haveDropped;
    private long droppedTotal;
    /** Set by the facade while it is still deciding between binary and text: discards are only counted. */
    boolean quiet;

    long sequenceGaps;
    long framesMissed;
    long overruns;
    long malformed;
    long unknownFrames;
    long adcSamples;
    long adcDropped;

    BinaryInterpreter(Timeline timeline, ProbeEvents events) {
        this.timeline = timeline;
        this.events = events;
        java.util.Arrays.fill(adcDroppedTotal, -1);
    }

    /** Forgets the probe's clock, sequence and counters: the next frame starts a new segment. */
    void restart() {
        havePrev = false;
        expectedSeq = -1;
        haveDropped = false;
        java.util.Arrays.fill(adcDroppedTotal, -1);
    }

    @Override
    public void onDiscard(Trouble why, int bytes) {
        if (!quiet) {
            timeline.gap(why);
        }
    }

    @Override
    public void onFrame(int type, int seq, byte[] b, int off, int len) {
        boolean bootHello = type == Wire.T_HELLO && len > 1 && (b[off + 1] & Wire.HELLO_AT_BOOT) != 0;
        if (bootHello) {
            if (havePrev) {
                timeline.probeRestarts++;
                timeline.gap(Trouble.PROBE_RESTART);
                timeline.restart(0);
            }
            restart();
        } else if (expectedSeq >= 0 && seq != expectedSeq) {
            sequenceGaps++;
            framesMissed += (seq - expectedSeq) & 0xFF;
            timeline.gap(Trouble.SEQUENCE_GAP);
        }
        expectedSeq = (seq + 1) & 0xFF;
        switch (type) {
            case Wire.T_EDGES -> edges(b, off, len);
            case Wire.T_HELLO -> hello(b, off, len);
            case Wire.T_ADC -> adc(b, off, len);
            case Wire.T_ACK -> ack(b, off, len);
            case Wire.T_NOTE -> events.onNote(ascii(b, off, len));
            default -> unknownFrames++;
        }
    }

    private void edges(byte[] b, int off, int len) {
        int end = off + len;
        if (len < Wire.EDGES_FIXED || !itemsWellFormed(b, off + Wire.EDGES_FIXED, end)) {
            malformed();
            return;
        }
        long base = Bytes.u48(b, off);
        long dropped = Bytes.u32(b, off + 6);
        if (haveDropped && dropped != droppedTotal) {
            // The probe lost edges after the previous frame's last event and before this base.
            overruns += (dropped - droppedTotal) & 0xFFFF_FFFFL;
            timeline.gap(Trouble.OVERRUN);
        }
        haveDropped = true;
        droppedTotal = dropped;
        long tick = advanceTo(base);
        int at = off + Wire.EDGES_FIXED;
        while (at < end) {
            long v = 0;
            int shift = 0;
            int x;
            do {
                x = b[at++];
                v |= (long) (x & 0x7F) << shift;
                shift += 7;
            } while ((x & 0x80) != 0);
            long delta = v >>> 4;
            prevTick = (prevTick + delta) & MASK48;
            tick = timeline.next(delta);
            timeline.edge(tick, (int) (v >>> 1) & 7, (int) v & 1);
        }
        timeline.vouched();
    }

    /** True when the items from {@code at} to {@code end} are complete varints of at most 9 bytes with steps below 2^47. */
    private static boolean itemsWellFormed(byte[] b, int at, int end) {
        while (at < end) {
            long v = 0;
            int n = 0;
            int x;
            do {
                if (at >= end || n == Wire.MAX_ITEM_BYTES) {
                    return false;
                }
                x = b[at++];
                v |= (long) (x & 0x7F) << (7 * n);
                n++;
            } while ((x & 0x80) != 0);
            if ((v >>> 4) >= Wire.MAX_DELTA) {
                return false;
            }
        }
        return true;
    }

    /** Moves the timeline to a frame's 48-bit base tick and returns its timeline tick. */
    private long advanceTo(long base48) {
        long tick;
        if (havePrev) {
            // Signed difference modulo 2^48: forward across a wrap is a small positive step.
            long step = ((base48 - prevTick) << 16) >> 16;
            // A backward step (the probe reset without a hello) becomes a gap inside next().
            tick = timeline.next(step);
        } else {
            tick = timeline.first();
        }
        havePrev = true;
        prevTick = base48;
        return tick;
    }

    private void hello(byte[] b, int off, int len) {
        int nameLen = len >= Wire.HELLO_FIXED ? b[off + 38] & 0xFF : -1;
        long clockHz = len >= Wire.HELLO_FIXED ? Bytes.u32(b, off + 13) : 0;
        int channels = len >= Wire.HELLO_FIXED ? b[off + 26] & 0xFF : 0;
        if (nameLen < 0 || nameLen > Wire.MAX_NAME || Wire.HELLO_FIXED + nameLen > len || clockHz == 0
                || channels < 1 || channels > Wire.MAX_EDGE_CHANNELS) {
            malformed();
            return;
        }
        String fw = (b[off + 2] & 0xFF) + "." + (b[off + 3] & 0xFF) + "." + (b[off + 4] & 0xFF);
        long uncertainty = Bytes.u32(b, off + 22);
        Hello hello = new Hello(b[off] & 0xFF, b[off + 1] & 0xFF, fw, Bytes.u64(b, off + 5), clockHz,
                ClockSource.ofCode(b[off + 17] & 0xFF), (int) Bytes.u32(b, off + 18), uncertainty, channels,
                b[off + 27] & 0xFF, Bytes.u32(b, off + 28), b[off + 32] & 0xFF, b[off + 33] & 0xFF,
                Bytes.u32(b, off + 34), ascii(b, off + Wire.HELLO_FIXED, nameLen));
        events.onHello(hello);
    }

    private void adc(byte[] b, int off, int len) {
        long period = len >= Wire.ADC_FIXED ? Bytes.u32(b, off + 4) : 0;
        if (len < Wire.ADC_FIXED || (len - Wire.ADC_FIXED) % 2 != 0 || period == 0) {
            malformed();
            return;
        }
        int channel = b[off] & 0xFF;
        long dropped = Bytes.u32(b, off + 14);
        if (adcDroppedTotal[channel] >= 0) {
            adcDropped += (dropped - adcDroppedTotal[channel]) & 0xFFFF_FFFFL;
        }
        adcDroppedTotal[channel] = dropped;
        long first48 = Bytes.u48(b, off + 8);
        // Samples may predate the last edge: place them without moving the edge timeline.
        long firstTick = timeline.lastTick();
        if (havePrev) {
            firstTick = Math.max(0, firstTick + (((first48 - prevTick) << 16) >> 16));
        }
        int count = (len - Wire.ADC_FIXED) / 2;
        for (int i = 0; i < count; i++) {
            samples[i] = Bytes.u16(b, off + Wire.ADC_FIXED + 2 * i);
        }
        adcSamples += count;
        events.onAdc(channel, b[off + 1] & 0xFF, Bytes.u16(b, off + 2), firstTick, period, samples, count);
    }

    private void ack(byte[] b, int off, int len) {
        if (len < 3) {
            malformed();
            return;
        }
        events.onAck(new Ack(b[off] & 0xFF, b[off + 1] & 0xFF, b[off + 2] & 0xFF));
    }

    private void malformed() {
        malformed++;
        timeline.gap(Trouble.MALFORMED);
    }

    /** Printable ASCII of a byte range; anything else becomes '?'. */
    static String ascii(byte[] b, int off, int len) {
        byte[] copy = java.util.Arrays.copyOfRange(b, off, off + len);
        for (int i = 0; i < copy.length; i++) {
            if (copy[i] < 0x20 || copy[i] > 0x7E) {
                copy[i] = '?';
            }
        }
        return new String(copy, StandardCharsets.US_ASCII);
    }
}
