/**
 * Numbers with units: SI-prefixed formatting, IEC 60062 letter-and-digit value codes and IEC 60063
 * preferred-number series. Imports only {@code java.*}.
 */
package org.rcbench.units;
