/**
 * The board design file: board name, topology, timer family and overrides, supply and ambient,
 * parts by designator with role, value, tolerance, kind and tempco, control pin and trigger. Read
 * by {@link org.rcbench.design.DesignReader} into a {@link org.rcbench.design.Design} (TOML through
 * Jackson). Imports {@code java.*}, Jackson, {@code org.rcbench.common}, {@code units} and {@code circuit}.
 */
package org.rcbench.design;
