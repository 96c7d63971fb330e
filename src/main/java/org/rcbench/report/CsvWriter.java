package org.rcbench.report;

import java.io.Closeable;
import java.io.Flushable;
import java.io.IOException;
import java.io.Writer;

/**
 * Writes comma-separated values by RFC 4180: records end with CRLF; a field holding a comma, a
 * double quote, CR or LF is enclosed in double quotes and its quotes doubled; every record of a file
 * should have the header's number of fields. Numbers are written in plain decimal with the shortest
 * digits that read back to the same double ({@link Double#toString}), never in a locale's format;
 * NaN and infinities are written as empty fields. Not thread-safe.
 */
public final class CsvWriter implements Closeable, Flushable {
    private static final String CRLF = "\r\n";

    private final Writer out;
    private boolean atLineStart = true;

    /** A writer to {@code out}, which it owns and closes. */
    public CsvWriter(Writer out) {
        this.out = out;
    }

    /** Writes one whole record. */
    public CsvWriter row(String... fields) throws IOException {
        for (String f : fields) {
            field(f);
        }
        return end();
    }

    /** Appends one text field to the current record. */
    public CsvWriter field(String text) throws IOException {
        if (!atLineStart) {
            out.write(',');
        }
        atLineStart = false;
        out.write(quote(text == null ? "" : text));
        return this;
    }

    /** Appends one number field (empty for NaN and infinities). */
    public CsvWriter field(double value) throws IOException {
        return field(number(value));
    }

    /** Appends one integer field. */
    public CsvWriter field(long value) throws IOException {
        return field(Long.toString(value));
    }

    /** Ends the current record with CRLF. */
    public CsvWriter end() throws IOException {
        out.write(CRLF);
        atLineStart = true;
        return this;
    }

    /** {@code text} as one RFC 4180 field. */
    static String quote(String text) {
        boolean needs = false;
        for (int i = 0; i < text.length() && !needs; i++) {
            char c = text.charAt(i);
            needs = c == ',' || c == '"' || c == '\r' || c == '\n';
        }
        return needs ? '"' + text.replace("\"", "\"\"") + '"' : text;
    }

    /** Plain decimal text of {@code v}: shortest round-trip digits, no exponent; empty for NaN/infinity. */
    public static String number(double v) {
        if (!Double.isFinite(v)) {
            return "";
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return plain(Double.toString(v));
    }

    /**
     * {@code Double.toString} text without its exponent: {@code 6.875E-4} becomes {@code 0.0006875},
     * {@code 1.5E20} becomes {@code 150000000000000000000}; the digits are kept as they are, so the
     * text reads back to the same double.
     */
    static String plain(String s) {
        int e = s.indexOf('E');
        if (e < 0) {
            return s.endsWith(".0") ? s.substring(0, s.length() - 2) : s;
        }
        boolean negative = s.charAt(0) == '-';
        int start = negative ? 1 : 0;
        int exp = Integer.parseInt(s.substring(e + 1));
        StringBuilder digits = new StringBuilder(e);
        int point = -1;
        for (int i = start; i < e; i++) {
            char c = s.charAt(i);
            if (c == '.') {
                point = digits.length();
            } else {
                digits.append(c);
            }
        }
        int intDigits = (point < 0 ? digits.length() : point) + exp; // digits before the decimal point
        while (digits.length() > 1 && digits.charAt(digits.length() - 1) == '0' && digits.length() > intDigits) {
            digits.setLength(digits.length() - 1);
        }
        StringBuilder out = new StringBuilder(digits.length() + Math.abs(exp) + 3);
        if (negative) {
            out.append('-');
        }
        if (intDigits <= 0) {
            out.append("0.");
            for (int i = 0; i < -intDigits; i++) {
                out.append('0');
            }
            out.append(digits);
        } else if (intDigits >= digits.length()) {
            out.append(digits);
            for (int i = digits.length(); i < intDigits; i++) {
                out.append('0');
            }
        } else {
            out.append(digits, 0, intDigits).append('.').append(digits, intDigits, digits.length());
        }
        return out.toString();
    }

    @Override
    public void flush() throws IOException {
        out.flush();
    }

    @Override
    public void close() throws IOException {
        out.close();
    }
}
