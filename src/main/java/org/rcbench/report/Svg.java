package org.rcbench.report;

import java.util.Locale;

/**
 * A small SVG 1.1 document builder: a view box in user units (the picture scales to its container's
 * width, so no fixed size is written), shapes, and text escaped for XML. Not thread-safe.
 */
final class Svg {
    private final StringBuilder sb = new StringBuilder();

    /** A drawing {@code width} by {@code height} user units, described by {@code title} (for screen readers). */
    Svg(int width, int height, String title) {
        sb.append("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 ").append(width).append(' ').append(height)
                .append("\" width=\"100%\" role=\"img\" preserveAspectRatio=\"xMidYMid meet\">")
                .append("<title>").append(HtmlText.escape(title)).append("</title>");
    }

    Svg raw(String markup) {
        sb.append(markup);
        return this;
    }

    Svg line(double x1, double y1, double x2, double y2, String style) {
        sb.append("<line x1=\"").append(n(x1)).append("\" y1=\"").append(n(y1)).append("\" x2=\"").append(n(x2))
                .append("\" y2=\"").append(n(y2)).append("\" style=\"").append(style).append("\"/>");
        return this;
    }

    Svg rect(double x, double y, double w, double h, String style) {
        sb.append("<rect x=\"").append(n(x)).append("\" y=\"").append(n(y)).append("\" width=\"").append(n(Math.max(0, w)))
                .append("\" height=\"").append(n(Math.max(0, h))).append("\" style=\"").append(style).append("\"/>");
        return this;
    }

    Svg polyline(double[] xs, double[] ys, String style) {
        sb.append("<polyline points=\"");
        for (int i = 0; i < xs.length; i++) {
            sb.append(i == 0 ? "" : " ").append(n(xs[i])).append(',').append(n(ys[i]));
        }
        sb.append("\" style=\"").append(style).append("\"/>");
        return this;
    }

    Svg path(String d, String style) {
        sb.append("<path d=\"").append(d).append("\" style=\"").append(style).append("\"/>");
        return this;
    }

    /** Text at (x, y); {@code anchor} is {@code start}, {@code middle} or {@code end}. */
    Svg text(double x, double y, String anchor, String text) {
        sb.append("<text x=\"").append(n(x)).append("\" y=\"").append(n(y)).append("\" text-anchor=\"").append(anchor)
                .append("\">").append(HtmlText.escape(text)).append("</text>");
        return this;
    }

    String end() {
        return sb.append("</svg>").toString();
    }

    /** A coordinate with two decimals, {@link Locale#ROOT}. */
    static String n(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
