package org.rcbench.protocol;

/**
 * Everything a decoder reports besides edges: hello, acknowledgements, ADC samples, notes,
 * probe time and trouble. Called on the decoding thread; every method has an empty default.
 * Implementations must not keep the {@code samples} array: it is reused.
 */
public interface ProbeEvents {
    /** The probe introduced itself (at boot, on request, or with an {@code H} line). */
    default void onHello(Hello hello) {
    }

    /** The probe answered a command. */
    default void onAck(Ack ack) {
    }

    /**
     * A block of ADC samples from one channel.
     *
     * @param channel        ADC channel
     * @param resolutionBits bits per sample
     * @param fullScaleMv    voltage at the probe pin for the largest code, in millivolts
     * @param firstTick      timeline tick of {@code samples[0]} (same timeline as the edges)
     * @param periodTicks    ticks between samples (sample rate = clockHz / periodTicks)
     * @param samples        raw codes, valid in {@code [0, count)}; reused after the call returns
     * @param count          number of samples
     */
    default void onAdc(int channel, int resolutionBits, int fullScaleMv, long firstTick, long periodTicks,
            int[] samples, int count) {
    }

    /** A free-text note from the firmware (ASCII, one line). */
    default void onNote(String text) {
    }

    /** The probe vouches that its timeline has reached {@code tick} (heartbeat or last edge of a frame). */
    default void onProbeTime(long tick) {
    }

    /** Something was lost or corrupted; the gap (if any channel was affected) is already in the sink. */
    default void onTrouble(Trouble trouble, long tick) {
    }

    /** The auto-detecting decoder decided what the probe speaks. */
    default void onMode(StreamDecoder.Mode mode) {
    }
}
