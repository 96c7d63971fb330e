package org.rcbench.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;

/** The {@code --fault NAME=VALUE} syntax, against the Piper Mk2 design (R1 1k0, R2 10k, C1 100n, 9 V). */
class DeviationTest {
    static final Design PIPER = DesignReader.read(Path.of("captures/piper-mk2.toml"));
    static final TimerModel MODEL = TimerModels.build(PIPER.circuit());

    static double resolved(String text) {
        double[] p = MODEL.nominal();
        Deviation.Resolved r = Deviation.parse(text).resolve(MODEL.parameters(), p, PIPER.title());
        return r.value();
    }

    static int index(String name) {
        return MODEL.parameters().index(name);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "C1=-35%      | C1            | 65e-9",
        "C1 = +10 %   | C1            | 110e-9",
        "C1=68n       | C1            | 68e-9",
        "C1=68 nF     | C1            | 68e-9",
        "R2=12k       | R2            | 12e3",
        "R2=4k7       | R2            | 4.7e3",
        "R1=1.5 kΩ    | R1            | 1.5e3",
        "leak=1M      | leak          | 1e6",
        "control=4k7  | control.ohms  | 4.7e3",
        "supply=7.2V  | supply        | 7.2",
        "supply=-20%  | supply        | 7.2",
        "supply=7.2   | supply        | 7.2",
    })
    void readsChangesAndValuesInTheParametersUnit(String text, String parameter, double value) {
        double[] p = MODEL.nominal();
        Deviation.Resolved r = Deviation.parse(text).resolve(MODEL.parameters(), p, PIPER.title());
        assertThat(r.index()).isEqualTo(index(parameter));
        assertThat(r.value()).isCloseTo(value, within(Math.abs(value) * 1e-12));
    }

    @Test
    void openRemovesAResistance() {
        assertThat(resolved("leak=open")).isInfinite();
        assertThat(resolved("control=open")).isInfinite();
    }

    @Test
    void percentagesAreRelativeToTheDesignNotToEachOther() {
        SimulationSpec spec = SimulationSpec.defaults().withDeviation(Deviation.parse("C1=-10%"))
                .withDeviation(Deviation.parse("C1=-35%"));
        VirtualBoard b = VirtualBoard.of(PIPER, spec);
        assertThat(b.parameters()[index("C1")]).isCloseTo(65e-9, within(1e-18));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "C1-35%      | --fault: \"C1-35%\": is not NAME=VALUE (e.g. C1=-35%, R2=12k, leak=1M)",
        "=12k        | --fault: \"=12k\": names no part or parameter before '='",
        "C1=         | --fault: \"C1=\": gives no value after '='",
        "C1=35%      | --fault: \"C1=35%\": write a change with its sign, e.g. -35% or +10%",
        "C1=-1x%     | --fault: \"C1=-1x%\": \"-1x%\" is not a percentage",
        "C1=-100%    | --fault: \"C1=-100%\": a change of -100% leaves nothing of the part",
        "C 1=10n     | --fault: \"C 1=10n\": \"C 1\" is not a part designator or parameter name",
    })
    void syntaxErrorsAreOneLineQuotingTheText(String text, String message) {
        assertThatThrownBy(() -> Deviation.parse(text)).isInstanceOf(BadInputException.class).hasMessage(message);
    }

    @Test
    void unknownNamesListWhatTheDesignHas() {
        assertThatThrownBy(() -> resolved("C7=-35%")).isInstanceOf(BadInputException.class)
                .hasMessage("--fault: \"C7=-35%\": Piper Mk2 has no part or parameter \"C7\" (parts: R1, R2, C1,"
                        + " C2; also leak, control, supply, family.*)");
    }

    @Test
    void badValuesNameTheQuantity() {
        assertThatThrownBy(() -> resolved("C1=68q")).isInstanceOf(BadInputException.class)
                .hasMessageStartingWith("--fault: \"C1=68q\": \"68q\" is not a capacitance");
        assertThatThrownBy(() -> resolved("leak=-10%")).isInstanceOf(BadInputException.class)
                .hasMessage("--fault: \"leak=-10%\": leak is not connected in Piper Mk2; give a value"
                        + " (e.g. leak=1M) instead of a percentage");
        assertThatThrownBy(() -> resolved("R2=0")).isInstanceOf(BadInputException.class)
                .hasMessage("--fault: \"R2=0\": the value must be above zero");
        assertThatThrownBy(() -> resolved("C1=open")).isInstanceOf(BadInputException.class)
                .hasMessage("--fault: \"C1=open\": only a resistance can be open");
    }

    @Test
    void programmaticDeviationsRoundTripThroughTheirText() {
        assertThat(Deviation.parse(Deviation.relative("C1", -0.25).toString()).relative())
                .isCloseTo(-0.25, within(1e-12));
        assertThat(Deviation.parse(Deviation.absolute("R2", 12000).toString()).valueText()).isEqualTo("12000");
        assertThat(Deviation.absolute(ParameterTable.LEAK, Double.POSITIVE_INFINITY).toString()).isEqualTo("leak=open");
    }
}
