package org.rcbench.measure;

/**
 * Frequency against time, decimated: point {@code k} is the mean over {@code cycles[k]}
 * consecutive accepted cycles centred at {@code timeSeconds[k]} from the capture start. The arrays
 * are copies owned by this record's holder.
 */
public record FrequencyTrend(double[] timeSeconds, double[] frequencyHz, long[] cycles) {
    public FrequencyTrend {
        if (timeSeconds.length != frequencyHz.length || cycles.length != frequencyHz.length) {
            throw new IllegalArgumentException("trend arrays differ in length: " + timeSeconds.length + ", "
                    + frequencyHz.length + ", " + cycles.length);
        }
    }

    public int size() {
        return timeSeconds.length;
    }
}
