package org.rcbench.protocol;

import java.util.Locale;

/**
 * A command from the host to the probe. Fields that a type does not use are zero.
 *
 * @param type        {@code Wire.T_HELLO_REQUEST}, {@code T_START}, {@code T_STOP}, {@code T_SET_EDGES} or {@code T_SET_ADC}
 * @param channelMask {@code T_SET_EDGES}: edge channels to capture; {@code T_SET_ADC}: ADC channels to sample (bit n = channel n)
 * @param risingMask  {@code T_SET_EDGES}: channels whose rising edges are wanted
 * @param fallingMask {@code T_SET_EDGES}: channels whose falling edges are wanted
 * @param adcRateHz   {@code T_SET_ADC}: samples per second per channel, 0 = ADC off
 */
public record HostCommand(int type, int channelMask, int risingMask, int fallingMask, long adcRateHz) {

    public HostCommand {
        if (type < Wire.T_HELLO_REQUEST || type > Wire.T_SET_ADC) {
            throw new IllegalArgumentException("not a host command type: " + type);
        }
        if ((channelMask | risingMask | fallingMask) >>> 8 != 0) {
            throw new IllegalArgumentException("channel masks are 8 bits: " + channelMask + " " + risingMask
                    + " " + fallingMask);
        }
        if (adcRateHz < 0 || adcRateHz > 0xFFFF_FFFFL) {
            throw new IllegalArgumentException("adcRateHz out of 0..2^32-1: " + adcRateHz);
        }
    }

    public static HostCommand helloRequest() {
        return new HostCommand(Wire.T_HELLO_REQUEST, 0, 0, 0, 0);
    }

    public static HostCommand start() {
        return new HostCommand(Wire.T_START, 0, 0, 0, 0);
    }

    public static HostCommand stop() {
        return new HostCommand(Wire.T_STOP, 0, 0, 0, 0);
    }

    /** Which channels to capture and which polarities on each. */
    public static HostCommand edges(int channelMask, int risingMask, int fallingMask) {
        return new HostCommand(Wire.T_SET_EDGES, channelMask, risingMask, fallingMask, 0);
    }

    /** Which ADC channels to sample at what rate (0 = off). */
    public static HostCommand adc(int channelMask, long rateHz) {
        return new HostCommand(Wire.T_SET_ADC, channelMask, 0, 0, rateHz);
    }

    /** Payload bytes of this command's frame. */
    public byte[] payload() {
        return switch (type) {
            case Wire.T_SET_EDGES -> new byte[] {(byte) channelMask, (byte) risingMask, (byte) fallingMask};
            case Wire.T_SET_ADC -> new byte[] {(byte) channelMask, (byte) adcRateHz, (byte) (adcRateHz >>> 8),
                (byte) (adcRateHz >>> 16), (byte) (adcRateHz >>> 24)};
            default -> new byte[0];
        };
    }

    /**
     * The command in a frame received by a probe, or null when the type is not a host command or
     * the payload is too short (extra trailing bytes are ignored, as the protocol asks).
     */
    public static HostCommand parse(int type, byte[] payload, int off, int len) {
        switch (type) {
            case Wire.T_HELLO_REQUEST:
            case Wire.T_START:
            case Wire.T_STOP:
                return new HostCommand(type, 0, 0, 0, 0);
            case Wire.T_SET_EDGES:
                return len < 3 ? null
                        : edges(payload[off] & 0xFF, payload[off + 1] & 0xFF, payload[off + 2] & 0xFF);
            case Wire.T_SET_ADC:
                return len < 5 ? null : adc(payload[off] & 0xFF, Bytes.u32(payload, off + 1));
            default:
                return null;
        }
    }

    /** The command in words, for logs. */
    public String describe() {
        return switch (type) {
            case Wire.T_HELLO_REQUEST -> "hello?";
            case Wire.T_START -> "start";
            case Wire.T_STOP -> "stop";
            case Wire.T_SET_EDGES -> String.format(Locale.ROOT, "edges channels=%02x rising=%02x falling=%02x",
                    channelMask, risingMask, fallingMask);
            default -> String.format(Locale.ROOT, "adc channels=%02x rate=%d Hz", channelMask, adcRateHz);
        };
    }
}
