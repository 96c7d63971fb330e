/**
 * Edges in ticks and the timebase that turns them into seconds: the one seam every source writes
 * to and every consumer reads from. Imports only {@code java.*}.
 */
package org.rcbench.edge;
