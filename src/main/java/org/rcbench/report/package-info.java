/**
 * The paperwork: a printable, self-contained HTML test report of one stored run with embedded SVG
 * plots ({@link org.rcbench.report.HtmlReport}), CSV export of a capture's cycles and of a run's
 * measurements (RFC 4180, {@link org.rcbench.report.CsvWriter}), and the cycle pass and plot data
 * those need ({@link org.rcbench.report.CycleExtractor}, {@link org.rcbench.report.CapturePlots}).
 * Reads {@code history} and {@code capture}; imports the JDK and {@code units}.
 */
package org.rcbench.report;
