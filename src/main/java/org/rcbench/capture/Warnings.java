package org.rcbench.capture;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The non-fatal problems of one capture, each {@code file:line: what}, kept to the first
 * {@value #MAX} so a file full of them cannot fill the memory. Not thread-safe.
 */
final class Warnings {
    static final int MAX = 100;

    private final List<String> kept = new ArrayList<>();
    private long dropped;
    private String lastDroppedWhere;

    void add(String where, String what) {
        if (kept.size() < MAX) {
            kept.add(where + ": " + what);
        } else {
            dropped++;
            lastDroppedWhere = where;
        }
    }

    /** The warnings so far; past {@value #MAX}, one more line says how many were left out. */
    List<String> list() {
        if (dropped == 0) {
            return Collections.unmodifiableList(kept);
        }
        List<String> all = new ArrayList<>(kept);
        all.add(lastDroppedWhere + ": " + dropped + " more warnings not shown (the last is on this line)");
        return Collections.unmodifiableList(all);
    }
}
