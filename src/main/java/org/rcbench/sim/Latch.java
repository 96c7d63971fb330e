package org.rcbench.sim;

import java.util.Random;
import org.rcbench.edge.EdgeSink;

/**
 * A bistable latch and its two push buttons. Both button inputs idle high and a press pulls them
 * low; presses alternate set, reset, set ... every {@code pressInterval}, each held for
 * {@code hold}. A press and a release each bounce: up to {@code maxBounces} extra open-close pairs
 * at random moments within {@code bounceSeconds}. The output follows the first edge of a press that
 * changes it, one propagation delay later; bounces never reach it (the latch holds).
 */
final class Latch implements BoardProcess {
    private final int output;
    private final int set;
    private final int reset;
    private final double powerUp;
    private final Stimulus stimulus;
    private final double responseSeconds;
    private final Random random;
    private final double[] scratch;
    private double nextPress;
    private boolean powered;
    private boolean pressSet = true;
    private int outputLevel = EdgeSink.LOW;

    Latch(int output, int set, int reset, double powerUpSeconds, Stimulus stimulus, double responseSeconds,
            Random random) {
        this.output = output;
        this.set = set;
        this.reset = reset;
        this.powerUp = powerUpSeconds;
        this.stimulus = stimulus;
        this.responseSeconds = responseSeconds;
        this.random = random;
        this.scratch = new double[2 * stimulus.maxBounces()];
        this.nextPress = powerUpSeconds + stimulus.pressIntervalSeconds() / 2;
    }

    @Override
    public double nextStep() {
        return powered ? nextPress : powerUp;
    }

    @Override
    public void step(EventQueue queue) {
        if (!powered) {
            queue.add(powerUp, output, EdgeSink.LOW);
            queue.add(powerUp, set, EdgeSink.HIGH);
            queue.add(powerUp, reset, EdgeSink.HIGH);
            powered = true;
            return;
        }
        double press = nextPress;
        int button = pressSet ? set : reset;
        bounce(queue, press, button, EdgeSink.LOW);
        bounce(queue, press + stimulus.holdSeconds(), button, EdgeSink.HIGH);
        int target = pressSet ? EdgeSink.HIGH : EdgeSink.LOW;
        if (outputLevel != target) {
            queue.add(press + responseSeconds, output, target);
            outputLevel = target;
        }
        pressSet = !pressSet;
        nextPress = press + stimulus.pressIntervalSeconds();
    }

    /** The contact reaches {@code level} at {@code t}, then chatters and settles at {@code level}. */
    private void bounce(EventQueue queue, double t, int channel, int level) {
        queue.add(t, channel, level);
        int pairs = stimulus.maxBounces() == 0 || stimulus.bounceSeconds() == 0 ? 0
                : random.nextInt(stimulus.maxBounces() + 1);
        int n = 2 * pairs;
        for (int i = 0; i < n; i++) {
            // Strictly after t, within the bounce time.
            scratch[i] = t + stimulus.bounceSeconds() * (1 - random.nextDouble());
        }
        java.util.Arrays.sort(scratch, 0, n);
        for (int i = 0; i < n; i++) {
            queue.add(scratch[i], channel, i % 2 == 0 ? 1 - level : level);
        }
    }
}
