package org.rcbench.gui;

/** Makes the live source for a choice. */
@FunctionalInterface
public interface SourceFactory {
    /**
     * A source for {@code choice}, not yet started.
     *
     * @throws org.rcbench.common.BadInputException when the choice cannot be made into a source
     *                                              (a fault that does not read, a missing design)
     */
    BenchSource open(SourceChoice choice);
}
