package org.rcbench.history;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.history.CheckContent.Estimate;
import org.rcbench.units.Tolerance;

/**
 * Fills in the tolerance of each estimated part that the check document leaves out, from the run's
 * own design text (its {@code [parts.X] tolerance}). A design that no longer parses, or a part it
 * gives no tolerance, leaves the tolerance unknown. Stateless.
 */
final class DesignTolerances {
    private DesignTolerances() {
    }

    static CheckContent fill(CheckContent content, DesignRef design) {
        boolean missing = false;
        for (Estimate e : content.estimates()) {
            missing |= e.tolerance() == null;
        }
        if (!missing) {
            return content;
        }
        Design d;
        try {
            d = DesignReader.parse(design.text(), design.name());
        } catch (BadInputException | IllegalArgumentException e) {
            return content; // an old or hand-made design: the tolerance stays unknown
        }
        List<Estimate> out = new ArrayList<>();
        for (Estimate e : content.estimates()) {
            Tolerance t = e.tolerance();
            if (t == null && d.spreads().containsKey(e.part())) {
                Tolerance fromDesign = d.spread(e.part()).tolerance();
                t = fromDesign.equals(Tolerance.NONE) ? null : fromDesign;
            }
            out.add(new Estimate(e.part(), e.value(), e.unit(), e.nominal(), e.low(), e.high(), t));
        }
        return content.withEstimates(out);
    }
}
