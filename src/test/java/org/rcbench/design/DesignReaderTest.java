package org.rcbench.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.circuit.ControlPin;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.TimerFamily;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.units.Tolerance;

class DesignReaderTest {
    static final String ASTABLE = String.join("\n",
            "[board]",
            "name = \"Test\"",
            "[timer]",
            "topology = \"astable\"",
            "family = \"bipolar\"",
            "supply = \"9 V\"",
            "[parts.R1]",
            "role = \"charge\"",
            "value = \"1k0\"",
            "tolerance = \"5%\"",
            "[parts.R2]",
            "role = \"shared\"",
            "value = \"10k\"",
            "tolerance = \"J\"",
            "[parts.C1]",
            "role = \"timing\"",
            "value = \"100n\"",
            "tolerance = \"+22/-82%\"",
            "kind = \"y5v\"",
            "");

    @Test
    void readsAnAstable() {
        Design d = DesignReader.parse(ASTABLE, "t.toml");
        assertThat(d.boardName()).isEqualTo("Test");
        assertThat(d.circuit().topology()).isEqualTo(Topology.ASTABLE);
        assertThat(d.circuit().family()).isEqualTo(TimerFamily.BIPOLAR);
        assertThat(d.circuit().supplyVolts()).isEqualTo(9);
        assertThat(d.part("R1").value()).isEqualTo(1000);
        assertThat(d.part("C1").value()).isCloseTo(100e-9, within(1e-20));
        assertThat(d.part("C1").kind()).isEqualTo(PartKind.Y5V);
        assertThat(d.spread("R2").tolerance()).isEqualTo(Tolerance.symmetric(0.05));
        assertThat(d.spread("C1").tolerance()).isEqualTo(new Tolerance(0.82, 0.22));
        assertThat(d.spread("C1").distribution()).isEqualTo(Distribution.RECTANGULAR);
        assertThat(d.circuit().control()).isEqualTo(ControlPin.open());
    }

    @Test
    void readsPotsDiodesControlAndFamilyOverrides() {
        String text = String.join("\n",
                "[timer]", "topology = \"pwm-pot\"", "family = \"cmos\"", "supply = 12", "ambient_c = [0, 50]",
                "[family]", "divider = \"80k\"", "delay = \"150 ns\"",
                "[control]", "pin = \"driven\"", "drive = \"7.5 V\"", "drive_ohms = \"1k\"",
                "[parts.R1]", "role = \"charge\"", "value = \"1k0\"", "tolerance = \"1%\"",
                "[parts.VR1]", "role = \"split-pot\"", "value = \"100k\"", "tolerance = \"20%\"", "wiper = \"25%\"",
                "[parts.D1]", "role = \"charge-diode\"", "kind = \"silicon\"",
                "[parts.D2]", "role = \"discharge-diode\"", "drop = \"0.3 V\"",
                "[parts.C1]", "role = \"timing\"", "value = \"4n7\"", "tolerance = \"5%\"", "kind = \"c0g\"", "");
        Design d = DesignReader.parse(text, "lumen.toml");
        assertThat(d.part("VR1").type()).isEqualTo(ElementType.POTENTIOMETER);
        assertThat(d.part("VR1").wiper()).isEqualTo(0.25);
        assertThat(d.part("D1").diode().currentDependent()).isTrue();
        assertThat(d.part("D2").diode().currentDependent()).isFalse();
        assertThat(d.part("D2").value()).isEqualTo(0.3);
        assertThat(d.circuit().control()).isEqualTo(ControlPin.driven(7.5, 1000));
        assertThat(d.circuit().familyParameters().dividerOhms()).isEqualTo(80e3);
        assertThat(d.circuit().familyParameters().delaySeconds()).isCloseTo(150e-9, within(1e-20));
        assertThat(d.circuit().familyParameters().outputHighOhms()).isEqualTo(TimerFamily.CMOS.defaults().outputHighOhms());
        assertThat(d.spread("C1").tempco()).isEqualTo(Tempco.C0G);
        assertThat(d.ambient()).isEqualTo(new Ambient(0, 50, 25));
    }

    @Test
    void aValueCodeMayCarryTheToleranceLetter() {
        Design d = DesignReader.parse(ASTABLE.replace("value = \"10k\"\ntolerance = \"J\"", "value = \"10KK\""), "t.toml");
        assertThat(d.spread("R2").tolerance()).isEqualTo(Tolerance.symmetric(0.10));
    }

    @Test
    void readsControlLoadPartsAsLoaded() {
        String text = ASTABLE + "[parts.R3]\nrole = \"control-load\"\nvalue = \"10k\"\ntolerance = \"5%\"\n";
        assertThat(DesignReader.parse(text, "t.toml").circuit().control().mode()).isEqualTo(ControlPin.Mode.LOADED);
        assertThat(DesignReader.parse(text, "t.toml").part("R3").role()).isEqualTo(Role.CONTROL_LOAD);
    }

    // Each bad file gives one line: file, line (when known), key path, what is wrong.
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "role = \"charge\"   | role = \"chrage\" | t.toml:8: parts.R1.role: unknown role \"chrage\" (one of charge, shared,",
        "value = \"1k0\"     | value = \"4k7k\"  | t.toml:9: parts.R1.value: \"4k7k\" is not a resistance",
        "value = \"1k0\"     | value = \"-4k7\"  | t.toml:9: parts.R1.value: \"-4k7\" is negative: a resistance must be above zero",
        "tolerance = \"5%\"  | tolerance = \"150%\" | t.toml:10: parts.R1.tolerance: \"150%\": tolerance over 100 %",
        "topology = \"astable\" | topology = \"astabel\" | t.toml:4: timer.topology: unknown topology \"astabel\"",
        "family = \"bipolar\" | family = \"nmos\" | t.toml:5: timer.family: unknown timer family \"nmos\" (bipolar or cmos)",
        "kind = \"y5v\"      | kind = \"y6v\"    | t.toml:19: parts.C1.kind: unknown kind \"y6v\"",
        "kind = \"y5v\"      | kind = \"metal-film\" | t.toml:19: parts.C1.kind: \"metal-film\" is not a kind of capacitor",
        "kind = \"y5v\"      | colour = \"blue\" | t.toml:19: parts.C1.colour: unknown key \"colour\" in [parts.C1]",
        "supply = \"9 V\"    | supply = \"9 A\" | t.toml:6: timer.supply: \"9 A\" is not a voltage",
        "supply = \"9 V\"    | supply = \"0 V\" | t.toml:6: timer.supply: \"0 V\" is zero: a voltage must be above zero",
        "role = \"shared\"   | role = \"split-pot\" | t.toml:12: parts.R2.role: role \"split-pot\" has no place in an astable",
        "tolerance = \"J\"   | tolerance = 5 | t.toml:14: parts.R2.tolerance: write a tolerance as text",
    })
    void badFilesNameTheLineTheKeyAndTheProblem(String from, String to, String message) {
        String text = ASTABLE.replace(from.strip(), to.strip());
        assertThat(text).isNotEqualTo(ASTABLE);
        assertThatThrownBy(() -> DesignReader.parse(text, "t.toml"))
                .isInstanceOf(BadInputException.class)
                .hasMessageStartingWith(message.strip())
                .hasMessageNotContaining("\n");
    }

    @Test
    void aTopologyWithoutANeededPartSaysWhichRole() {
        String text = ASTABLE.replace("[parts.R2]\nrole = \"shared\"\nvalue = \"10k\"\ntolerance = \"J\"\n", "");
        assertThatThrownBy(() -> DesignReader.parse(text, "t.toml"))
                .isInstanceOf(BadInputException.class)
                .hasMessage("t.toml:7: parts: an astable needs a part with role \"shared\"");
    }

    @Test
    void aMissingToleranceIsNamed() {
        String text = ASTABLE.replace("tolerance = \"5%\"\n", "");
        assertThatThrownBy(() -> DesignReader.parse(text, "t.toml"))
                .hasMessage("t.toml:7: parts.R1.tolerance: missing (e.g. tolerance = \"5%\" or \"J\")");
    }

    @Test
    void aTomlSyntaxErrorGivesTheLine() {
        String text = ASTABLE.replace("value = \"10k\"", "value = \"10k");
        assertThatThrownBy(() -> DesignReader.parse(text, "t.toml"))
                .isInstanceOf(BadInputException.class)
                .hasMessageStartingWith("t.toml:13: not valid TOML:");
    }

    @Test
    void aMissingFileIsOneLine() {
        assertThatThrownBy(() -> DesignReader.read(Path.of("no-such-design.toml")))
                .isInstanceOf(BadInputException.class)
                .hasMessage("no-such-design.toml: no such file");
    }

    @Test
    void aLoadedControlPinNeedsALoad() {
        String text = ASTABLE + "[control]\npin = \"loaded\"\n";
        assertThatThrownBy(() -> DesignReader.parse(text, "t.toml"))
                .hasMessage("t.toml:21: control.pin: is \"loaded\" but no part has role control-load");
    }

    @Test
    void aPotNeedsAWiperInRange() {
        String text = ASTABLE.replace("value = \"10k\"\ntolerance = \"J\"", "value = \"10k\"\ntolerance = \"J\"\nwiper = 1.5");
        assertThatThrownBy(() -> DesignReader.parse(text, "t.toml"))
                .hasMessage("t.toml:15: parts.R2.wiper: wiper position 1.5 is outside 0 to 1");
    }

    /** A split pot with {@code travel = TEXT}. */
    private static String potWithTravel(String travel) {
        return String.join("\n", "[timer]", "topology = \"pwm-pot\"", "family = \"cmos\"", "supply = 12",
                "[parts.R1]", "role = \"charge\"", "value = \"1k0\"", "tolerance = \"1%\"",
                "[parts.VR1]", "role = \"split-pot\"", "value = \"100k\"", "tolerance = \"20%\"", "wiper = 0.5",
                "travel = " + travel,
                "[parts.D1]", "role = \"charge-diode\"", "kind = \"silicon\"",
                "[parts.D2]", "role = \"discharge-diode\"", "kind = \"silicon\"",
                "[parts.C1]", "role = \"timing\"", "value = \"10n\"", "tolerance = \"5%\"", "");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"270 deg\"     | 270 | NaN",
        "\"270°\"        | 270 | NaN",
        "\"300 Degrees\" | 300 | NaN",
        "\"25 turns\"    | NaN | 25",
        "\"1 turn\"      | NaN | 1",
        "\"3.75turns\"   | NaN | 3.75",
    })
    void aPotMayStateItsTravel(String text, double degrees, double turns) {
        Design d = DesignReader.parse(potWithTravel(text.strip()), "t.toml");
        assertThat(d.travel("VR1")).isEqualTo(new PotTravel(degrees, turns));
        assertThat(d.travel("R1")).isNull();
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "270           | t.toml:14: parts.VR1.travel: give the unit: \"270 deg\" (a single-turn pot) or \"270 turns\" (a multi-turn trimmer)",
        "\"270 rad\"    | t.toml:14: parts.VR1.travel: \"270 rad\" is not a travel above zero: write e.g. \"270 deg\"",
        "\"0 turns\"    | t.toml:14: parts.VR1.travel: \"0 turns\" is not a travel above zero",
        "\"-10 deg\"    | t.toml:14: parts.VR1.travel: \"-10 deg\" is not a travel above zero",
        "\"NaN deg\"    | t.toml:14: parts.VR1.travel: \"NaN deg\" is not a travel above zero",
        "[270]         | t.toml:14: parts.VR1.travel: write the travel as text, e.g. \"270 deg\" or \"25 turns\"",
    })
    void aBadTravelIsOneLine(String text, String message) {
        assertThatThrownBy(() -> DesignReader.parse(potWithTravel(text.strip()), "t.toml"))
                .isInstanceOf(BadInputException.class).hasMessageStartingWith(message.strip()).hasMessageNotContaining("\n");
    }

    @Test
    void onlyAPotHasATravel() {
        String text = ASTABLE.replace("value = \"10k\"\ntolerance = \"J\"", "value = \"10k\"\ntolerance = \"J\"\ntravel = \"270 deg\"");
        assertThatThrownBy(() -> DesignReader.parse(text, "t.toml"))
                .hasMessage("t.toml:15: parts.R2.travel: only a potentiometer (a part with a wiper) has a travel");
    }

    /** The example designs in captures/ are valid files (a smoke check of the demo data, not of numbers). */
    @Test
    void everyExampleDesignReads() throws IOException {
        int n = 0;
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(Path.of("captures"), "*.toml")) {
            for (Path p : ds) {
                Design d = DesignReader.read(p);
                assertThat(d.boardName()).isNotEmpty();
                n++;
            }
        }
        assertThat(n).isGreaterThanOrEqualTo(7);
    }
}
