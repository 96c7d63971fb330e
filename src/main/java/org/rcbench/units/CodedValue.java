package org.rcbench.units;

/**
 * A value read from text, in base units, with the tolerance the text carried ({@code 4K7K}) or
 * {@code null} when it carried none.
 *
 * @param value     the value in the unit it was parsed for (ohms, farads, hertz ...)
 * @param tolerance the IEC 60062 tolerance letter's band, or {@code null}
 */
public record CodedValue(double value, Tolerance tolerance) {
}
