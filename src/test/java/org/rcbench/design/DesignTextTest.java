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
            }
        }
    }
}
