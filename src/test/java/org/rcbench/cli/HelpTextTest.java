package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.reflect.Field;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.parallel.Isolated;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.rcbench.testing.CliRun;
import picocli.CommandLine;

/**
 * {@code --help} of every command: exit 0, the usage on stdout, nothing on stderr, and no warning
 * from picocli (which prints its own warnings, e.g. for an unescaped {@code %} in a description, on
 * the stream it captured when it was loaded, not on the command's stderr: the test swaps that stream).
 */
@Isolated
class HelpTextTest {

    /** Every command path below {@code rcbench}, e.g. {@code [export, cycles]}; the root too. */
    static Stream<List<String>> commands() {
        List<List<String>> out = new ArrayList<>();
        collect(Cli.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter())), new ArrayList<>(), out);
        return out.stream();
    }

    private static void collect(CommandLine cl, List<String> path, List<List<String>> out) {
        out.add(List.copyOf(path));
        for (var e : cl.getSubcommands().entrySet()) {
            if (e.getValue().getCommandName().equals(e.getKey())) { // skip aliases
                List<String> p = new ArrayList<>(path);
                p.add(e.getKey());
                collect(e.getValue(), p, out);
            }
        }
    }

    @ParameterizedTest
    @MethodSource("commands")
    void helpPrintsUsageWithoutAnyWarning(List<String> path) throws Exception {
        List<String> args = new ArrayList<>(path);
        args.add("--help");
        ByteArrayOutputStream traced = new ByteArrayOutputStream();
        CliRun run;
        Field stream = CommandLine.Tracer.class.getDeclaredField("stream");
        stream.setAccessible(true);
        Object before = stream.get(CommandLine.tracer());
        stream.set(CommandLine.tracer(), new PrintStream(traced, true, StandardCharsets.UTF_8));
        try {
            run = CliRun.of(args.toArray(String[]::new));
        } finally {
            stream.set(CommandLine.tracer(), before);
        }
        String name = String.join(" ", path);
        assertThat(run.exitCode()).as(name).isZero();
        assertThat(run.err()).as(name).isEmpty();
        assertThat(traced.toString(StandardCharsets.UTF_8)).as(name).isEmpty();
        assertThat(run.out()).as(name).startsWith("Usage: rcbench" + (path.isEmpty() ? "" : " " + name));
        // Help conventions: a percent sign shows once; defaults read "(default: ...)".
        assertThat(run.out()).as(name).doesNotContain("%%").doesNotContainPattern("\\(default [^:]");
        // No description line stops half-way through a sentence (a comma where a line was split by hand).
        CommandLine cl = Cli.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
        for (String p : path) {
            cl = cl.getSubcommands().get(p);
        }
        assertThat(cl.getCommandSpec().usageMessage().description()).as(name).noneMatch(l -> l.strip().endsWith(","));
    }
}
