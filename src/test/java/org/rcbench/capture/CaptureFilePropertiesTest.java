package org.rcbench.capture;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.regex.Pattern;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.testing.ChunkedInputStream;
import org.rcbench.testing.RecordingSink.Edge;

/** Property tests of the readers and writers over random valid and randomly damaged files. */
class CaptureFilePropertiesTest {
    private static final String NOISE = "0123456789,x#\n\r $!=b";
    private static final Pattern WHERE = Pattern.compile("^t\\.(rce|vcd):[0-9]+: [^\\n]+$");

    /** A capture to write: timebase, named channels, extra header fields, edges, end tick, gzip. */
    record Spec(Timebase timebase, Map<Integer, String> channels, Map<String, String> extra, List<Edge> edges,
            long endExtra, boolean gzip) {
    }

    @Provide
    Arbitrary<Spec> captures() {
        Arbitrary<Timebase> timebases = Combinators.combine(
                Arbitraries.doubles().between(1e-3, 1e12).ofScale(9).withSpecialValue(16e6).withSpecialValue(1.0),
                Arbitraries.doubles().between(-999_999, 999_999).ofScale(6).withSpecialValue(0.0),
                Arbitraries.doubles().between(0, 1e5).ofScale(6).withSpecialValue(0.0)).as(Timebase::new);
        Arbitrary<Map<Integer, String>> channels = Arbitraries.integers().between(0, 255).set().ofMinSize(1).ofMaxSize(5)
                .flatMap(set -> Arbitraries.strings().withCharRange('a', 'z').withChars(" _-.é").ofMinLength(1).ofMaxLength(12)
                        .map(String::strip).filter(s -> !s.isEmpty()).list().ofSize(set.size()).map(names -> {
                            Map<Integer, String> m = new TreeMap<>();
                            int i = 0;
                            for (int ch : set) {
                                m.put(ch, names.get(i++));
                            }
                            return m;
                        }));
        Arbitrary<Map<String, String>> extra = Arbitraries.maps(
                Arbitraries.strings().withCharRange('a', 'z').withChars("_.-0123456789").ofMinLength(1).ofMaxLength(10)
                        .filter(k -> !k.startsWith("channel.") && !Arrays.asList("clock_hz", "calibration_ppm",
                                "calibration_u_ppm", "started").contains(k)),
                Arbitraries.strings().ofMaxLength(20).filter(v -> v.indexOf('\n') < 0 && v.indexOf('\r') < 0)
                        .map(String::strip).filter(v -> v.chars().allMatch(c -> c >= 0x20 && !Character.isSurrogate((char) c))))
                .ofMaxSize(4);
        return Combinators.combine(timebases, channels, extra, Arbitraries.longs().between(0, 1000),
                Arbitraries.of(true, false), Arbitraries.longs()).as((tb, ch, ex, endExtra, gzip, seed) ->
                        new Spec(tb, ch, ex, randomEdges(ch, seed), endExtra, gzip));
    }

    /** Non-decreasing ticks (with repeats and huge jumps), channels from the map, all three levels. */
    private static List<Edge> randomEdges(Map<Integer, String> channels, long seed) {
        Random rnd = new Random(seed);
        Integer[] chs = channels.keySet().toArray(new Integer[0]);
        List<Edge> edges = new ArrayList<>();
        long tick = rnd.nextBoolean() ? 0 : rnd.nextInt(1000);
        int n = rnd.nextInt(400);
        for (int i = 0; i < n; i++) {
            int kind = rnd.nextInt(10);
            long step = kind == 0 ? 0 : kind == 1 ? (Long.MAX_VALUE - tick) / (n + 1) : rnd.nextInt(100_000);
            tick += step;
            int level = rnd.nextInt(10) == 0 ? EdgeSink.UNKNOWN : rnd.nextInt(2);
            edges.add(new Edge(tick, chs[rnd.nextInt(chs.length)], level));
        }
        return edges;
    }

    private static byte[] write(Spec s) throws IOException {
        Map<String, String> header = EdgeCaptureFormat.header(s.timebase(), s.channels());
        header.putAll(s.extra());
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (EdgeCaptureWriter w = EdgeCaptureWriter.to(bos, header, s.gzip())) {
            for (Edge e : s.edges()) {
                w.append(e.tick(), e.channel(), e.level());
            }
            long last = s.edges().isEmpty() ? 0 : s.edges().get(s.edges().size() - 1).tick();
            w.end(last + Math.min(s.endExtra(), Long.MAX_VALUE - last));
        }
        return bos.toByteArray();
    }

    @Property(tries = 300)
    void writtenCapturesReadBackEqual(@ForAll("captures") Spec s) throws IOException {
        byte[] bytes = write(s);
        Read r = Read.of(new ByteArrayInputStream(bytes), "t.rce");
        assertThat(r.edges()).isEqualTo(s.edges());
        assertThat(r.timebase()).isEqualTo(s.timebase());
        assertThat(r.channels()).isEqualTo(s.channels());
        assertThat(r.header()).containsAllEntriesOf(s.extra());
        assertThat(r.warnings()).isEmpty();
        long last = s.edges().isEmpty() ? 0 : s.edges().get(s.edges().size() - 1).tick();
        assertThat(r.endTick()).isEqualTo(last + Math.min(s.endExtra(), Long.MAX_VALUE - last));
        Read chunked = Read.of(ChunkedInputStream.randomChunks(bytes, bytes.length, 300), "t.rce");
        assertThat(chunked.edges()).isEqualTo(s.edges());
    }

    @Property(tries = 200)
    void edgesSurviveTheTripThroughVcd(@ForAll("captures") Spec s) throws IOException {
        Spec plain = new Spec(Timebase.of(1e9), s.channels(), Map.of(), s.edges(), 0, false);
        ByteArrayOutputStream vcd = new ByteArrayOutputStream();
        try (Capture c = CaptureFiles.open(new ByteArrayInputStream(write(plain)), "t.rce")) {
            VcdWriter.write(c, vcd, VcdTimescale.NANOSECOND);
        }
        Read r = Read.of(new ByteArrayInputStream(vcd.toByteArray()), "t.vcd");
        // VCD lists changes only, and numbers the wires 0, 1, 2... in channel order.
        List<Integer> order = new ArrayList<>(s.channels().keySet());
        Map<Integer, Integer> current = new LinkedHashMap<>();
        List<Edge> expected = new ArrayList<>();
        for (Edge e : s.edges()) {
            if (!Integer.valueOf(e.level()).equals(current.put(e.channel(), e.level()))) {
                expected.add(new Edge(e.tick(), order.indexOf(e.channel()), e.level()));
            }
        }
        assertThat(r.edges()).isEqualTo(expected);
        assertThat(r.timebase().clockHz()).isEqualTo(1e9);
    }

    @Property(tries = 1000)
    void damagedCapturesGiveAResultOrOneLineNamingFileAndLine(@ForAll("captures") Spec s, @ForAll long seed,
            @ForAll @IntRange(min = 1, max = 6) int damages) throws IOException {
        Spec plain = new Spec(s.timebase(), s.channels(), s.extra(), s.edges(), s.endExtra(), false);
        readDamaged(damage(write(plain), seed, damages), "t.rce");
    }

    @Property(tries = 300)
    void damagedGzipCapturesGiveAResultOrOneLineNamingFileAndLine(@ForAll("captures") Spec s, @ForAll long seed)
            throws IOException {
        Spec gz = new Spec(s.timebase(), s.channels(), s.extra(), s.edges(), s.endExtra(), true);
        readDamaged(damage(write(gz), seed, 1), "t.rce");
    }

    @Property(tries = 1000)
    void damagedVcdGivesAResultOrOneLineNamingFileAndLine(@ForAll long seed,
            @ForAll @IntRange(min = 1, max = 6) int damages) throws IOException {
        byte[] fixture;
        try (InputStream in = CaptureFilePropertiesTest.class.getResourceAsStream("layout-18-2.vcd")) {
            fixture = in.readAllBytes();
        }
        readDamaged(damage(fixture, seed, damages), "t.vcd");
    }

    private static void readDamaged(byte[] bytes, String name) {
        try {
            Read r = Read.of(new ByteArrayInputStream(bytes), name);
            for (String w : r.warnings()) {
                assertThat(w).matches(WHERE);
            }
            Read chunked = Read.of(ChunkedInputStream.randomChunks(bytes, 7, 50), name);
            assertThat(chunked.edges()).isEqualTo(r.edges());
        } catch (BadInputException e) {
            assertThat(e.getMessage()).matches(WHERE);
        }
    }

    /** Flips bits, inserts, deletes and duplicates bytes, or cuts the end off, chosen by {@code seed}. */
    static byte[] damage(byte[] bytes, long seed, int count) {
        Random rnd = new Random(seed);
        byte[] b = bytes;
        for (int k = 0; k < count && b.length > 0; k++) {
            int at = rnd.nextInt(b.length);
            switch (rnd.nextInt(5)) {
                case 0 -> {
                    b = b.clone();
                    b[at] ^= (byte) (1 << rnd.nextInt(8));
                }
                case 1 -> {
                    byte[] ins = new byte[1 + rnd.nextInt(4)];
                    for (int i = 0; i < ins.length; i++) {
                        ins[i] = (byte) (NOISE.charAt(rnd.nextInt(NOISE.length())) + (rnd.nextInt(8) == 0 ? 128 : 0));
                    }
                    byte[] n = new byte[b.length + ins.length];
                    System.arraycopy(b, 0, n, 0, at);
                    System.arraycopy(ins, 0, n, at, ins.length);
                    System.arraycopy(b, at, n, at + ins.length, b.length - at);
                    b = n;
                }
                case 2 -> {
                    int len = Math.min(b.length - at, 1 + rnd.nextInt(8));
                    byte[] n = new byte[b.length - len];
                    System.arraycopy(b, 0, n, 0, at);
                    System.arraycopy(b, at + len, n, at, b.length - at - len);
                    b = n;
                }
                case 3 -> b = Arrays.copyOf(b, at);
                default -> {
                    int len = Math.min(b.length - at, 1 + rnd.nextInt(30));
                    byte[] n = new byte[b.length + len];
                    System.arraycopy(b, 0, n, 0, at + len);
                    System.arraycopy(b, at, n, at + len, b.length - at);
                    b = n;
                }
            }
        }
        return b;
    }
}
