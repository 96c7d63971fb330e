package org.rcbench.gui;

import java.util.Map;
import org.rcbench.design.Design;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;

/**
 * A source that also feeds every edge to a {@link CycleMeter} of the test's own, so a test can
 * compare what the window shows with what the core measures over exactly the same edges. The
 * meter is written on the source's thread; read it only after {@link #stop()} has returned.
 */
public final class TeeSource implements BenchSource {
    private final BenchSource inner;
    private volatile CycleMeter meter;

    public TeeSource(BenchSource inner) {
        this.inner = inner;
    }

    /** The test's meter (null before the clock was known); read after {@link #stop()}. */
    public CycleMeter meter() {
        return meter;
    }

    @Override
    public String name() {
        return inner.name();
    }

    @Override
    public Design design() {
        return inner.design();
    }

    @Override
    public void start(SourceSink sink) {
        inner.start(new SourceSink() {
            @Override
            public void onClock(Timebase timebase, Map<Integer, String> channels) {
                meter = new CycleMeter(MeterConfig.of(0, timebase));
                sink.onClock(timebase, channels);
            }

            @Override
            public void onStatus(SourceStatus status) {
                sink.onStatus(status);
            }

            @Override
            public void onEdge(long tick, int channel, int level) {
                meter.onEdge(tick, channel, level);
                sink.onEdge(tick, channel, level);
            }

            @Override
            public void onEnd(long lastTick) {
                meter.onEnd(lastTick);
                sink.onEnd(lastTick);
            }
        });
    }

    @Override
    public void stop() {
        inner.stop();
    }
}
