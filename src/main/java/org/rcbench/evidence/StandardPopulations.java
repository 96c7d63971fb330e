package org.rcbench.evidence;

import java.util.List;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;

/**
 * The populations {@code rcbench evidence} and its test run, one or more per topology, each with
 * the goal it is held to. Part values are the worked examples of check-values.md where it has one
 * (astable 1k/10k/10n with the GUM case's tolerances, two-diode astable 10k/10k/10n, output-fed
 * 10k/10n, pot PWM 1k/100k/10n, monostable 100k/1u); where a topology's worked example leaves a
 * part with almost no say in any measured time, a second design with comparable parts is added, so
 * the table shows both what the method does and where the measurement itself runs out.
 */
public final class StandardPopulations {
    /** What a population is held to. */
    public enum Goal {
        /** At least 95 % correct top suspect, and no confidently wrong answer. */
        CORRECT_95,
        /** No confidently wrong answer; the rates are reported. */
        NO_CONFIDENT_WRONG
    }

    /** A population with its goal. */
    public record Entry(Population population, Goal goal) {
    }

    private StandardPopulations() {
    }

    /** Every standard population, astable family first. */
    public static List<Entry> all() {
        return List.of(
                new Entry(Population.of("astable 4k7/10k/10n, 5 %", astable("bipolar", "9 V", "4k7", "5%", "5%"),
                        List.of("R1", "R2", "C1")), Goal.CORRECT_95),
                new Entry(Population.of("astable, one diode 4k7/10k/10n, 5 %", oneDiode(),
                        List.of("R1", "R2", "C1")), Goal.CORRECT_95),
                new Entry(Population.of("astable, two diodes 10k/10k/10n, 5 %", twoDiode(),
                        List.of("R1", "R2", "C1")), Goal.CORRECT_95),
                new Entry(Population.of("astable 1k/10k/10n, 1 %/1 %/5 %", astable("bipolar", "5 V", "1k0", "1%", "5%"),
                        List.of("R1", "R2", "C1")), Goal.NO_CONFIDENT_WRONG),
                new Entry(Population.of("astable, output-fed 10k/10n, 1 %/5 %", outputFed(), List.of("R1", "C1")),
                        Goal.NO_CONFIDENT_WRONG),
                new Entry(Population.of("pot PWM 1k/100k/10n, 1 %/20 %/5 %", potPwm(), List.of("R1", "VR1", "C1")),
                        Goal.NO_CONFIDENT_WRONG),
                new Entry(Population.of("monostable 100k/1u, 1 % metal film, 20 % electrolytic",
                        monostable("1%", "metal-film", "20%", "aluminium-electrolytic"), List.of("R1", "C1")),
                        Goal.NO_CONFIDENT_WRONG),
                new Entry(Population.of("monostable 100k/1u, 5 %/5 % film",
                        monostable("5%", "carbon-film", "5%", "film"), List.of("R1", "C1")), Goal.NO_CONFIDENT_WRONG));
    }

    private static Design parse(String body, String name) {
        return DesignReader.parse("rcbench_design = 1\n" + body, name);
    }

    private static String part(String name, String role, String value, String tol, String kind) {
        return "[parts." + name + "]\nrole = \"" + role + "\"\nvalue = \"" + value + "\"\ntolerance = \"" + tol
                + "\"\nkind = \"" + kind + "\"\n";
    }

    private static String timer(String topology, String family, String supply) {
        return "[timer]\ntopology = \"" + topology + "\"\nfamily = \"" + family + "\"\nsupply = \"" + supply + "\"\n";
    }

    private static final String DIODES = "[parts.D1]\nrole = \"charge-diode\"\nkind = \"silicon\"\n"
            + "[parts.D2]\nrole = \"discharge-diode\"\nkind = \"silicon\"\n";

    static Design astable(String family, String supply, String ra, String rTol, String cTol) {
        return parse(timer("astable", family, supply) + part("R1", "charge", ra, rTol, "metal-film")
                + part("R2", "shared", "10k", rTol, "metal-film") + part("C1", "timing", "10n", cTol, "film"), "astable");
    }

    static Design oneDiode() {
        return parse(timer("astable-one-diode", "bipolar", "9 V") + part("R1", "charge", "4k7", "5%", "carbon-film")
                + part("R2", "shared", "10k", "5%", "carbon-film") + part("C1", "timing", "10n", "5%", "film")
                + "[parts.D1]\nrole = \"charge-diode\"\nkind = \"silicon\"\n", "astable-one-diode");
    }

    static Design twoDiode() {
        return parse(timer("astable-two-diode", "bipolar", "5 V") + part("R1", "charge", "10k", "5%", "carbon-film")
                + part("R2", "discharge", "10k", "5%", "carbon-film") + part("C1", "timing", "10n", "5%", "film")
                + DIODES, "astable-two-diode");
    }

    static Design outputFed() {
        return parse(timer("astable-output-fed", "cmos", "5 V") + part("R1", "feedback", "10k", "1%", "metal-film")
                + part("C1", "timing", "10n", "5%", "film"), "astable-output-fed");
    }

    static Design potPwm() {
        return parse(timer("pwm-pot", "cmos", "5 V") + part("R1", "charge", "1k0", "1%", "metal-film")
                + "[parts.VR1]\nrole = \"split-pot\"\nvalue = \"100k\"\ntolerance = \"20%\"\nkind = \"carbon-track\"\n"
                + "wiper = 0.5\n" + part("C1", "timing", "10n", "5%", "film") + DIODES, "pwm-pot");
    }

    static Design monostable(String rTol, String rKind, String cTol, String cKind) {
        return parse(timer("monostable", "bipolar", "5 V") + part("R1", "charge", "100k", rTol, rKind)
                + part("C1", "timing", "1u", cTol, cKind), "monostable");
    }
}
