/**
 * Evidence that the diagnosis works: seeded populations of simulated boards (one part out of
 * tolerance, the rest randomly inside it) run through the same signal path as real captures
 * (simulated board, quantized probe clock with an offset, jitter, cycle measurement) and diagnosed,
 * with the rates of correct, ambiguous and confidently wrong answers. Imports {@code java.*}, the core
 * packages and {@code sim}.
 */
package org.rcbench.evidence;
