/**
 * The simulated board: a design plus chosen deviations (part faults, leakage, control-pin load,
 * jitter, warm-up, supply ripple, probe clock offset and tick size) producing edges in probe ticks
 * ({@link org.rcbench.sim.VirtualBoard}), and a simulated probe that speaks the real wire protocol
 * over an in-memory port ({@link org.rcbench.sim.SimulatedProbe}), with corruption, overruns and
 * unplugs on request. Imports {@code java.*}, common, units, edge, circuit, design, protocol and
 * probe only.
 */
package org.rcbench.sim;
