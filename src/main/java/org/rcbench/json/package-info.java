/**
 * JSON views of core results with stable key names in SI units, for {@code --json} output and for
 * other commands that embed them. Uses Jackson; the core packages never import this one.
 */
package org.rcbench.json;
