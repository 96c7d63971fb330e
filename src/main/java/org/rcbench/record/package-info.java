/**
 * Recording captures as data arrives: an {@link org.rcbench.edge.EdgeSink} that writes the rcbench
 * edge-capture format and flushes often enough that a killed recorder leaves a readable file.
 * Imports {@code java.*}, the edge, capture and common packages only.
 */
package org.rcbench.record;
