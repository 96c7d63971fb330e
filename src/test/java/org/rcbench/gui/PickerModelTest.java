package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.picker.PartPicker;

/** The part-picking helper: the picker's candidates for the design's topology, taken into the design. */
class PickerModelTest {
    private static final Path PIPER = Path.of("captures", "piper-mk2.toml");

    @Test
    void candidatesAreThePickersAndOneCanBeTakenIntoTheDesign() {
        DesignModel design = new DesignModel(new NominalExpectations(), Runnable::run);
        design.load(PIPER);
        PickerModel picker = new PickerModel(design, Runnable::run);
        assertThat(picker.targetsFor(design.design())).containsExactly("frequency", "duty");

        picker.find(List.of("700 Hz", "60 %"));
        picker.poll();

        PartPicker.Result direct = PartPicker.pick(PickerModel.request(design.design(), List.of("700 Hz", "60 %")));
        assertThat(picker.options()).extracting(PickerModel.Option::parts)
                .containsExactlyElementsOf(direct.candidates().stream().map(c -> c.parts()).toList());
        PickerModel.Option first = picker.options().get(0);
        Design picked = first.candidate().design();

        picker.apply(first);
        design.poll();

        Design now = design.design();
        assertThat(now.title()).isEqualTo("Piper Mk2");
        assertThat(now.part("C2").value()).isEqualTo(10e-9); // untouched
        for (String d : List.of("R1", "R2", "C1")) {
            assertThat(now.part(d).value()).as(d).isEqualTo(picked.part(d).value());
            assertThat(now.spread(d).tolerance()).as(d).isEqualTo(picked.spread(d).tolerance());
        }
        assertThat(design.titleProperty().get()).contains("(edited)");
        double f = design.expectation().of(TimingQuantity.FREQUENCY).nominal();
        assertThat(f).isCloseTo(first.candidate().prediction().nominal(TimingQuantity.FREQUENCY),
                org.assertj.core.data.Percentage.withPercentage(0.01));
    }

    @Test
    void aPlainAstableBelowHalfDutyIsRefusedWithThePickersReason() {
        DesignModel design = new DesignModel(new NominalExpectations(), Runnable::run);
        design.load(PIPER);
        PickerModel picker = new PickerModel(design, Runnable::run);
        picker.find(List.of("700 Hz", "30 %"));
        picker.poll();
        assertThat(picker.problemProperty().get()).contains("a plain astable runs above 50 % duty");
        assertThat(picker.options()).isEmpty();
    }

    @Test
    void aTargetThatDoesNotReadIsNamed() {
        DesignModel design = new DesignModel(new NominalExpectations(), Runnable::run);
        design.load(PIPER);
        PickerModel picker = new PickerModel(design, Runnable::run);
        picker.find(List.of("fast", "60 %"));
        assertThat(picker.problemProperty().get()).contains("fast");
        picker.find(List.of("", "60 %"));
        assertThat(picker.problemProperty().get()).isEqualTo("frequency: give a target");
    }
}
