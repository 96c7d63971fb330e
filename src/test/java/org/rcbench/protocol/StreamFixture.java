package org.rcbench.protocol;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * A binary probe stream built with the encoder: a boot hello, then edges of two channels (a
 * square-ish wave with jitter from a fixed seed), heartbeats and a note. Keeps the truth: every
 * edge as "tick channel level" on the decoder's timeline (the first edge frame's base is 0).
 */
final class StreamFixture {
    final byte[] bytes;
    /** Byte offsets just after each frame's delimiter. */
    final List<Integer> frameEnds = new ArrayList<>();
    final List<String> truth = new ArrayList<>();
    final List<long[]> truthEdges = new ArrayList<>();

    StreamFixture(long seed, int edges) {
        Random random = new Random(seed);
        ByteArrayOutputStream out = new ByteArrayOutputStream() {
            @Override
            public synchronized void write(byte[] b, int off, int len) {
                super.write(b, off, len);
                frameEnds.add(size());
            }
        };
        try {
            FrameEncoder enc = new FrameEncoder(out);
            enc.hello(Hello.basic(0x1234, 16_000_000L, ClockSource.RESONATOR, "fixture").withFlags(Wire.HELLO_AT_BOOT)
                    .withChannels(2));
            long origin = 5_000_000_000L;
            long t0 = origin;
            long t1 = origin + 3;
            int level0 = 1;
            int level1 = 1;
            for (int i = 0; i < edges; i++) {
                boolean ch0 = t0 <= t1;
                long t = ch0 ? t0 : t1;
                int level = ch0 ? level0 : level1;
                enc.edge(t, ch0 ? 0 : 1, level);
                truth.add((t - origin) + " " + (ch0 ? 0 : 1) + " " + level);
                truthEdges.add(new long[] {t - origin, ch0 ? 0 : 1, level});
                if (ch0) {
                    t0 += 11_000 + random.nextInt(2_000);
                    level0 ^= 1;
                } else {
                    // Channel 1 is fast: 2-byte items.
                    t1 += 200 + random.nextInt(700);
                    level1 ^= 1;
                }
                if (random.nextInt(97) == 0) {
                    enc.flush();
                }
                if (random.nextInt(400) == 0) {
                    enc.note("tick " + i);
                }
            }
            enc.heartbeat(Math.max(t0, t1));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        bytes = out.toByteArray();
    }
}
