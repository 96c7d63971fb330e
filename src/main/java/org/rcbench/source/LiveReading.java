package org.rcbench.source;

import org.rcbench.measure.BistableMeter.BistableResult;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MonostableMeter.MonostableResult;

/**
 * One published state of a {@link LiveMeasurement}. Immutable; safe to hand to any thread.
 *
 * @param measurement  the output channel's cycle measurement (whole run and rolling figures)
 * @param monostable   pulse width and delay from the trigger channel, or null when not a monostable
 * @param bistable     set/reset response and bounce, or null when not a bistable
 * @param edges        edges seen on every channel
 * @param gaps         gaps seen on every channel
 * @param probeSeconds probe time from the first edge to the latest edge or heartbeat
 * @param atEnd       true for the reading published at the end of the stream
 */
public record LiveReading(Measurement measurement, MonostableResult monostable, BistableResult bistable, long edges,
        long gaps, double probeSeconds, boolean atEnd) {
}
