package org.rcbench.measure;

import java.util.Objects;
import org.rcbench.edge.EdgeSink;

/**
 * Measures one channel of a timer's output as its edges stream in: an {@link EdgeSink} that
 * ignores every other channel, does all its work in one pass, allocates nothing per edge, and can
 * be asked for a {@link #snapshot()} at any moment (live views) or a {@link #result()} at the end.
 *
 * <h2>How edges become cycles</h2>
 * <ol>
 * <li><b>Look-ahead.</b> The typical period is not known in advance, so the first
 * {@code lookAheadCycles} cycles' edges (33 edges by default) are held back. Their medians of high
 * and low time are the first estimate of the typical pulse lengths; a median is unmoved by a
 * minority of odd cycles such as the long first cycle after power-up or a glitch. The held edges
 * are then replayed through the steps below. After that a running median of the last 63 cycles,
 * renewed every 128 cycles ({@link RecentMedians}), keeps the estimate current while, say, a
 * potentiometer is turned.</li>
 * <li><b>Glitches.</b> A pulse shorter than {@code glitchFraction} of the typical pulse of its
 * level is a runt: both its edges are dropped, which merges the pulses on either side (a spike in
 * a low phase leaves one low phase; a dropout in a high phase leaves one high phase). A pulse is
 * judged once the pulse after it is known (two edges wait); when both are runts the relatively
 * shorter goes, so a dropout soon after a rising edge removes the dropout, not the pulse's short
 * first part.</li>
 * <li><b>Breaks.</b> A gap (level {@link #UNKNOWN}), a stall (no edge for {@code stallPeriods}
 * typical periods) or a repeated level (a lost edge) ends the current run: no cycle spans it, and
 * the phase-based figures (frequency fit, Allan deviation, TIE) start a new segment.</li>
 * <li><b>Cycles</b> run from one rising edge to the next, with the falling edge between them.</li>
 * <li><b>Settling.</b> From the first cycle on, cycles whose period, high or low time differ from
 * the look-ahead's typical values by more than the settling tolerance are excluded and counted,
 * until the first cycle that agrees; this removes the long first cycle after power-up
 * ({@code (Ra+Rb) C ln 3} instead of {@code ln 2}) and supply or control-pin settling.</li>
 * </ol>
 * Accepted cycles go to the statistics ({@link CycleStatistics}); every cycle formed, settling ones
 * flagged, goes to the {@link CycleListener} given at construction (export and plots use it, so
 * there is one definition of a cycle).
 *
 * <p>Not thread-safe: feed it from one thread and call {@link #snapshot()} from that same thread
 * (it costs microseconds plus a pass over the MTIE record), handing the immutable result to other
 * threads.
 */
public final class CycleMeter implements EdgeSink {
    private static final int NONE = -2;

    private final MeterConfig config;
    private final int channel;
    private final RecentMedians typical = new RecentMedians();
    private final CycleStatistics stats;
    private final CycleListener listener;

    private final long[] aheadTicks;
    private final int[] aheadLevels;
    private int aheadSize;
    private boolean learning = true;

    private long pendingTickA;
    private int pendingLevelA = NONE;
    private long pendingTickB;
    private int pendingLevelB = NONE;
    private boolean pendingAIsFirst;
    private boolean fresh = true;
    private long lastTick = -1;
    private int lastLevel = NONE;
    private long rise = -1;
    private long fall = -1;
    private boolean broken = true;
    private boolean contiguous;
    private boolean glitchPending;
    private boolean glitchInCycle;
    private boolean inGap;

    private boolean settling = true;
    private long typicalPeriod;
    private long typicalHigh;
    private long typicalLow;
    private long settleSlack;

    private long edges;
    private long glitches;
    private long gaps;
    private long stalls;
    private long stalledTicks;
    private long missedEdges;
    private long settlingCycles;
    private long latestTick = -1;
    private boolean ended;

    public CycleMeter(MeterConfig config) {
        this(config, CycleListener.NONE);
    }

    /** A meter that also reports each cycle it forms to {@code listener} (on the feeding thread). */
    public CycleMeter(MeterConfig config, CycleListener listener) {
        this.config = config;
        this.listener = Objects.requireNonNull(listener, "listener");
        this.channel = config.channel();
        int n = 2 * config.lookAheadCycles() + 2;
        aheadTicks = new long[n];
        aheadLevels = new int[n];
        stats = new CycleStatistics(config);
    }

    public MeterConfig config() {
        return config;
    }

    @Override
    public void onEdge(long tick, int ch, int level) {
        if (ch != channel) {
            return;
        }
        latestTick = Math.max(latestTick, tick);
        if (level != UNKNOWN) {
            edges++;
        }
        if (learning) {
            aheadTicks[aheadSize] = tick;
            aheadLevels[aheadSize] = level;
            if (++aheadSize == aheadTicks.length) {
                finishLearning();
            }
            return;
        }
        process(tick, level);
    }

    @Override
    public void onEnd(long lastTickOfSource) {
        if (ended) {
            return;
        }
        if (learning) {
            finishLearning();
        }
        flushPending();
        long end = Math.max(lastTickOfSource, latestTick);
        if (lastTick >= 0 && !inGap && isStall(end - lastTick)) {
            stalls++;
            stalledTicks += end - lastTick;
        }
        ended = true;
    }

    /** Whole-capture and rolling figures now, without MTIE windows; cheap enough for a live view. */
    public Measurement snapshot() {
        return stats.build(counts(), false, config.rollingCycles());
    }

    /** As {@link #snapshot()}, with the rolling figures over the newest {@code rollingCycles} cycles. */
    public Measurement snapshot(int rollingCycles) {
        return stats.build(counts(), false, rollingCycles);
    }

    /** Everything, including MTIE at the configured windows; call after {@link #onEnd(long)}. */
    public Measurement result() {
        return stats.build(counts(), true, config.rollingCycles());
    }

    /**
     * Copies the newest accepted cycles, oldest first, into the arrays (ticks: start of the cycle,
     * high time, low time) and returns how many; at most {@link MeterConfig#recentCycles()}.
     */
    public int recentCycles(long[] startTicks, long[] highTicks, long[] lowTicks) {
        return stats.recent().copyTo(startTicks, highTicks, lowTicks);
    }

    /** The decimated frequency-versus-time trend of the accepted cycles. */
    public FrequencyTrend trend() {
        return stats.trend();
    }

    private Counts counts() {
        return new Counts(edges, settlingCycles, glitches, gaps, stalls, stalledTicks, missedEdges);
    }

    private void process(long tick, int level) {
        if (level == UNKNOWN) {
            flushPending();
            if (!inGap) {
                gaps++;
            }
            inGap = true;
            fresh = true;
            breakRun();
            lastTick = -1;
            lastLevel = NONE;
            return;
        }
        inGap = false;
        // The first edge after the start or a gap may only state a level (a VCD's initial value),
        // so the pulse before the next edge is never judged a runt.
        boolean first = fresh;
        fresh = false;
        if (pendingLevelB != NONE) {
            // Two edges wait. The older pulse (A to B) is judged now that the pulse after it is
            // known: when both are runts the relatively shorter one goes, so a dropout just after
            // a rising edge removes the dropout, not the short first part of the high pulse.
            boolean newerRunt = isRunt(pendingTickB, pendingLevelB, tick, level);
            boolean olderRunt = !pendingAIsFirst && isRunt(pendingTickA, pendingLevelA, pendingTickB, pendingLevelB);
            if (olderRunt && newerRunt
                    && relative(pendingTickB, pendingLevelB, tick) < relative(pendingTickA, pendingLevelA, pendingTickB)) {
                glitches++;
                glitchPending = true;
                pendingLevelB = NONE;
                return;
            }
            if (olderRunt) {
                glitches++;
                glitchPending = true;
                pendingTickA = tick;
                pendingLevelA = level;
                pendingAIsFirst = false;
                pendingLevelB = NONE;
                return;
            }
            commit(pendingTickA, pendingLevelA);
            pendingTickA = pendingTickB;
            pendingLevelA = pendingLevelB;
            pendingAIsFirst = false;
            pendingTickB = tick;
            pendingLevelB = level;
        } else if (pendingLevelA != NONE) {
            pendingTickB = tick;
            pendingLevelB = level;
        } else {
            pendingTickA = tick;
            pendingLevelA = level;
            pendingAIsFirst = first;
        }
    }

    /** True when the pulse from edge 1 to edge 2 is a runt of edge 1's level. */
    private boolean isRunt(long tick1, int level1, long tick2, int level2) {
        long typicalPulse = level1 == HIGH ? typical.high() : typical.low();
        return level1 != level2 && tick2 - tick1 < config.glitchFraction() * typicalPulse;
    }

    /** Pulse length from edge 1 to {@code tick2} relative to the typical pulse of edge 1's level. */
    private double relative(long tick1, int level1, long tick2) {
        long typicalPulse = level1 == HIGH ? typical.high() : typical.low();
        return (tick2 - tick1) / (double) Math.max(1, typicalPulse);
    }

    private void flushPending() {
        if (pendingLevelB != NONE && !pendingAIsFirst
                && isRunt(pendingTickA, pendingLevelA, pendingTickB, pendingLevelB)) {
            glitches++;
        } else {
            if (pendingLevelA != NONE) {
                commit(pendingTickA, pendingLevelA);
            }
            if (pendingLevelB != NONE) {
                commit(pendingTickB, pendingLevelB);
            }
        }
        pendingLevelA = NONE;
        pendingLevelB = NONE;
    }

    private void commit(long tick, int level) {
        if (lastTick >= 0 && isStall(tick - lastTick)) {
            stalls++;
            stalledTicks += tick - lastTick;
            breakRun();
        }
        if (level == lastLevel) {
            missedEdges++;
            breakRun();
        }
        lastTick = tick;
        lastLevel = level;
        // A glitch removed since the last committed edge lies inside the cycle in progress.
        glitchInCycle |= glitchPending && rise >= 0;
        glitchPending = false;
        if (level == HIGH) {
            if (rise >= 0 && fall >= 0) {
                cycle(rise, fall - rise, tick - fall);
            }
            rise = tick;
            fall = -1;
            glitchInCycle = false;
        } else if (rise >= 0) {
            fall = tick;
        }
    }

    private boolean isStall(long ticks) {
        long period = typical.period();
        return period > 0 && ticks > config.stallPeriods() * period;
    }

    private void breakRun() {
        rise = -1;
        fall = -1;
        broken = true;
        contiguous = false;
        glitchInCycle = false;
    }

    private void cycle(long start, long high, long low) {
        typical.add(high, low);
        int flags = (contiguous ? 0 : CycleListener.NEW_RUN) | (glitchInCycle ? CycleListener.GLITCH_REMOVED : 0);
        contiguous = true;
        if (settling) {
            if (!agreesWithTypical(high, low)) {
                settlingCycles++;
                broken = true;
                listener.onCycle(start, high, low, flags | CycleListener.SETTLING);
                return;
            }
            settling = false;
        }
        stats.accept(start, high, low, broken);
        broken = false;
        listener.onCycle(start, high, low, flags);
    }

    private boolean agreesWithTypical(long high, long low) {
        if (typicalPeriod <= 0) {
            return true;
        }
        return Math.abs(high + low - typicalPeriod) <= slack(typicalPeriod)
                && Math.abs(high - typicalHigh) <= slack(typicalHigh)
                && Math.abs(low - typicalLow) <= slack(typicalLow);
    }

    private double slack(long typicalTicks) {
        return Math.max(Math.max(config.settleTolerance() * typicalTicks, settleSlack), 2);
    }

    /** Learns the typical pulses from the held edges, then replays them. */
    private void finishLearning() {
        learning = false;
        long[] highs = new long[aheadSize];
        long[] lows = new long[aheadSize];
        long[] periods = new long[aheadSize];
        int nh = 0;
        int nl = 0;
        int np = 0;
        long lastRise = aheadSize > 0 && aheadLevels[0] == HIGH ? aheadTicks[0] : -1;
        for (int k = 1; k < aheadSize; k++) {
            int a = aheadLevels[k - 1];
            int b = aheadLevels[k];
            if (a == UNKNOWN || b == UNKNOWN || a == b) {
                lastRise = b == HIGH ? aheadTicks[k] : -1;
                continue;
            }
            long d = aheadTicks[k] - aheadTicks[k - 1];
            if (a == HIGH) {
                highs[nh++] = d;
            } else {
                lows[nl++] = d;
            }
            if (b == HIGH) {
                if (lastRise >= 0) {
                    periods[np++] = aheadTicks[k] - lastRise;
                }
                lastRise = aheadTicks[k];
            }
        }
        typicalHigh = nh == 0 ? 0 : RecentMedians.median(highs, nh, new long[nh]);
        typicalLow = nl == 0 ? 0 : RecentMedians.median(lows, nl, new long[nl]);
        typicalPeriod = typicalHigh > 0 && typicalLow > 0 ? typicalHigh + typicalLow : 0;
        if (np >= 3) {
            long median = RecentMedians.median(periods, np, new long[np]);
            for (int k = 0; k < np; k++) {
                periods[k] = Math.abs(periods[k] - median);
            }
            // Six robust standard deviations (1.4826 MAD, common practice, no source).
            settleSlack = Math.round(6 * 1.4826 * RecentMedians.median(periods, np, new long[np]));
        }
        typical.seed(typicalHigh, typicalLow);
        stats.start(typicalPeriod);
        for (int k = 0; k < aheadSize; k++) {
            process(aheadTicks[k], aheadLevels[k]);
        }
        aheadSize = 0;
    }

    /** Counters handed to the statistics when a result is built. */
    record Counts(long edges, long settlingCycles, long glitches, long gaps, long stalls, long stalledTicks,
            long missedEdges) {
    }
}
