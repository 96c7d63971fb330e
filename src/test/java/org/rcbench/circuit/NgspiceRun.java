package org.rcbench.circuit;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/** Runs one netlist through {@code ngspice -b} and reads the {@code name = value} lines it prints. */
final class NgspiceRun {
    private NgspiceRun() {
    }

    static Map<String, Double> run(Path ngspice, String netlist) throws IOException, InterruptedException {
        Path dir = Files.createTempDirectory("rcbench-spice");
        Path cir = dir.resolve("circuit.cir");
        Files.writeString(cir, netlist, StandardCharsets.UTF_8);
        Path log = dir.resolve("out.txt");
        Process proc = new ProcessBuilder(ngspice.toString(), "-b", cir.toString())
                .redirectErrorStream(true).redirectOutput(log.toFile()).start();
        if (!proc.waitFor(120, TimeUnit.SECONDS)) {
            proc.destroyForcibly();
            throw new IOException("ngspice timed out on\n" + netlist);
        }
        String out = Files.readString(log, StandardCharsets.UTF_8);
        Map<String, Double> values = new HashMap<>();
        for (String line : out.split("\n")) {
            int eq = line.indexOf('=');
            if (eq <= 0) {
                continue;
            }
            String name = line.substring(0, eq).strip().toLowerCase(Locale.ROOT);
            String rest = line.substring(eq + 1).strip();
            int space = rest.indexOf(' ');
            String number = space < 0 ? rest : rest.substring(0, space);
            try {
                values.put(name, Double.parseDouble(number));
            } catch (NumberFormatException ignored) {
                // Not a value line (ngspice prints other "a = b" text too).
            }
        }
        Files.deleteIfExists(cir);
        Files.deleteIfExists(log);
        Files.deleteIfExists(dir);
        values.put("_exit", (double) proc.exitValue());
        return values;
    }
}
