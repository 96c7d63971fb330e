/**
 * The history of checks and probe calibrations, kept in one SQLite file ({@link
 * org.rcbench.history.HistoryStore}): per run the board, serial, design, probe, capture reference,
 * measurements with uncertainties, prediction, verdict, estimates and suspects as queryable rows
 * plus the whole check document; per probe its clock calibrations. Also the trend of each estimated
 * part over a board's runs and when it is projected to leave its tolerance band ({@link
 * org.rcbench.history.PartTrend}). Reads the check result as a JSON tree, so it depends on no
 * diagnosis class; imports the JDK, sqlite-jdbc, Jackson, Commons Math, {@code common},
 * {@code units} and {@code design} (to read part tolerances from a stored design).
 */
package org.rcbench.history;
