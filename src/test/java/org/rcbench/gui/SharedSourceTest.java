package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.Optional;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.probe.CalibrationStore;
import org.rcbench.probe.StoredCalibration;
import org.rcbench.sim.LinkFaults;
import org.rcbench.sim.ProbeOptions;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.source.SourceSpec;

/** The shared live sources as the window's source: the simulated board on its simulated probe. */
class SharedSourceTest {
    private static final Design PIPER = DesignReader.read(Path.of("captures", "piper-mk2.toml"));
    private static final String SIM_PROBE = String.format("%016x", ProbeOptions.DEFAULT_PROBE_ID);

    private BenchModel model;

    @AfterEach
    void close() {
        if (model != null) {
            model.close();
        }
    }

    private BenchModel start(CalibrationStore store, ProbeOptions probe) throws InterruptedException {
        SourceSpec spec = new SourceSpec.Simulated("piper", PIPER, Double.NaN,
                SimulationSpec.defaults().withJitterSeconds(100e-9).withSeed(5), probe);
        model = new BenchModel(BenchServices.standard().withSources(Sources.standard(store))
                .withExpectations(new NominalExpectations()).withWorker(Runnable::run),
                BenchSettings.inMemory(true), 5_000_000L);
        model.choose(SourceChoice.simulated("piper", "").withExact(spec));
        model.start();
        assertThat(ModelDriver.pollUntil(model, () -> model.statusProperty().get().state() == ConnectionState.STREAMING
                && model.frameProperty().get() != null, Duration.ofSeconds(10))).isTrue();
        return model;
    }

    @Test
    void theSimulatedProbeIntroducesItselfAndAnUnplugShowsAsAGap() throws Exception {
        start(CalibrationStore.none(), ProbeOptions.defaults().withFaults(LinkFaults.none().withUnplug(0.6, 0.4)));
        SourceStatus s = model.statusProperty().get();
        assertThat(s.probeId()).isEqualTo(SIM_PROBE);
        assertThat(s.probe()).startsWith("probe " + SIM_PROBE + " \"rcbench-sim\" fw ");
        assertThat(s.clock()).startsWith("clock not calibrated (crystal, about ±50 ppm)");
        assertThat(model.design().design()).isSameAs(PIPER);

        assertThat(ModelDriver.pollUntil(model, () -> model.statusProperty().get().state()
                == ConnectionState.RECONNECTING, Duration.ofSeconds(10))).isTrue();
        assertThat(ModelDriver.pollUntil(model, () -> model.statusProperty().get().state() == ConnectionState.STREAMING
                && model.statusProperty().get().gaps() >= 1, Duration.ofSeconds(10))).isTrue();
        assertThat(model.runningProperty().get()).isTrue();
        assertThat(model.frameProperty().get().measurement().irregularities().gaps()).isGreaterThanOrEqualTo(1);
    }

    @Test
    void aStoredCalibrationOfTheProbeIsApplied() throws Exception {
        CalibrationStore store = new CalibrationStore() {
            @Override
            public void save(StoredCalibration calibration) {
                throw new UnsupportedOperationException();
            }

            @Override
            public Optional<StoredCalibration> latest(String probeIdHex) {
                return probeIdHex.equals(SIM_PROBE)
                        ? Optional.of(new StoredCalibration(SIM_PROBE, 12.5, 0.4, "1 Hz reference", Instant.EPOCH))
                        : Optional.empty();
            }
        };
        start(store, ProbeOptions.defaults());
        assertThat(model.frameProperty().get().timebase().offsetPpm()).isEqualTo(12.5);
        assertThat(model.frameProperty().get().timebase().tolerancePpm()).isEqualTo(0.4);
        assertThat(model.statusProperty().get().clock()).contains("against 1 Hz reference").contains("+12.500 ppm");
    }
}
