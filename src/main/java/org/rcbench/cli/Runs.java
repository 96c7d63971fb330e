package org.rcbench.cli;

import org.rcbench.common.BadInputException;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.RunRecord;

/** Picks the run a command names: a run number or {@code --last}. Stateless. */
final class Runs {
    private Runs() {
    }

    /**
     * The run numbered {@code run}, or the last saved when {@code last}.
     *
     * @throws BadInputException when neither or both are given, or there is no such run
     */
    static RunRecord pick(HistoryStore store, Long run, boolean last) {
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
