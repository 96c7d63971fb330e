/**
 * The paperwork: a printable, self-contained HTML test report of one stored run with embedded SVG
 * plots ({@link org.rcbench.report.HtmlReport}), CSV export of a capture's cycles and of a run's
 * measurements (RFC 4180, {@link org.rcbench.report.CsvWriter}); cycles come from the measurement
 * core's own cycle pass ({@link org.rcbench.measure.CycleListener}).
 * Reads {@code history}, {@code capture} and {@code measure}; imports the JDK and {@code units}.
 */
package org.rcbench.report;
