package org.rcbench.design;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class DesignTextTest {
    /** Writing a design and reading it back gives the same circuit and spreads, for every example file. */
    @Test
    void writeThenReadIsTheSameDesign() throws IOException {
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(Path.of("captures"), "*.toml")) {
            for (Path p : ds) {
                Design d = DesignReader.read(p);
                Design back = DesignReader.parse(DesignText.toToml(d), d.source());
                assertThat(back.circuit()).as(p.toString()).isEqualTo(d.circuit());
                assertThat(back.spreads()).as(p.toString()).isEqualTo(d.spreads());
                assertThat(back.supplyTolerance()).isEqualTo(d.supplyTolerance());
                assertThat(back.ambient()).isEqualTo(d.ambient());
                assertThat(back.title()).isEqualTo(d.title());
                assertThat(back.travels()).as(p.toString()).isEqualTo(d.travels());
            }
        }
    }

    @Test
    void aPotsTravelIsWrittenAndReadBack() {
        Design d = DesignReader.read(Path.of("captures/lumen-dm1.toml"));
        assertThat(d.travel("VR1")).isEqualTo(PotTravel.ofDegrees(270));
        Design turns = new Design(d.source(), d.boardName(), d.revision(), d.notes(), d.circuit(), d.spreads(),
                d.supplyTolerance(), d.ambient(), java.util.Map.of("VR1", PotTravel.ofTurns(25)));
        String text = DesignText.toToml(turns);
        assertThat(text).contains("travel = \"25 turns\"\n");
        assertThat(DesignReader.parse(text, "x.toml").travel("VR1")).isEqualTo(PotTravel.ofTurns(25));
    }
}
