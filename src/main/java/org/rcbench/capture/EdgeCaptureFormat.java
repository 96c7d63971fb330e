package org.rcbench.capture;

import java.util.LinkedHashMap;
import java.util.Map;
import org.rcbench.edge.Timebase;

/**
 * The names and rules of rcbench's edge-capture text format, version 1, shared by reader and writer.
 *
 * <pre>
 * # rcbench edges v1
 * # clock_hz=16000000
 * # channel.0=output
 * tick,channel,level
 * 16000,0,1
 * 648172,0,0
 * # end_tick=700000
 * </pre>
 *
 * <p>The full rules (blank lines, CRLF, comments, duplicate and unknown keys, the truncated last
 * line) are in the README section "Capture files" and in {@link CaptureFiles}. Stateless.
 */
public final class EdgeCaptureFormat {
    /** First line of every version-1 file. */
    public static final String MAGIC = "# rcbench edges v1";
    /** The line that ends the header; data lines follow it. */
    public static final String COLUMNS = "tick,channel,level";

    /** Nominal probe clock in hertz; required. */
    public static final String CLOCK_HZ = "clock_hz";
    /** Known offset of the probe clock from nominal, ppm (positive: the clock runs fast). */
    public static final String CALIBRATION_PPM = "calibration_ppm";
    /** Standard uncertainty (one sigma) of the probe clock after the offset is applied, ppm. */
    public static final String CALIBRATION_U_PPM = "calibration_u_ppm";
    /** Prefix of channel name keys: {@code channel.0=output}. */
    public static final String CHANNEL_PREFIX = "channel.";
    /** Free-text probe identity. */
    public static final String PROBE = "probe";
    /** Start of the capture, ISO-8601 (e.g. {@code 2025-03-14T09:26:53Z}). */
    public static final String STARTED = "started";
    /** Trailer after the data: the last tick the recorder vouches for (at least the last edge's). */
    public static final String END_TICK = "end_tick";

    /** Highest channel number. */
    public static final int MAX_CHANNEL = 255;

    private EdgeCaptureFormat() {
    }

    /**
     * A header with the timebase and channel names filled in, in writing order; callers add
     * {@link #PROBE}, {@link #STARTED} and their own keys to the returned mutable map. The
     * calibration keys are written only when non-zero, so a reader can tell "not stated" (the
     * command line then applies its default) from a stated value.
     */
    public static Map<String, String> header(Timebase timebase, Map<Integer, String> channelNames) {
        Map<String, String> h = new LinkedHashMap<>();
        h.put(CLOCK_HZ, formatNumber(timebase.clockHz()));
        if (timebase.offsetPpm() != 0) {
            h.put(CALIBRATION_PPM, formatNumber(timebase.offsetPpm()));
        }
        if (timebase.tolerancePpm() != 0) {
            h.put(CALIBRATION_U_PPM, formatNumber(timebase.tolerancePpm()));
        }
        for (Map.Entry<Integer, String> e : channelNames.entrySet()) {
            h.put(CHANNEL_PREFIX + e.getKey(), e.getValue());
        }
        return h;
    }

    /** True for a key of letters, digits, {@code _}, {@code .} and {@code -}, at least one character. */
    public static boolean isValidKey(CharSequence key) {
        if (key.length() == 0) {
            return false;
        }
        for (int i = 0; i < key.length(); i++) {
            char c = key.charAt(i);
            boolean ok = (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9')
                    || c == '_' || c == '.' || c == '-';
            if (!ok) {
                return false;
            }
        }
        return true;
    }

    /**
     * The shortest text that parses back to exactly {@code value}: a plain integer when the value is
     * whole and below 2^53, otherwise {@link Double#toString(double)} (which round-trips).
     */
    static String formatNumber(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 0x1p53) {
            return Long.toString((long) value);
        }
        return Double.toString(value);
    }

    /**
     * Parses a decimal number ({@code [+-]digits[.digits][(e|E)[+-]digits]}, also {@code .5});
     * returns NaN for anything else, including the {@code NaN}, {@code Infinity}, hex and
     * {@code 1d} forms {@link Double#parseDouble} would accept, and for values that overflow.
     */
    static double parseDecimal(String s) {
        int i = 0;
        int n = s.length();
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && isDigit(s.charAt(i))) {
            i++;
            digits++;
        }
        if (i < n && s.charAt(i) == '.') {
            i++;
            while (i < n && isDigit(s.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return Double.NaN;
        }
        if (i < n && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            i++;
            if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            int expDigits = 0;
            while (i < n && isDigit(s.charAt(i))) {
                i++;
                expDigits++;
            }
            if (expDigits == 0) {
                return Double.NaN;
            }
        }
        if (i != n) {
            return Double.NaN;
        }
        double v = Double.parseDouble(s);
        return Double.isFinite(v) ? v : Double.NaN;
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }
}
