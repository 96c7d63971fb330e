package org.rcbench.diagnose;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.rcbench.design.Design;

/** One diagnoser shared by several threads gives each the same answer as a lone call. */
class DiagnoserConcurrencyTest {
    @Test
    void sharedDiagnoserGivesIdenticalResultsOnEveryThread() throws Exception {
        Design d = Boards.astable("bipolar", "9 V", "5%", "carbon-film", "5%", "film");
        Diagnoser dg = Diagnoser.of(d);
        Observations[] inputs = {Boards.observe(d, 1e-4, "C1", 0.8), Boards.observe(d, 1e-4, "R2", 1.3),
            Boards.observe(d, 1e-4, "leak", 300e3), Boards.observe(d, 1e-4)};
        Diagnosis[] alone = new Diagnosis[inputs.length];
        for (int i = 0; i < inputs.length; i++) {
            alone[i] = dg.diagnose(inputs[i]);
        }
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Diagnosis>> futures = new ArrayList<>();
            for (int k = 0; k < 40; k++) {
                Observations o = inputs[k % inputs.length];
                futures.add(pool.submit(() -> dg.diagnose(o)));
            }
            for (int k = 0; k < futures.size(); k++) {
                Diagnosis got = futures.get(k).get();
                Diagnosis want = alone[k % inputs.length];
                assertThat(got.summary()).isEqualTo(want.summary());
                assertThat(got.suspects()).isEqualTo(want.suspects());
                assertThat(got.estimates()).isEqualTo(want.estimates());
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
