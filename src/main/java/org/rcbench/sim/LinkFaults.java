package org.rcbench.sim;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Trouble a simulated probe injects, to exercise the host's loss handling. Immutable; start from
 * {@link #none()}.
 *
 * @param byteFlipRate  probability per byte sent that it is damaged (XORed with a random non-zero
 *                      value, which may make it a frame delimiter), 0..1
 * @param byteDropRate  probability per byte sent that it is lost, 0..1
 * @param overrunRate   probability per edge that the probe's buffer overflows there: that edge and
 *                      up to seven after it are not sent and the dropped-edge total rises, 0..1
 * @param unplugs       cable pulls, in board time order
 * @param seed          seed of the fault draws (separate from the board's)
 */
public record LinkFaults(double byteFlipRate, double byteDropRate, double overrunRate, List<Unplug> unplugs,
        long seed) {

    public LinkFaults {
        rate("byteFlipRate", byteFlipRate);
        rate("byteDropRate", byteDropRate);
        rate("overrunRate", overrunRate);
        List<Unplug> sorted = new ArrayList<>(unplugs);
        sorted.sort(Comparator.comparingDouble(Unplug::atSeconds));
        unplugs = List.copyOf(sorted);
    }

    private static void rate(String name, double r) {
        if (!(r >= 0 && r <= 1)) {
            throw new IllegalArgumentException(name + " out of 0..1: " + r);
        }
    }

    /** A clean link. */
    public static LinkFaults none() {
        return new LinkFaults(0, 0, 0, List.of(), 1);
    }

    /** True when nothing is injected. */
    public boolean clean() {
        return byteFlipRate == 0 && byteDropRate == 0 && overrunRate == 0 && unplugs.isEmpty();
    }

    public LinkFaults withByteFlipRate(double r) {
        return new LinkFaults(r, byteDropRate, overrunRate, unplugs, seed);
    }

    public LinkFaults withByteDropRate(double r) {
        return new LinkFaults(byteFlipRate, r, overrunRate, unplugs, seed);
    }

    public LinkFaults withOverrunRate(double r) {
        return new LinkFaults(byteFlipRate, byteDropRate, r, unplugs, seed);
    }

    public LinkFaults withUnplug(double atSeconds, double downSeconds) {
        List<Unplug> all = new ArrayList<>(unplugs);
        all.add(new Unplug(atSeconds, downSeconds));
        return new LinkFaults(byteFlipRate, byteDropRate, overrunRate, all, seed);
    }

    public LinkFaults withSeed(long s) {
        return new LinkFaults(byteFlipRate, byteDropRate, overrunRate, unplugs, s);
    }
}
