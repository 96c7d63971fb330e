/**
 * Tolerance bands of a design's predicted timing: the uncertain inputs and their mapping onto a
 * model ({@link org.rcbench.tolerance.InputSpace}), worst case over the tolerance box
 * ({@link org.rcbench.tolerance.WorstCase}), GUM linear propagation
 * ({@link org.rcbench.tolerance.LinearPropagation}, JCGM 100:2008), Monte Carlo
 * ({@link org.rcbench.tolerance.MonteCarlo}, JCGM 101:2008), and the whole prediction
 * ({@link org.rcbench.tolerance.Predictor}). Imports {@code java.*}, Commons Math and the core packages.
 */
package org.rcbench.tolerance;
