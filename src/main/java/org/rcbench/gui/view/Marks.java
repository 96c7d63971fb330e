package org.rcbench.gui.view;

import javafx.scene.Group;
import javafx.scene.Node;
import javafx.scene.paint.Color;
import javafx.scene.shape.Circle;
import javafx.scene.shape.Line;
import javafx.scene.shape.Polygon;
import javafx.scene.shape.Rectangle;
import javafx.scene.shape.StrokeLineCap;
import org.rcbench.gui.ConnectionState;
import org.rcbench.gui.ReadingState;

/**
 * The shapes that carry a state alongside its word and colour: a disc for in band, a triangle for
 * marginal, a cross for outside, an hourglass for settling, a bar for no band, a ring for no design.
 * Built from vector shapes, so they do not depend on a font having the glyph.
 */
final class Marks {
    private Marks() {
    }

    /** A mark of about {@code size} pixels for a reading state. */
    static Node of(ReadingState s, double size) {
        Color c = Palette.of(s);
        double r = size / 2;
        switch (s) {
            case IN_BAND:
                return new Circle(r, r, r, c);
            case MARGINAL: {
                Polygon p = new Polygon(r, 0, size, size, 0, size);
                p.setFill(c);
                return p;
            }
            case OUTSIDE:
                return cross(size, c);
            case SETTLING: {
                Polygon p = new Polygon(0, 0, size, 0, r, r, size, size, 0, size, r, r);
                p.setFill(c);
                return p;
            }
            case NOMINAL_ONLY: {
                Rectangle bar = new Rectangle(0, r - size / 8, size, size / 4);
                bar.setFill(c);
                return new Group(frame(size), bar);
            }
            default: {
                Circle ring = new Circle(r, r, r - 1.5, Color.TRANSPARENT);
                ring.setStroke(c);
                ring.setStrokeWidth(2);
                return ring;
            }
        }
    }

    /** A mark for a connection state: disc streaming, ring waiting, cross failed, bar idle or ended. */
    static Node of(ConnectionState s, double size) {
        Color c = Palette.of(s);
        double r = size / 2;
        switch (s) {
            case STREAMING:
                return new Circle(r, r, r, c);
            case FAILED:
                return cross(size, c);
            case CONNECTING:
            case WAITING:
            case RECONNECTING: {
                Circle ring = new Circle(r, r, r - 1.5, Color.TRANSPARENT);
                ring.setStroke(c);
                ring.setStrokeWidth(3);
                return ring;
            }
            default: {
                Rectangle bar = new Rectangle(0, r - size / 8, size, size / 4);
                bar.setFill(c);
                return new Group(frame(size), bar);
            }
        }
    }

    /** An invisible square that gives a mark its full size. */
    private static Rectangle frame(double size) {
        Rectangle r = new Rectangle(size, size);
        r.setFill(Color.TRANSPARENT);
        return r;
    }

    private static Node cross(double size, Color c) {
        Line a = new Line(2, 2, size - 2, size - 2);
        Line b = new Line(size - 2, 2, 2, size - 2);
        for (Line l : new Line[] {a, b}) {
            l.setStroke(c);
            l.setStrokeWidth(Math.max(2.5, size / 5));
            l.setStrokeLineCap(StrokeLineCap.ROUND);
        }
        return new Group(frame(size), a, b);
    }
}
