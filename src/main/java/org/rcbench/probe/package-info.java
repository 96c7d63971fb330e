/**
 * Probe sessions independent of the transport: open a {@link org.rcbench.probe.ByteTransport}
 * (serial port, in-memory link, simulated board), apply the DTR policy of the probe type, wait for
 * the hello through boot noise, send the capture commands, read on one thread into a
 * {@link org.rcbench.protocol.StreamDecoder}, detect disconnects, reconnect when the same probe
 * returns, and mark every loss as a gap. Imports {@code java.*}, edge, protocol and common only.
 */
package org.rcbench.probe;
