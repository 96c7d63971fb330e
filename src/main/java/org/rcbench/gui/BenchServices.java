package org.rcbench.gui;

import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

/**
 * The stages the window calls, gathered so tests can replace any of them. The optional ones are
 * null when the window is not given them; it then says so instead of showing anything made up.
 *
 * @param sources      makes live sources
 * @param expectations predicted values and bands for a design
 * @param diagnosis    names suspects (null: not available)
 * @param tuning       potentiometer guide (null: not available)
 * @param checks       saves checks to the history (null: not available)
 * @param worker       runs predictions, diagnoses and tuning off the window's thread
 */
public record BenchServices(SourceFactory sources, ExpectationSource expectations, DiagnosisSource diagnosis,
        TuningSource tuning, CheckSaver checks, Executor worker) {
    public BenchServices {
        Objects.requireNonNull(sources, "sources");
        Objects.requireNonNull(expectations, "expectations");
        Objects.requireNonNull(worker, "worker");
    }

    /**
     * Shared sources without stored calibrations, bands from the tolerance stage, suspects and the
     * trimmer guide from the diagnosis stage, one daemon worker thread; no history (add one with
     * {@link #withChecks}).
     */
    public static BenchServices standard() {
        return new BenchServices(Sources.standard(org.rcbench.probe.CalibrationStore.none()),
                new PredictedExpectations(), new BackSolverFindings(), new BackSolverTuning(), null, newWorker());
    }

    /** One daemon thread named {@code rcbench-gui-worker}. */
    public static ExecutorService newWorker() {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "rcbench-gui-worker");
            t.setDaemon(true);
            return t;
        });
    }

    public BenchServices withSources(SourceFactory s) {
        return new BenchServices(s, expectations, diagnosis, tuning, checks, worker);
    }

    public BenchServices withExpectations(ExpectationSource e) {
        return new BenchServices(sources, e, diagnosis, tuning, checks, worker);
    }

    public BenchServices withDiagnosis(DiagnosisSource d) {
        return new BenchServices(sources, expectations, d, tuning, checks, worker);
    }

    public BenchServices withTuning(TuningSource t) {
        return new BenchServices(sources, expectations, diagnosis, t, checks, worker);
    }

    public BenchServices withChecks(CheckSaver c) {
        return new BenchServices(sources, expectations, diagnosis, tuning, c, worker);
    }

    public BenchServices withWorker(Executor w) {
        return new BenchServices(sources, expectations, diagnosis, tuning, checks, w);
    }
}
