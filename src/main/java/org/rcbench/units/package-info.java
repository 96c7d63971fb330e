/**
 * Numbers with units: SI-prefixed formatting ({@link org.rcbench.units.SiFormat}), IEC 60062
 * letter-and-digit value codes and tolerance letters ({@link org.rcbench.units.ValueCode},
 * {@link org.rcbench.units.Tolerance}) and IEC 60063 preferred-number series
 * ({@link org.rcbench.units.PreferredSeries}). Imports only {@code java.*} and
 * {@code org.rcbench.common}.
 */
package org.rcbench.units;
