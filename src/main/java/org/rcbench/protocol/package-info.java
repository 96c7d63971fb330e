/**
 * The probe wire protocol: COBS-framed binary frames with CRC-16/IBM-3740 and a sequence number
 * (hello, edges, ADC samples, acknowledgements, notes, host commands), and the plain-text line mode.
 * {@link org.rcbench.protocol.StreamDecoder} turns bytes into edges and gaps for an
 * {@link org.rcbench.edge.EdgeSink}; {@link org.rcbench.protocol.FrameEncoder} writes every frame
 * type. The format is specified in {@code firmware-notes/protocol.md}. Imports {@code java.*} and
 * the edge package only; knows nothing of ports or threads.
 */
package org.rcbench.protocol;
