package org.rcbench.firmware;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.edge.EdgeSink;
import org.rcbench.protocol.DecoderCounters;
import org.rcbench.protocol.FrameEncoder;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.protocol.StreamDecoder;
import org.rcbench.protocol.Wire;
import org.rcbench.testing.ExternalTool;

/** The reference firmware builds with avr-gcc, agrees with the Java constants, and its frame writer agrees with the decoder. */
class FirmwareBuildTest {
    static final Path AVR = Path.of("firmware-notes", "avr");

    record Run(int exit, String output) {
    }

    static Run run(Path dir, byte[] stdin, String... command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(stdin == null).start();
        if (stdin != null) {
            p.getOutputStream().write(stdin);
        }
        p.getOutputStream().close();
        byte[] out = p.getInputStream().readAllBytes();
        assertThat(p.waitFor(120, TimeUnit.SECONDS)).isTrue();
        return new Run(p.exitValue(), new String(out, StandardCharsets.ISO_8859_1));
    }

    @Test
    void makefileBuildsTheFirmwareForTheAtmega328p(@TempDir Path build) throws Exception {
        ExternalTool.require("avr-gcc", "gcc-avr");
        ExternalTool.require("make", "make");
        Run r = run(AVR, null, "make", "BUILD=" + build.toAbsolutePath());
        assertThat(r.exit()).as(r.output()).isZero();
        assertThat(build.resolve("probe.hex")).isNotEmptyFile();
        // avr-size: "text data bss dec hex filename"
        Matcher m = Pattern.compile("\\n\\s*(\\d+)\\s+(\\d+)\\s+(\\d+)\\s+\\d+\\s+\\w+\\s+\\S*probe\\.elf").matcher(r.output());
        assertThat(m.find()).as(r.output()).isTrue();
        long text = Long.parseLong(m.group(1));
        long ram = Long.parseLong(m.group(2)) + Long.parseLong(m.group(3));
        // ATmega328P: 32 KiB flash less a 512-byte bootloader, 2 KiB SRAM (datasheet); keep 512 bytes for the stack
        // (common practice, no source).
        assertThat(text).isLessThan(32 * 1024 - 512);
        assertThat(ram).isLessThan(2048 - 512);
    }

    @Test
    void headerConstantsEqualTheJavaOnes() throws Exception {
        Map<String, Long> header = new HashMap<>();
        Matcher m = Pattern.compile("(?m)^#define\\s+RCB_(\\w+)\\s+(0x[0-9A-Fa-f]+|\\d+)")
                .matcher(Files.readString(AVR.resolve("rcbench_protocol.h")));
        while (m.find()) {
            header.put(m.group(1), Long.decode(m.group(2)));
        }
        int compared = 0;
        for (Field f : Wire.class.getFields()) {
            if (Modifier.isStatic(f.getModifiers()) && f.getType() == int.class) {
                assertThat(header).as("header defines RCB_" + f.getName()).containsKey(f.getName());
                assertThat(header.get(f.getName())).as("RCB_" + f.getName()).isEqualTo((long) f.getInt(null));
                compared++;
            }
        }
        assertThat(compared).isGreaterThan(30);
    }

    @Test
    void overflowExtensionRuleHoldsInEveryInterruptOrdering(@TempDir Path build) throws Exception {
        // The rule from rcbench's platform notes (a pending overflow with a captured value below
        // 0x8000 belongs before the capture), checked by hostcheck/extend_check.c against a model
        // of Timer1 with the capture interrupt outranking the overflow interrupt (ATmega328P
        // datasheet, interrupt vector table: lower vectors have higher priority).
        Path gcc = ExternalTool.require("gcc", "gcc");
        Path exe = build.resolve("extend_check");
        Run compile = run(AVR, null, gcc.toString(), "-std=gnu99", "-O2", "-Wall", "-Wextra", "-Werror", "-o",
                exe.toAbsolutePath().toString(), "hostcheck/extend_check.c");
        assertThat(compile.exit()).as(compile.output()).isZero();
        Run check = run(build, null, exe.toAbsolutePath().toString());
        assertThat(check.exit()).as(check.output()).isZero();
        assertThat(Long.parseLong(check.output().trim().split(" ")[0])).isGreaterThan(1_000_000);
    }

    /** Decodes bytes into "tick channel level" calls and counters. */
    static List<String> decode(byte[] bytes, DecoderCounters[] counters) {
        List<String> calls = new ArrayList<>();
        StreamDecoder d = new StreamDecoder(new EdgeSink() {
            @Override
            public void onEdge(long tick, int channel, int level) {
                calls.add(tick + " " + channel + " " + (level == UNKNOWN ? "?" : Integer.toString(level)));
            }
        }, new ProbeEvents() { }, StreamDecoder.Mode.BINARY);
        d.feed(bytes);
        counters[0] = d.counters();
        return calls;
    }

    @Test
    void firmwareFrameWriterBuiltForTheHostAgreesWithTheDecoder(@TempDir Path build) throws Exception {
        Path gcc = ExternalTool.require("gcc", "gcc");
        Path exe = build.resolve("host_check");
        Run compile = run(AVR, null, gcc.toString(), "-std=gnu99", "-Wall", "-Wextra", "-Werror", "-o",
                exe.toAbsolutePath().toString(), "hostcheck/host_check.c", "frames.c");
        assertThat(compile.exit()).as(compile.output()).isZero();

        // One scenario, written once as the firmware's input and once through the Java encoder.
        Random random = new Random(328);
        StringBuilder scenario = new StringBuilder();
        ByteArrayOutputStream javaBytes = new ByteArrayOutputStream();
        FrameEncoder java = new FrameEncoder(javaBytes);
        long tick = Wire.TICK_MODULUS - 3_000_000; // crosses the 48-bit wrap early on
        long dropped = 0;
        int[] level = {1, 1};
        for (int i = 0; i < 5000; i++) {
            int ch = random.nextInt(5) == 0 ? 1 : 0;
            int r = random.nextInt(1000);
            long step = r < 900 ? 1 + random.nextInt(20_000) : r < 990 ? random.nextInt(5_000_000) : 1L << 30;
            tick += step;
            int drops = random.nextInt(300) == 0 ? 1 + random.nextInt(4) : 0;
            scenario.append("E ").append(Long.toUnsignedString(tick & (Wire.TICK_MODULUS - 1))).append(' ').append(ch)
                    .append(' ').append(level[ch]).append(' ').append(drops).append('\n');
            if (drops > 0) {
                dropped += drops;
                java.dropped(dropped);
            }
            java.edge(tick, ch, level[ch]);
            level[ch] ^= 1;
            if (random.nextInt(150) == 0) {
                scenario.append("F\n");
                java.flush();
            }
            if (random.nextInt(400) == 0) {
                tick += 4_000_000;
                int late = random.nextInt(3);
                scenario.append("B ").append(tick & (Wire.TICK_MODULUS - 1)).append(' ').append(late).append('\n');
                dropped += late;
                java.dropped(dropped);
                java.heartbeat(tick);
            }
        }
        java.flush();
        Run fw = run(build, scenario.toString().getBytes(StandardCharsets.US_ASCII), exe.toAbsolutePath().toString());
        assertThat(fw.exit()).isZero();

        DecoderCounters[] fromFirmware = new DecoderCounters[1];
        DecoderCounters[] fromJava = new DecoderCounters[1];
        List<String> firmwareCalls = decode(fw.output().getBytes(StandardCharsets.ISO_8859_1), fromFirmware);
        List<String> javaCalls = decode(javaBytes.toByteArray(), fromJava);
        assertThat(fromFirmware[0].crcErrors()).isZero();
        assertThat(fromFirmware[0].resyncs()).isZero();
        assertThat(fromFirmware[0].sequenceGaps()).isZero();
        assertThat(fromFirmware[0].malformed()).isZero();
        assertThat(fromFirmware[0].edges()).isEqualTo(5000);
        assertThat(fromFirmware[0].overruns()).isEqualTo(dropped).isPositive();
        assertThat(firmwareCalls).isEqualTo(javaCalls);
    }
}
