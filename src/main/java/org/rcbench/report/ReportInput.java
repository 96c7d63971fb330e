package org.rcbench.report;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import org.rcbench.history.ProbeCalibration;
import org.rcbench.history.RunRecord;
import org.rcbench.history.TrendAnalysis;

/**
 * Everything a report shows: the run, the trends of this unit's parts over its stored runs, the
 * latest calibration on record for the run's probe, and when and by which version it was made.
 *
 * @param run         the stored run
 * @param partHistory trend of each estimated part of the same unit (may be empty)
 * @param calibration latest stored calibration of the run's probe, or null
 * @param generatedAt when the report is made
 * @param version     rcbench version text
 */
public record ReportInput(RunRecord run, List<TrendAnalysis> partHistory, ProbeCalibration calibration,
        Instant generatedAt, String version) {
    public ReportInput {
        Objects.requireNonNull(run, "run");
        partHistory = List.copyOf(partHistory);
        Objects.requireNonNull(generatedAt, "generatedAt");
        Objects.requireNonNull(version, "version");
    }
}
