package org.rcbench.gui;

/**
 * One ranked suspect as the suspects panel shows it.
 *
 * @param part        designator, or a latent fault's name (e.g. {@code C1 leakage})
 * @param estimate    its estimated value in words, e.g. {@code 68.2 nF}
 * @param interval    the interval for that estimate, e.g. {@code 64.0 nF – 72.5 nF}
 * @param deviation   how far that is from nominal, e.g. {@code −31.8 %, 6.4 × its tolerance}
 * @param probability posterior probability of this hypothesis, 0..1 (NaN when not stated)
 */
public record Suspect(String part, String estimate, String interval, String deviation, double probability) {
}
