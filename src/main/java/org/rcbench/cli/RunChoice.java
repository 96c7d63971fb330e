package org.rcbench.cli;

import org.rcbench.common.BadInputException;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.RunRecord;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The stored run a command is about: a run number ({@code RUN}) or {@code --last}. A picocli mixin:
 * {@code @Mixin RunChoice runs;}, then {@link #pick}.
 */
final class RunChoice {
    @Parameters(index = "0", arity = "0..1", paramLabel = "RUN", description = "Run number (see rcbench history).")
    Long run;

    @Option(names = "--last", description = "The run saved last.")
    boolean last;

    /** Whether a run number or {@code --last} was given. */
    boolean given() {
        return run != null || last;
    }

    /**
     * The run numbered {@code RUN}, or the last saved with {@code --last}.
     *
     * @throws BadInputException when neither or both are given, or there is no such run
     */
    RunRecord pick(HistoryStore store) {
        if ((run == null) == !last) {
            throw new BadInputException("", "give either a run number or --last");
        }
        if (last) {
            return store.last().orElseThrow(() -> new BadInputException(store.name(), "no runs stored yet"));
        }
        return store.run(run).orElseThrow(() -> new BadInputException(store.name(), "no run " + run + describe(store)));
    }

    private static String describe(HistoryStore store) {
        return store.last().map(r -> " (the last run stored is " + r.id() + ")").orElse(" (no runs stored yet)");
    }
}
