package org.rcbench.sim;

/**
 * One source of edges inside a {@link VirtualBoard}: an oscillator, a triggered monostable, a latch
 * with its buttons, a reference wave. The board calls {@link #step} whenever the queue's earliest
 * edge is not before {@link #nextStep()}; a step schedules edges at or after its own step time
 * only, and moves {@link #nextStep()} forward, which keeps the merged stream in time order.
 */
interface BoardProcess {
    /** Board time of the next step, seconds; +inf when nothing more will happen. */
    double nextStep();

    /** Schedules the next edges; must advance {@link #nextStep()}. */
    void step(EventQueue queue);
}
