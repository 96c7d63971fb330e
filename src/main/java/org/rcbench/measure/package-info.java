/**
 * Streaming measurement of a timer's output from its edges: cycles (rising to rising) with
 * settling, glitches, gaps and stalls set aside; period, high, low, duty; jitter, time error and
 * MTIE; frequency by least squares with a GUM uncertainty budget; octave Allan deviation; drift and
 * warm-up; trigger-to-output timing of monostable and bistable circuits. Entry points are
 * {@link org.rcbench.measure.CycleMeter}, {@link org.rcbench.measure.MonostableMeter} and
 * {@link org.rcbench.measure.BistableMeter}, all {@link org.rcbench.edge.EdgeSink}s. Imports only
 * {@code java.*}, the edge and stability packages.
 */
package org.rcbench.measure;
