package org.rcbench.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/** Monostable and bistable timing on constructed two- and three-channel edge sequences. */
class TwoChannelTest {
    private static final Timebase MHZ = Timebase.of(1e6);

    @Test
    void monostablePulseWidthAndDelayPerTrigger() {
        // Pulse of t = R C ln 3 with R = 100k, C = 1u: 109.8612 ms (first-order RC law, check-values.md),
        // here 109 861 ticks of 1 us; delay 3 us.
        MonostableMeter meter = new MonostableMeter(1, 0, EdgeSink.LOW, MHZ);
        long t = 1000;
        for (int k = 0; k < 10; k++) {
            meter.onEdge(t, 1, EdgeSink.LOW);
            meter.onEdge(t + 3, 0, EdgeSink.HIGH);
            meter.onEdge(t + 500, 1, EdgeSink.HIGH);
            meter.onEdge(t + 3 + 109_861 + (k % 2), 0, EdgeSink.LOW);
            t += 500_000;
        }
        MonostableMeter.MonostableResult r = meter.result();
        assertThat(r.triggers()).isEqualTo(10);
        assertThat(r.pulses()).isEqualTo(10);
        assertThat(r.pulseWidth().meanSeconds()).isCloseTo(0.1098615, within(1e-9));
        assertThat(r.pulseWidth().minSeconds()).isCloseTo(0.109861, within(1e-12));
        assertThat(r.delay().meanSeconds()).isCloseTo(3e-6, within(1e-15));
        assertThat(r.ignoredTriggers()).isZero();
    }

    @Test
    void triggerDuringPulseIsIgnoredAndUntriggeredPulseCounted() {
        MonostableMeter meter = new MonostableMeter(1, 0, EdgeSink.LOW, MHZ);
        meter.onEdge(100, 1, EdgeSink.LOW);
        meter.onEdge(105, 0, EdgeSink.HIGH);
        meter.onEdge(200, 1, EdgeSink.HIGH);
        meter.onEdge(300, 1, EdgeSink.LOW);
        meter.onEdge(400, 1, EdgeSink.HIGH);
        meter.onEdge(1105, 0, EdgeSink.LOW);
        meter.onEdge(5000, 0, EdgeSink.HIGH);
        meter.onEdge(6000, 0, EdgeSink.LOW);
        MonostableMeter.MonostableResult r = meter.result();
        assertThat(r.triggers()).isEqualTo(2);
        assertThat(r.ignoredTriggers()).isEqualTo(1);
        assertThat(r.untriggeredPulses()).isEqualTo(1);
        assertThat(r.pulses()).isEqualTo(1);
        assertThat(r.pulseWidth().meanSeconds()).isCloseTo(1000e-6, within(1e-15));
    }

    @Test
    void latchResponseAndContactBounce() {
        // Set on channel 1, reset on channel 2, output on channel 0; buttons pull low; 20 ms window.
        BistableMeter meter = new BistableMeter(1, 2, 0, EdgeSink.LOW, 20_000, MHZ);
        meter.onEdge(0, 0, EdgeSink.LOW);
        // Set press with three bounces (extra edges) in the first 2 ms, output rises 12 us after the first edge.
        meter.onEdge(100_000, 1, EdgeSink.LOW);
        meter.onEdge(100_012, 0, EdgeSink.HIGH);
        meter.onEdge(100_400, 1, EdgeSink.HIGH);
        meter.onEdge(100_900, 1, EdgeSink.LOW);
        meter.onEdge(101_500, 1, EdgeSink.HIGH);
        meter.onEdge(101_900, 1, EdgeSink.LOW);
        // Release, with one bounce.
        meter.onEdge(300_000, 1, EdgeSink.HIGH);
        meter.onEdge(300_300, 1, EdgeSink.LOW);
        meter.onEdge(300_600, 1, EdgeSink.HIGH);
        // Set again while set: no change.
        meter.onEdge(500_000, 1, EdgeSink.LOW);
        meter.onEdge(600_000, 1, EdgeSink.HIGH);
        // Reset press, clean; output falls 8 us later.
        meter.onEdge(800_000, 2, EdgeSink.LOW);
        meter.onEdge(800_008, 0, EdgeSink.LOW);
        meter.onEdge(900_000, 2, EdgeSink.HIGH);
        BistableMeter.BistableResult r = meter.result();
        assertThat(r.setPresses()).isEqualTo(2);
        assertThat(r.setBounces()).isEqualTo(4 + 2);
        assertThat(r.resetPresses()).isEqualTo(1);
        assertThat(r.resetBounces()).isZero();
        assertThat(r.noChange()).isEqualTo(1);
        assertThat(r.setResponse().meanSeconds()).isCloseTo(12e-6, within(1e-15));
        assertThat(r.resetResponse().meanSeconds()).isCloseTo(8e-6, within(1e-15));
        assertThat(r.spontaneous()).isZero();
    }
}
