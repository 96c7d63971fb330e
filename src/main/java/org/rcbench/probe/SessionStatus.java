package org.rcbench.probe;

import org.rcbench.protocol.DecoderCounters;
import org.rcbench.protocol.Hello;

/**
 * A snapshot of a session for status lines and views.
 *
 * @param state         where the session is
 * @param line          one line for a progress or status display, e.g.
 *                      {@code waiting for the probe's hello on /dev/ttyUSB0: 1.2 s of 6.0 s, 37 bytes of boot noise}
 * @param port          the transport's name
 * @param hello         the probe's latest hello, or null before the first
 * @param counters      decoder counters (since the session started, across reconnects)
 * @param reconnects    how many times the same probe came back
 * @param silentMillis  milliseconds since the last byte arrived
 */
public record SessionStatus(SessionState state, String line, String port, Hello hello, DecoderCounters counters,
        int reconnects, long silentMillis) {
}
