package org.rcbench.cli;

import org.rcbench.edge.EdgeSink;

/** Hands every edge to several sinks in order. */
final class FanOut implements EdgeSink {
    private final EdgeSink[] sinks;

    FanOut(EdgeSink... sinks) {
        this.sinks = sinks.clone();
    }

    @Override
    public void onEdge(long tick, int channel, int level) {
        for (EdgeSink s : sinks) {
            s.onEdge(tick, channel, level);
        }
    }

    @Override
    public void onEnd(long lastTick) {
        for (EdgeSink s : sinks) {
            s.onEnd(lastTick);
        }
    }
}
