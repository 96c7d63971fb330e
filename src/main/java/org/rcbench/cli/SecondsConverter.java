package org.rcbench.cli;

import java.util.Locale;
import org.rcbench.common.BadInputException;
import picocli.CommandLine.ITypeConverter;

/** Reads a duration in seconds: {@code 0.02}, {@code 20ms}, {@code 20 ms}, {@code 150us}, {@code 150µs}, {@code 5ns}. */
final class SecondsConverter implements ITypeConverter<Double> {
    @Override
    public Double convert(String text) {
        String s = text.strip().toLowerCase(Locale.ROOT);
        double scale = 1;
        if (s.endsWith("ms")) {
            scale = 1e-3;
            s = s.substring(0, s.length() - 2);
        } else if (s.endsWith("us") || s.endsWith("µs")) {
            scale = 1e-6;
            s = s.substring(0, s.length() - 2);
        } else if (s.endsWith("ns")) {
            scale = 1e-9;
            s = s.substring(0, s.length() - 2);
        } else if (s.endsWith("s")) {
            s = s.substring(0, s.length() - 1);
        }
        try {
            double v = Double.parseDouble(s.strip()) * scale;
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new BadInputException("", "\"" + text + "\" is not a duration of zero or more");
            }
            return v;
        } catch (NumberFormatException e) {
            throw new BadInputException("", "\"" + text + "\" is not a duration (e.g. 20ms, 0.02, 150us)", e);
        }
    }
}
