package org.rcbench.history;

import java.time.Instant;

/**
 * One line of the run list.
 *
 * @param id          the run's number
 * @param recordedAt  when the check ran
 * @param board       board name
 * @param serial      unit serial, or null
 * @param verdict     {@code pass}, {@code marginal}, {@code fail} or {@code stopped}
 * @param frequencyHz measured frequency, or NaN when the run has none
 * @param topSuspect  the most probable suspect's part, or null
 * @param note        the operator's note, or null
 */
public record RunSummary(long id, Instant recordedAt, String board, String serial, String verdict,
        double frequencyHz, String topSuspect, String note) {
}
