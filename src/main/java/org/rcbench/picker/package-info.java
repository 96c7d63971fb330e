/**
 * The part-picking helper: candidate part sets from IEC 60063 series for a target frequency and
 * duty, pulse width or PWM duty range, solved with the circuit models and ranked by error and spread
 * ({@link org.rcbench.picker.PartPicker}). Imports {@code java.*}, Commons Math and the core packages.
 */
package org.rcbench.picker;
