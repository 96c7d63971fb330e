package org.rcbench.gui;

/**
 * Decimates a run of cycles to pixel columns for the waveform strip: for each column, the lowest and
 * highest level the signal takes anywhere inside it, so a column holding an edge spans both levels
 * however many cycles it covers, and no pulse, however short, disappears between pixels. A column
 * with no data (a gap between cycles that do not follow each other, or outside the cycles) gets
 * {@code -1} in both outputs. One pass over cycles and columns together; allocation-free. Stateless.
 */
public final class MinMaxColumns {
    private MinMaxColumns() {
    }

    /**
     * Fills {@code minLevel[c]} and {@code maxLevel[c]} (0 low, 1 high, -1 no data) for columns
     * {@code c = 0 .. columns-1}; column {@code c} covers ticks
     * {@code [t0 + c (t1 - t0) / columns, t0 + (c + 1) (t1 - t0) / columns)}.
     *
     * @param start cycle start ticks (rising edges), ascending
     * @param high  high ticks per cycle
     * @param low   low ticks per cycle
     * @param from  first cycle used
     * @param to    one past the last cycle used
     */
    public static void decimate(long[] start, long[] high, long[] low, int from, int to, long t0, long t1,
            int columns, int[] minLevel, int[] maxLevel) {
        if (!(t1 > t0) || columns <= 0) {
            throw new IllegalArgumentException("empty strip: t0 " + t0 + ", t1 " + t1 + ", columns " + columns);
        }
        double span = (double) (t1 - t0) / columns;
        int k = from;
        for (int c = 0; c < columns; c++) {
            long a = t0 + (long) Math.floor(c * span);
            long b = c == columns - 1 ? t1 : t0 + (long) Math.floor((c + 1) * span);
            if (b <= a) {
                b = a + 1; // more columns than ticks: every column still sees one tick
            }
            // Skip cycles that end before this column starts.
            while (k < to && start[k] + high[k] + low[k] <= a) {
                k++;
            }
            int min = 2;
            int max = -2;
            for (int i = k; i < to && start[i] < b; i++) {
                long rise = start[i];
                long fall = rise + high[i];
                long end = fall + low[i];
                if (rise < b && fall > a) {
                    min = Math.min(min, 1);
                    max = Math.max(max, 1);
                }
                if (fall < b && end > a) {
                    min = Math.min(min, 0);
                    max = Math.max(max, 0);
                }
            }
            minLevel[c] = min == 2 ? -1 : min;
            maxLevel[c] = max == -2 ? -1 : max;
        }
    }
}
