package org.rcbench.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.rcbench.common.BadInputException;
import org.rcbench.evidence.EvidenceTable;
import org.rcbench.evidence.Population;
import org.rcbench.evidence.PopulationStudy;
import org.rcbench.evidence.StandardPopulations;
import org.rcbench.evidence.StudyResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench evidence}: runs the standard populations of simulated boards through the
 * diagnosis and prints how often the top suspect is the faulty part, how often the answer is
 * ambiguous, and how often it is confidently wrong.
 */
@Command(name = "evidence", mixinStandardHelpOptions = true,
        description = {"Evidence for the diagnosis: seeded populations of simulated boards (one part out of tolerance,"
            + " the rest inside it) measured and diagnosed, per topology.",
            "Prints the rate of correct top suspects, of ambiguous answers and of confidently wrong ones."})
public final class EvidenceCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--boards", paramLabel = "N", defaultValue = "200", description = "Boards per population (default: ${DEFAULT-VALUE}).")
    int boards;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--min-multiple", paramLabel = "M", defaultValue = "3",
            description = "Smallest fault in multiples of the part's tolerance (default: ${DEFAULT-VALUE}).")
    double minMultiple;

    @Option(names = "--max-multiple", paramLabel = "M", defaultValue = "6",
            description = "Largest fault in multiples of the part's tolerance (default: ${DEFAULT-VALUE}).")
    double maxMultiple;

    @Option(names = "--only", paramLabel = "TEXT", description = "Only the populations whose name contains TEXT.")
    String only;

    @Override
    public Integer call() {
        if (boards < 1) {
            throw new BadInputException("--boards", "must be 1 or more, not " + boards);
        }
        if (!(minMultiple > 0) || !(maxMultiple >= minMultiple) || Double.isInfinite(maxMultiple)) {
            throw new BadInputException("--min-multiple", "need 0 < min <= max, not " + minMultiple + " and " + maxMultiple);
        }
        PrintWriter out = spec.commandLine().getOut();
        out.print(EvidenceTable.header());
        int shown = 0;
        for (StandardPopulations.Entry e : StandardPopulations.all()) {
            if (only != null && !e.population().name().toLowerCase(Locale.ROOT).contains(only.toLowerCase(Locale.ROOT))) {
                continue;
            }
            Population p = e.population().withBoards(boards).withSeed(seed).withFaultRange(minMultiple, maxMultiple);
            StudyResult r = PopulationStudy.run(p);
            boolean standard = minMultiple == 3 && maxMultiple == 6;
            out.print(EvidenceTable.rows(r, standard ? e.goal() : null));
            out.flush();
            shown++;
        }
        if (shown == 0) {
            throw new BadInputException("--only", "no population's name contains \"" + only + "\"");
        }
        out.println();
        for (String n : EvidenceTable.notes()) {
            out.println(n);
        }
        out.flush();
        return ExitCodes.OK;
    }
}
