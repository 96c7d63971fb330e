package org.rcbench.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.rcbench.common.BadInputException;
import org.rcbench.history.CheckContent.Measured;
import org.rcbench.history.CheckDocument;
import org.rcbench.history.HistoryStore;
import org.rcbench.report.CsvWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code rcbench export measurements RUN|--last|--from-json FILE}: measured quantities as CSV. */
@Command(name = "measurements", mixinStandardHelpOptions = true,
        description = {"Write the measurements of a stored run as CSV.",
            "Columns: quantity, value, uncertainty (expanded), unit, coverage_factor.",
            "--from-json reads the output of rcbench measure --json or check --json instead of the history."})
public final class ExportMeasurementsCommand implements Callable<Integer> {
    /** The header record. */
    public static final String[] HEADER = {"quantity", "value", "uncertainty", "unit", "coverage_factor"};

    @Spec
    CommandSpec spec;

    @Mixin
    RunChoice runs;

    @Option(names = "--from-json", paramLabel = "FILE",
            description = "Read the output of rcbench measure --json or check --json (- for stdin) instead of the history.")
    Path fromJson;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write to FILE instead of stdout.")
    Path output;

    @Mixin
    DatabaseOption database;

    @Override
    public Integer call() throws Exception {
        List<Measured> rows;
        if (fromJson != null) {
            if (runs.given()) {
                throw new BadInputException("--from-json", "give either a run or --from-json, not both");
            }
            rows = CheckDocument.measurementsOf(read(fromJson));
        } else {
            try (HistoryStore store = database.openExisting(spec.commandLine().getErr())) {
                rows = runs.pick(store).content().measurements();
            }
        }
        PrintWriter out = spec.commandLine().getOut();
        OutputFile.text(output, out, w -> {
            CsvWriter csv = new CsvWriter(w);
            csv.row(HEADER);
            for (Measured m : rows) {
                csv.field(m.quantity()).field(m.value()).field(m.uncertainty()).field(m.unit()).field(m.coverage()).end();
            }
            csv.flush();
        });
        return ExitCodes.OK;
    }

    private static JsonNode read(Path file) throws java.io.IOException {
        String text;
        try {
            text = file.toString().equals("-") ? new String(System.in.readAllBytes(), StandardCharsets.UTF_8)
                    : Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new BadInputException(file.toString(), "no such file", e);
        }
        try {
            return new ObjectMapper().readTree(text);
        } catch (JsonProcessingException e) {
            String where = file.toString().equals("-") ? "stdin" : file.toString();
            throw new BadInputException(where + ":" + e.getLocation().getLineNr(), "not JSON: " + e.getOriginalMessage(), e);
        }
    }
}
