/**
 * Serial ports through jSerialComm 2.11.2 — the only package that imports it: a
 * {@link org.rcbench.probe.ByteTransport} over a port opened by device path (including
 * {@code /dev/serial/by-id} links and pty symlinks) or by USB id, semi-blocking reads, disconnect
 * detection, and a port list with a permission check that says what to do.
 */
package org.rcbench.serial;
