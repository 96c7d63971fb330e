package org.rcbench.cli;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MonostableMeter.MonostableResult;
import org.rcbench.measure.MonostableMeter;

/**
 * A capture (a file, or a live stream; see {@link BoardInput}) read through the cycle meter, and through the monostable
 * meter when there is a trigger channel: what {@code check} and {@code tune} start from.
 *
 * @param meter    the cycle meter after the whole stream
 * @param mono     the monostable figures, or null without a trigger channel
 * @param timebase ticks to seconds as measured (the options applied)
 */
record CaptureMeasurement(CycleMeter meter, MonostableResult mono, Timebase timebase) {
    /**
     * The meters of one stream, an {@link EdgeSink}: fed on the stream's thread, and once the
     * stream has ended ({@link #onEnd}) the measurement may be taken on any thread.
     */
    static final class Meters implements EdgeSink {
        private final CycleMeter meter;
        private final MonostableMeter mono;
        private final Timebase timebase;
        private final CountDownLatch ended = new CountDownLatch(1);

        /**
         * Meters for the channel the options choose among {@code channels}, with the trigger channel
         * they (or, for a {@code monostable}, the channel's name) give.
         */
        Meters(CaptureOptions options, Channels channels, Timebase timebase, boolean monostable) {
            int ch = options.channel(channels);
            this.meter = new CycleMeter(options.config(ch, timebase));
            int trig = options.triggerChannel(channels, ch, monostable);
            this.mono = trig < 0 ? null : new MonostableMeter(trig, ch, options.activeLevel(), timebase);
            this.timebase = timebase;
        }

        @Override
        public void onEdge(long tick, int channel, int level) {
            meter.onEdge(tick, channel, level);
            if (mono != null) {
                mono.onEdge(tick, channel, level);
            }
        }

        @Override
        public void onEnd(long lastTick) {
            meter.onEnd(lastTick);
            if (mono != null) {
                mono.onEnd(lastTick);
            }
            ended.countDown();
        }

        /** Waits at most {@code millis} for the end of the stream; returns whether it came. */
        boolean awaitEnd(long millis) throws InterruptedException {
            return ended.await(millis, TimeUnit.MILLISECONDS);
        }

        /** The measurement; only after the stream has ended. */
        CaptureMeasurement measurement() {
            if (ended.getCount() != 0) {
                throw new IllegalStateException("the stream has not ended");
            }
            return new CaptureMeasurement(meter, mono == null ? null : mono.result(), timebase);
        }
    }
}
