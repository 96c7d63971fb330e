/**
 * Comparison and back-solving: from a measurement and a design, the parts' actual values, ranked
 * suspects with probabilities, plain statements of what the measurement cannot tell apart, verdicts
 * against the predicted bands, and potentiometer tuning. Entry points:
 * {@link org.rcbench.diagnose.Diagnoser} (back-solver), {@link org.rcbench.diagnose.Checker}
 * (measurement + prediction + verdict + diagnosis) and {@link org.rcbench.diagnose.Tuner}. Imports
 * {@code java.*}, Commons Math and the core packages ({@code circuit}, {@code design}, {@code measure},
 * {@code tolerance}, {@code units}, {@code common}).
 */
package org.rcbench.diagnose;
