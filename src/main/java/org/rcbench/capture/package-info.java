/**
 * Capture files on disk: rcbench's own edge-capture text format (version 1, optionally gzip) and
 * IEEE 1364 value change dumps, read as a stream of edges into an {@link org.rcbench.edge.EdgeSink}
 * and written back. Imports {@code java.*} and the edge package only.
 */
package org.rcbench.capture;
