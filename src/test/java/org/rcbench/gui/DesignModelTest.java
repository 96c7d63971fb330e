package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.tolerance.Predictor;
import org.rcbench.units.Tolerance;

/** Loading and editing a design, and the expectation that follows every accepted edit. */
class DesignModelTest {
    private static final Path PIPER = Path.of("captures", "piper-mk2.toml");

    private static DesignModel loaded(ExpectationSource source) {
        DesignModel m = new DesignModel(source, Runnable::run);
        m.load(PIPER);
        m.poll();
        return m;
    }

    @Test
    void theTableShowsEveryPartAsTheFileGivesIt() {
        DesignModel m = loaded(new NominalExpectations());
        assertThat(m.parts()).extracting(PartRow::designator).containsExactly("R1", "R2", "C1", "C2");
        PartRow c1 = m.parts().get(2);
        assertThat(c1.role()).isEqualTo("timing");
        assertThat(c1.kindProperty().get()).isEqualTo("polyester");
        assertThat(c1.valueProperty().get()).isEqualTo("100 nF");
        assertThat(c1.toleranceProperty().get()).isEqualTo("±5%");
        assertThat(m.titleProperty().get()).isEqualTo("Piper Mk2 — astable, bipolar, 9 V");
    }

    @Test
    void anEditedValueGivesTheModelsNewNominal() {
        DesignModel m = loaded(new NominalExpectations());
        m.edit("C1", DesignModel.Field.VALUE, "68n");
        m.poll();
        Design expected = DesignReader.read(PIPER).withValue("C1", 68e-9);
        double f = TimerModels.build(expected.circuit()).evaluateNominal().frequencyHz();
        assertThat(m.expectation().of(TimingQuantity.FREQUENCY).nominal()).isEqualTo(f);
        assertThat(m.titleProperty().get()).contains("(edited)");
    }

    @Test
    void aValueThatDoesNotReadLeavesTheDesignAndSaysWhy() {
        DesignModel m = loaded(new NominalExpectations());
        Design before = m.design();
        m.edit("R2", DesignModel.Field.VALUE, "10kk");
        assertThat(m.design()).isSameAs(before);
        assertThat(m.parts().get(1).problemProperty().get()).isNotEmpty();
        assertThat(m.problemProperty().get()).startsWith("R2 value: ");
        assertThat(m.parts().get(1).valueProperty().get()).isEqualTo("10kk");
        m.edit("R2", DesignModel.Field.VALUE, "12k");
        assertThat(m.problemProperty().get()).isEmpty();
        assertThat(m.design().part("R2").value()).isEqualTo(12e3);
    }

    @Test
    void aWiderToleranceWidensTheBandAsTheTolerancePredictorSays() {
        DesignModel m = loaded(new PredictedExpectations(4000));
        Expected before = m.expectation().of(TimingQuantity.FREQUENCY);
        m.edit("C1", DesignModel.Field.TOLERANCE, "20%");
        m.poll();
        Expected after = m.expectation().of(TimingQuantity.FREQUENCY);
        assertThat(after.worstHigh() - after.worstLow()).isGreaterThan(before.worstHigh() - before.worstLow());
        // The same numbers the tolerance stage gives for the same edited design.
        Design edited = m.design();
        assertThat(edited.spread("C1").tolerance()).isEqualTo(Tolerance.symmetric(0.20));
        var p = new Predictor().withDraws(4000).predict(edited);
        assertThat(after.worstLow()).isEqualTo(p.worstCase(TimingQuantity.FREQUENCY).low());
        assertThat(after.statHigh()).isEqualTo(p.statistical(TimingQuantity.FREQUENCY).high());
    }

    @Test
    void aKindMustFitThePart() {
        DesignModel m = loaded(new NominalExpectations());
        m.edit("C1", DesignModel.Field.KIND, "metal-film");
        assertThat(m.problemProperty().get()).contains("not a kind of capacitor");
        m.edit("C1", DesignModel.Field.KIND, "y5v");
        assertThat(m.problemProperty().get()).isEmpty();
        assertThat(m.design().part("C1").kind().fileName()).isEqualTo("y5v");
    }

    @Test
    void aBadFileKeepsTheLoadedDesign() {
        DesignModel m = loaded(new NominalExpectations());
        Design before = m.design();
        m.load(Path.of("captures", "no-such-design.toml"));
        assertThat(m.design()).isSameAs(before);
        assertThat(m.problemProperty().get()).isEqualTo("design not loaded: captures/no-such-design.toml: no such file");
    }

    @Test
    void anOlderPredictionNeverOverwritesANewerOne() {
        java.util.List<Runnable> queued = new java.util.ArrayList<>();
        DesignModel m = new DesignModel(new NominalExpectations(), queued::add);
        m.load(PIPER);
        m.edit("C1", DesignModel.Field.VALUE, "47n");
        // Run the newest job first, then the stale one: the stale one must be skipped.
        queued.get(1).run();
        queued.get(0).run();
        m.poll();
        double f = TimerModels.build(DesignReader.read(PIPER).withValue("C1", 47e-9).circuit()).evaluateNominal()
                .frequencyHz();
        assertThat(m.expectation().of(TimingQuantity.FREQUENCY).nominal()).isEqualTo(f);
    }
}
