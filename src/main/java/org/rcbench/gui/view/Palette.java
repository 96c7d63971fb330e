package org.rcbench.gui.view;

import javafx.scene.paint.Color;
import org.rcbench.gui.ConnectionState;
import org.rcbench.gui.ReadingState;

/**
 * The window's colours. States use the Okabe–Ito palette (Okabe and Ito, "Color Universal
 * Design", 2008), whose eight colours stay distinct for the common colour-vision deficiencies;
 * every state also carries a word and a shape, so colour is never the only cue.
 */
public final class Palette {
    public static final Color ORANGE = Color.web("#E69F00");
    public static final Color SKY_BLUE = Color.web("#56B4E9");
    public static final Color BLUISH_GREEN = Color.web("#009E73");
    public static final Color YELLOW = Color.web("#F0E442");
    public static final Color BLUE = Color.web("#0072B2");
    public static final Color VERMILLION = Color.web("#D55E00");
    public static final Color REDDISH_PURPLE = Color.web("#CC79A7");
    public static final Color GREY = Color.web("#7a7a7a");

    /** Plot background, grid and ink. */
    public static final Color PLOT_BACKGROUND = Color.web("#fbfaf6");
    public static final Color GRID = Color.web("#e2dfd6");
    public static final Color INK = Color.web("#2b2b2b");
    public static final Color TRACE = BLUE;
    public static final Color BAND_FILL = Color.web("#009E73", 0.16);
    public static final Color WORST_LINE = ORANGE;

    private Palette() {
    }

    public static Color of(ReadingState s) {
        switch (s) {
            case IN_BAND: return BLUISH_GREEN;
            case MARGINAL: return ORANGE;
            case OUTSIDE: return VERMILLION;
            case SETTLING: return SKY_BLUE;
            default: return GREY;
        }
    }

    public static Color of(ConnectionState s) {
        switch (s) {
            case STREAMING: return BLUISH_GREEN;
            case CONNECTING:
            case WAITING:
            case RECONNECTING: return SKY_BLUE;
            case FAILED: return VERMILLION;
            default: return GREY;
        }
    }
}
