/**
 * Circuit models of the 555 family: the first-order RC segment law ({@link org.rcbench.circuit.RcSegment}),
 * timer families and their parameters, and one model class per topology, all built from a
 * {@link org.rcbench.circuit.CircuitSpec} by {@link org.rcbench.circuit.TimerModels#build} and evaluated
 * on a parameter vector ({@link org.rcbench.circuit.ParameterTable}) into a
 * {@link org.rcbench.circuit.Timing} without allocating. Imports only {@code java.*} and
 * {@code org.rcbench.units}.
 */
package org.rcbench.circuit;
