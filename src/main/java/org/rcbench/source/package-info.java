/**
 * Where live edges come from, behind one start/stop/status API for the commands and the GUI: a
 * serial probe, a simulated board on a simulated probe, or a capture file replayed. Applies the
 * host's stored probe calibration to every session ({@link org.rcbench.probe.CalibrationStore}).
 * Imports java.*, common, edge, capture, design, measure, protocol, probe, serial, sim and history
 * (calibrations kept in the history database).
 */
package org.rcbench.source;
