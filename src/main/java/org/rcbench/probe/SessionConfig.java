package org.rcbench.probe;

import org.rcbench.protocol.StreamDecoder;

/**
 * Everything a {@link ProbeSession} needs to know besides the transport. Immutable; change with
 * the {@code with...} methods, starting from {@link #defaults()}.
 *
 * @param profile          how the probe behaves on open (DTR, boot time, hello timeout)
 * @param readTimeoutMillis how long one read waits for bytes, 100..250 ms is right for serial ports
 * @param reconnect        whether to wait for the same probe to come back after a disconnect
 * @param reconnectPollMillis how often to try opening the port again while it is gone
 * @param channelMask      edge channels to capture (bit n = channel n); 0 = all the probe has
 * @param risingMask       channels whose rising edges are wanted
 * @param fallingMask      channels whose falling edges are wanted
 * @param adcChannelMask   ADC channels to sample, 0 = none
 * @param adcRateHz        ADC samples per second per channel, 0 = ADC off
 * @param mode             wire mode, {@link StreamDecoder.Mode#AUTO} to detect
 * @param expectedProbeId  only accept the probe with this id (0 = any; after the first hello, only that probe)
 * @param ackTimeoutMillis how long to wait for the probe to acknowledge start before sending it again
 */
public record SessionConfig(ProbeProfile profile, int readTimeoutMillis, boolean reconnect, int reconnectPollMillis,
        int channelMask, int risingMask, int fallingMask, int adcChannelMask, long adcRateHz,
        StreamDecoder.Mode mode, long expectedProbeId, int ackTimeoutMillis) {

    public SessionConfig {
        if (readTimeoutMillis < 1 || readTimeoutMillis > 1000) {
            throw new IllegalArgumentException("readTimeoutMillis out of 1..1000: " + readTimeoutMillis);
        }
        if (reconnectPollMillis < 1) {
            throw new IllegalArgumentException("reconnectPollMillis < 1: " + reconnectPollMillis);
        }
        if ((channelMask | risingMask | fallingMask | adcChannelMask) >>> 8 != 0) {
            throw new IllegalArgumentException("channel masks are 8 bits");
        }
        if (adcRateHz < 0) {
            throw new IllegalArgumentException("adcRateHz < 0: " + adcRateHz);
        }
    }

    /** Reset-on-open probe, 200 ms reads, reconnect on, every channel with both edges, no ADC, auto mode. */
    public static SessionConfig defaults() {
        return new SessionConfig(ProbeProfile.RESET_ON_OPEN, 200, true, 500, 0, 0xFF, 0xFF, 0, 0,
                StreamDecoder.Mode.AUTO, 0, 1000);
    }

    public SessionConfig withProfile(ProbeProfile p) {
        return new SessionConfig(p, readTimeoutMillis, reconnect, reconnectPollMillis, channelMask, risingMask,
                fallingMask, adcChannelMask, adcRateHz, mode, expectedProbeId, ackTimeoutMillis);
    }

    public SessionConfig withReadTimeoutMillis(int ms) {
        return new SessionConfig(profile, ms, reconnect, reconnectPollMillis, channelMask, risingMask, fallingMask,
                adcChannelMask, adcRateHz, mode, expectedProbeId, ackTimeoutMillis);
    }

    public SessionConfig withReconnect(boolean on) {
        return new SessionConfig(profile, readTimeoutMillis, on, reconnectPollMillis, channelMask, risingMask,
                fallingMask, adcChannelMask, adcRateHz, mode, expectedProbeId, ackTimeoutMillis);
    }

    public SessionConfig withReconnectPollMillis(int ms) {
        return new SessionConfig(profile, readTimeoutMillis, reconnect, ms, channelMask, risingMask, fallingMask,
                adcChannelMask, adcRateHz, mode, expectedProbeId, ackTimeoutMillis);
    }

    /** Channels and polarities: bit n of each mask is channel n. */
    public SessionConfig withEdges(int channels, int rising, int falling) {
        return new SessionConfig(profile, readTimeoutMillis, reconnect, reconnectPollMillis, channels, rising,
                falling, adcChannelMask, adcRateHz, mode, expectedProbeId, ackTimeoutMillis);
    }

    public SessionConfig withAdc(int channels, long rateHz) {
        return new SessionConfig(profile, readTimeoutMillis, reconnect, reconnectPollMillis, channelMask, risingMask,
                fallingMask, channels, rateHz, mode, expectedProbeId, ackTimeoutMillis);
    }

    public SessionConfig withMode(StreamDecoder.Mode m) {
        return new SessionConfig(profile, readTimeoutMillis, reconnect, reconnectPollMillis, channelMask, risingMask,
                fallingMask, adcChannelMask, adcRateHz, m, expectedProbeId, ackTimeoutMillis);
    }

    public SessionConfig withExpectedProbeId(long id) {
        return new SessionConfig(profile, readTimeoutMillis, reconnect, reconnectPollMillis, channelMask, risingMask,
                fallingMask, adcChannelMask, adcRateHz, mode, id, ackTimeoutMillis);
    }

    public SessionConfig withAckTimeoutMillis(int ms) {
        return new SessionConfig(profile, readTimeoutMillis, reconnect, reconnectPollMillis, channelMask, risingMask,
                fallingMask, adcChannelMask, adcRateHz, mode, expectedProbeId, ms);
    }
}
