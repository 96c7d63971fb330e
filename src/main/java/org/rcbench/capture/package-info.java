/**
 * Capture files on disk: rcbench's own edge-capture text format (version 1, optionally gzip) and
 * IEEE 1364 value change dumps, read as a stream of edges into an {@link org.rcbench.edge.EdgeSink}
 * ({@link org.rcbench.capture.CaptureFiles#open}) and written back
 * ({@link org.rcbench.capture.EdgeCaptureWriter}, {@link org.rcbench.capture.VcdWriter}). Imports
 * {@code java.*}, the edge and the common packages only.
 */
package org.rcbench.capture;
