/**
 * Frequency-stability statistics of the Allan family (IEEE Std 1139; NIST SP 1065, Riley 2008) over
 * phase (time-error) data: non-overlapping, overlapping and modified Allan deviation, time deviation,
 * overlapping Hadamard deviation and total deviation. Works on whole arrays, so it suits captures
 * held in memory and the checks against published data sets; the streaming measurement keeps its
 * own bounded accumulators. Imports only {@code java.*}.
 */
package org.rcbench.stability;
