package org.rcbench.architecture;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The layering DEVELOPERS.md promises, checked on the sources: the analysis core imports only
 * {@code java.*}, Commons Math and other core packages; jSerialComm appears in one package only.
 * (A project rule, not a computation: no outside source applies.)
 */
class LayeringTest {
    private static final Path MAIN = Path.of("src/main/java/org/rcbench");

    @ParameterizedTest
    @CsvSource({
        "common, ''", "units, ''", "edge, ''", "stability, ''", "capture, ''", "measure, ''",
        "circuit, ''", "tolerance, org.apache.commons.math3.", "picker, org.apache.commons.math3.",
        "diagnose, org.apache.commons.math3.", "design, com.fasterxml.jackson.",
        "protocol, ''", "probe, ''", "sim, ''", "evidence, ''"})
    void corePackagesImportOnlyJavaCommonsMathAndTheCore(String pkg, String allowedExtra) throws IOException {
        List<String> foreign = new ArrayList<>();
        for (String imp : imports(MAIN.resolve(pkg))) {
            boolean ok = imp.startsWith("java.") || imp.startsWith("org.rcbench.")
                    || (!allowedExtra.isEmpty() && imp.startsWith(allowedExtra));
            boolean outerLayer = imp.startsWith("org.rcbench.cli") || imp.startsWith("org.rcbench.gui")
                    || imp.startsWith("org.rcbench.serial") || imp.startsWith("org.rcbench.history")
                    || imp.startsWith("org.rcbench.report") || imp.startsWith("org.rcbench.json");
            if (!ok || outerLayer) {
                foreign.add(imp);
            }
        }
        assertThat(foreign).as("imports of " + pkg).isEmpty();
    }

    @Test
    void jSerialCommIsImportedInTheSerialPackageOnly() throws IOException {
        List<String> users = new ArrayList<>();
        try (Stream<Path> files = Files.walk(MAIN)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                if (Files.readString(f, StandardCharsets.UTF_8).contains("com.fazecast")
                        && !f.getParent().endsWith("serial")) {
                    users.add(f.toString());
                }
            }
        }
        assertThat(users).isEmpty();
    }

    private static List<String> imports(Path dir) throws IOException {
        List<String> out = new ArrayList<>();
        assertThat(Files.isDirectory(dir)).as(dir + " exists").isTrue();
        try (Stream<Path> files = Files.walk(dir)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                for (String line : Files.readAllLines(f, StandardCharsets.UTF_8)) {
                    String t = line.strip();
                    if (t.startsWith("import ")) {
                        out.add(t.replace("import static ", "").replace("import ", "").replace(";", ""));
                    }
                }
            }
        }
        return out;
    }
}
