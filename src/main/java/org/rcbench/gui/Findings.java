package org.rcbench.gui;

import java.util.List;
import java.util.Objects;

/**
 * What the diagnosis says about the board now, in the words the suspects panel shows. Immutable.
 *
 * @param verdict     overall verdict in words, e.g. {@code fail: frequency outside the worst case}
 * @param suspects    ranked, most probable first
 * @param ambiguities plain-language statements of what the data cannot separate
 * @param resolvers   the extra measurements that would separate them
 */
public record Findings(String verdict, List<Suspect> suspects, List<String> ambiguities, List<String> resolvers) {
    public Findings {
        Objects.requireNonNull(verdict, "verdict");
        suspects = List.copyOf(suspects);
        ambiguities = List.copyOf(ambiguities);
        resolvers = List.copyOf(resolvers);
    }
}
