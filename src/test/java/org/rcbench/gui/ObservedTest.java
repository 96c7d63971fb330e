package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.edge.EdgeSink;

/** The high and low times the diagnosis and the trimmer guide work from. */
class ObservedTest {
    @TempDir
    Path dir;

    private static LiveFrame replay(Path file) throws Exception {
        LivePipeline p = new LivePipeline(0, 1);
        try (Capture c = CaptureFiles.open(file)) {
            p.onClock(c.timebase(), c.channels());
            c.streamTo(p);
        }
        return p.latestFrame();
    }

    /** High times (ticks) of every complete cycle in the file, in order. */
    private static List<Long> highs(Path file) throws Exception {
        List<Long> out = new ArrayList<>();
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(new EdgeSink() {
                long lastRise = -1;

                @Override
                public void onEdge(long tick, int channel, int level) {
                    if (level == HIGH) {
                        lastRise = tick;
                    } else if (lastRise >= 0) {
                        out.add(tick - lastRise);
                    }
                }
            });
        }
        return out;
    }

    @Test
    void overAWindowTheMeanAndItsUncertaintyAreTheNewestCyclesOwn() throws Exception {
        Path file = TestCaptures.astable(dir.resolve("a.rce"), 2000, 23188.4, 0.52, 30, 0, 9);
        LiveFrame f = replay(file);
        Observed o = Observed.of(f, 64);
        // The newest 64 accepted cycles are the last 64 complete cycles of this clean capture.
        List<Long> h = highs(file);
        DescriptiveStatistics s = new DescriptiveStatistics();
        for (long v : h.subList(h.size() - 64, h.size())) {
            s.addValue(v);
        }
        double tps = f.timebase().ticksPerSecond();
        assertThat(o.cycles()).isEqualTo(64);
        assertThat(o.highSeconds()).isCloseTo(s.getMean() / tps, within(1e-15));
        // Commons Math: sample standard deviation over root n (the spread is many ticks here).
        assertThat(o.highU()).isCloseTo(s.getStandardDeviation() / Math.sqrt(64) / tps, within(1e-15));
    }

    @Test
    void overTheWholeRunTheFiguresAreTheCoresWithoutTheClock() throws Exception {
        Path file = TestCaptures.astable(dir.resolve("b.rce"), 1000, 23188.4, 0.52, 3, 0, 9);
        LiveFrame f = replay(file);
        Observed o = Observed.of(f, ReadingsModel.WHOLE_RUN);
        assertThat(o.cycles()).isEqualTo(f.measurement().cycles());
        assertThat(o.highSeconds()).isEqualTo(f.measurement().high().meanSeconds());
        assertThat(o.lowSeconds()).isEqualTo(f.measurement().low().meanSeconds());
        // The file states no clock uncertainty, so nothing is taken out.
        assertThat(o.clockRelative()).isZero();
        assertThat(o.highU()).isEqualTo(f.measurement().high().standardUncertaintySeconds());
    }

    @Test
    void identicalReadingsKeepTheQuantizationFloor() {
        long[] ticks = {100, 100, 100, 100};
        double[] mu = Observed.meanAndU(ticks, 0, 4);
        assertThat(mu[0]).isEqualTo(100);
        assertThat(mu[1]).isCloseTo(Math.sqrt(1.0 / 6), within(1e-12));
    }
}
