package org.rcbench.cli;

import org.rcbench.common.BadInputException;
import org.rcbench.units.PreferredSeries;
import org.rcbench.units.Tolerance;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * picocli converters for option values written as component codes or SI text: {@code 4k7},
 * {@code 10n}, {@code 1.2 kHz}, {@code 9 V}, {@code 5%}, {@code E24}. Bad text is rejected with a
 * message that quotes it, e.g. {@code "4k7k" is not a resistance}.
 */
public final class ValueConverters {
    private ValueConverters() {
    }

    private static double positive(String text, Unit unit) {
        try {
            return ValueCode.parsePositive(text, unit);
        } catch (BadInputException e) {
            throw new TypeConversionException(e.what());
        }
    }

    /** Ohms from {@code 4k7}, {@code 470R}, {@code 4.7 kΩ}. */
    public static final class Resistance implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return positive(value, Unit.OHM);
        }
    }

    /** Farads from {@code 10n}, {@code 4n7}, {@code 10 µF}. */
    public static final class Capacitance implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return positive(value, Unit.FARAD);
        }
    }

    /** Hertz from {@code 1k}, {@code 1.2 kHz}, {@code 690}. */
    public static final class Frequency implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return positive(value, Unit.HERTZ);
        }
    }

    /** Seconds from {@code 5}, {@code 150m}, {@code 1.5 ms}. */
    public static final class Time implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return positive(value, Unit.SECOND);
        }
    }

    /** Seconds, zero allowed, from {@code 0}, {@code 20ms}, {@code 2 µs}, {@code 150us}. */
    public static final class TimeOrZero implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            double v;
            try {
                v = ValueCode.parseValue(value, Unit.SECOND);
            } catch (BadInputException e) {
                throw new TypeConversionException(e.what());
            }
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new TypeConversionException("\"" + value + "\" is not a time of zero or more");
            }
            return v;
        }
    }

    /** Volts from {@code 9}, {@code 9 V}, {@code 4.5V}. */
    public static final class Voltage implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return positive(value, Unit.VOLT);
        }
    }

    /** A fraction in (0, 1) from {@code 0.6} or {@code 60%}. */
    public static final class Fraction implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            String t = value.strip();
            double v;
            try {
                v = t.endsWith("%") ? ValueCode.parseValue(t.substring(0, t.length() - 1), Unit.NONE) / 100
                        : ValueCode.parseValue(t, Unit.NONE);
            } catch (BadInputException e) {
                throw new TypeConversionException("\"" + value + "\" is not a fraction (write 0.6 or 60%)");
            }
            if (!(v > 0 && v < 1)) {
                throw new TypeConversionException("\"" + value + "\" is not between 0 and 1 (0 % and 100 %)");
            }
            return v;
        }
    }

    /** A tolerance from {@code 5%}, {@code ±1 %}, {@code J}. */
    public static final class ToleranceBand implements ITypeConverter<Tolerance> {
        @Override
        public Tolerance convert(String value) {
            try {
                return Tolerance.parse(value);
            } catch (BadInputException e) {
                throw new TypeConversionException(e.what());
            }
        }
    }

    /** An IEC 60063 series from {@code E24}, {@code e96}. */
    public static final class Series implements ITypeConverter<PreferredSeries> {
        @Override
        public PreferredSeries convert(String value) {
            try {
                return PreferredSeries.parse(value);
            } catch (BadInputException e) {
                throw new TypeConversionException(e.what());
            }
        }
    }
}
