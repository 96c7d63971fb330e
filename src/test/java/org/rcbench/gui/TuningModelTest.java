package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Element;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.ProbeOptions;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.source.SourceSpec;

/** The trimmer guide on the simulated Lumen DM-1 dimmer, whose wiper the simulation has moved. */
class TuningModelTest {
    private static final Design LUMEN = DesignReader.read(Path.of("captures", "lumen-dm1.toml"));

    private BenchModel model;

    @AfterEach
    void close() {
        if (model != null) {
            model.close();
        }
    }

    @Test
    void theGuideFindsTheWiperAndWhereItMustGo() throws Exception {
        // The board's wiper sits at 0.70 (the design says 0.5).
        SourceSpec spec = new SourceSpec.Simulated("lumen", LUMEN, Double.NaN, SimulationSpec.defaults()
                .withDeviation(Deviation.parse("VR1.wiper=0.7")).withJitterSeconds(50e-9).withSeed(8),
                ProbeOptions.defaults());
        model = new BenchModel(BenchServices.standard().withExpectations(new NominalExpectations())
                .withWorker(Runnable::run), BenchSettings.inMemory(true), 5_000_000L);
        model.choose(SourceChoice.simulated("lumen", "").withExact(spec));
        model.start();
        TuningModel t = model.tuning();
        assertThat(ModelDriver.pollUntil(model, () -> t.applicableProperty().get(), Duration.ofSeconds(10))).isTrue();
        assertThat(t.partProperty().get()).isEqualTo("VR1");

        t.setQuantity(TimingQuantity.DUTY);
        t.setTarget("30 %");
        assertThat(t.target()).isEqualTo(0.30);
        assertThat(ModelDriver.pollUntil(model, () -> Double.isFinite(t.wantedProperty().get()), Duration.ofSeconds(15)))
                .isTrue();

        // The simulation's truth: the wiper is at 0.70.
        assertThat(t.presentProperty().get()).isCloseTo(0.70, within(0.02));
        // The circuit model at the wanted position gives the target (all other parts at nominal, as simulated).
        Element vr1 = LUMEN.part("VR1");
        Design moved = LUMEN.withCircuit(LUMEN.circuit().withElements(LUMEN.circuit().elements().stream()
                .map(e -> e == vr1 ? e.withWiper(t.wantedProperty().get()) : e).toList()));
        double duty = TimerModels.build(moved.circuit()).evaluateNominal().duty();
        assertThat(duty).isCloseTo(0.30, within(0.005));
        assertThat(t.adviceProperty().get()).contains("VR1").contains("0.70");
    }

    @Test
    void aDesignWithoutAPotHasNoGuide() throws Exception {
        model = new BenchModel(BenchServices.standard().withExpectations(new NominalExpectations())
                .withWorker(Runnable::run), BenchSettings.inMemory(true));
        model.loadDesign(Path.of("captures", "piper-mk2.toml"));
        assertThat(model.tuning().applicableProperty().get()).isFalse();
        model.loadDesign(Path.of("captures", "lumen-dm1.toml"));
        assertThat(model.tuning().applicableProperty().get()).isTrue();
        assertThat(model.tuning().choices(model.design().design())).contains(TimingQuantity.DUTY);
    }
}
