package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.rcbench.units.Tolerance;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * Turns solved hypotheses into a {@link Diagnosis}: posterior probabilities (softmax of the log
 * evidences), explanations, suspects with marginal probabilities, mixture estimates, ambiguities
 * and the summary line. Stateless.
 */
final class Assembly {
    /** 95 % interval of a normal: ±1.959964 standard deviations (Commons Math would give the same). */
    static final double Z95 = 1.959963984540054;
    /** The best fit is poor when its misfit passes the chi-square 99.9 % point for the number of quantities. */
    static final double POOR_FIT = 0.999;
    /** chi-square POOR_FIT points for 1..4 degrees of freedom, from Commons Math. */
    private static final double[] POOR_FIT_CHI2 = new double[5];

    static {
        for (int n = 1; n < POOR_FIT_CHI2.length; n++) {
            POOR_FIT_CHI2[n] = new ChiSquaredDistribution(n).inverseCumulativeProbability(POOR_FIT);
        }
    }

    private Assembly() {
    }

    static Diagnosis of(DiagnosisModel dm, Target target, Observations o, List<Fit> all) {
        List<Fit> fits = new ArrayList<>();
        for (Fit f : all) {
            if (f.ok() && Double.isFinite(f.logEvidence())) {
                fits.add(f);
            }
        }
        if (fits.isEmpty()) {
            return Diagnosis.unsolved(o, "the solver found no explanation that lets the circuit run as measured");
        }
        fits.sort(Comparator.comparingDouble(Fit::logEvidence).reversed());
        double top = fits.get(0).logEvidence();
        double[] w = new double[fits.size()];
        double sum = 0;
        for (int i = 0; i < w.length; i++) {
            w[i] = Math.exp(fits.get(i).logEvidence() - top);
            sum += w[i];
        }
        double noFault = 0;
        List<Explanation> explanations = new ArrayList<>();
        for (int i = 0; i < w.length; i++) {
            w[i] /= sum;
            Fit f = fits.get(i);
            if (f.hypothesis().faults().isEmpty()) {
                noFault = w[i];
            }
            Map<String, Double> values = new LinkedHashMap<>();
            for (Fault fault : f.hypothesis().faults()) {
                if (fault.kind() != FaultKind.FAMILY) {
                    values.put(fault.name(), f.value(fault.name()));
                }
            }
            explanations.add(new Explanation(f.hypothesis().faults(), f.hypothesis().label(), w[i], f.logEvidence(),
                    f.misfit(), values));
        }
        List<Suspect> suspects = suspects(dm, fits, w);
        List<Estimate> estimates = estimates(dm, fits, w);
        List<Ambiguity> ambiguities = Identifiability.analyse(dm, target, fits, w);
        double best = Double.POSITIVE_INFINITY;
        for (Fit f : fits) {
            best = Math.min(best, f.misfit());
        }
        boolean fitsWell = best <= POOR_FIT_CHI2[Math.min(target.size(), POOR_FIT_CHI2.length - 1)];
        String summary = summary(dm, fits.get(0), w[0], suspects, ambiguities, fitsWell, best, target.size());
        return new Diagnosis(o, explanations, suspects, estimates, ambiguities, noFault, fitsWell, summary);
    }

    private static List<Suspect> suspects(DiagnosisModel dm, List<Fit> fits, double[] w) {
        List<Suspect> out = new ArrayList<>();
        for (Fault fault : dm.faults) {
            double p = 0;
            Fit lead = null;
            for (int i = 0; i < fits.size(); i++) {
                if (fits.get(i).hypothesis().faults().contains(fault)) {
                    p += w[i];
                    if (lead == null) {
                        lead = fits.get(i);
                    }
                }
            }
            out.add(suspect(dm, fault, lead, p));
        }
        out.sort(Comparator.comparingDouble(Suspect::probability).reversed());
        return out;
    }

    private static Suspect suspect(DiagnosisModel dm, Fault fault, Fit lead, double p) {
        if (fault.kind() == FaultKind.FAMILY || lead == null) {
            return new Suspect(fault.name(), fault.kind(), fault.label(), Double.NaN, Unit.NONE, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, Double.NaN, p);
        }
        int i = lead.indexOf(fault.name());
        Coordinate c = lead.coords().get(i);
        double z = lead.z()[i];
        double sd = lead.sd(fault.name());
        double value = c.value(z);
        Unit unit = dm.table.unit(c.index());
        if (!fault.isPart()) {
            return new Suspect(fault.name(), fault.kind(), fault.label(), value, unit, Double.POSITIVE_INFINITY,
                    c.value(z - Z95 * sd), c.value(z + Z95 * sd), Double.NaN, Double.NaN, p);
        }
        double nominal = dm.base[c.index()];
        double dev = value / nominal - 1;
        Tolerance t = dm.tolerance(fault.name());
        double side = dev < 0 ? t.minusFraction() : t.plusFraction();
        double multiple = side > 0 ? Math.abs(dev) / side : Double.NaN;
        return new Suspect(fault.name(), fault.kind(), fault.label(), value, unit, nominal, c.value(z - Z95 * sd),
                c.value(z + Z95 * sd), dev, multiple, p);
    }

    private static List<Estimate> estimates(DiagnosisModel dm, List<Fit> fits, double[] w) {
        List<Estimate> out = new ArrayList<>();
        double[] p = {0.5, 0.025, 0.975};
        double[] q = new double[3];
        for (Coordinate c : dm.healthy) {
            Mixture.quantiles(fits, w, c.name(), p, q);
            out.add(new Estimate(c.name(), dm.table.unit(c.index()), dm.base[c.index()], c.value(q[0]), c.value(q[1]),
                    c.value(q[2])));
        }
        return out;
    }

    private static String summary(DiagnosisModel dm, Fit lead, double p, List<Suspect> suspects,
            List<Ambiguity> ambiguities, boolean fitsWell, double misfit, int quantities) {
        StringBuilder sb = new StringBuilder();
        if (!fitsWell) {
            sb.append(String.format(Locale.ROOT, "No explanation tested fits the measurement well (misfit %.1f for %d"
                    + " measured quantities): the fault may lie outside the model (a circuit other than the design, a"
                    + " broken connection, an unsteady supply). ", misfit, quantities));
        }
        boolean split = false;
        for (Ambiguity a : ambiguities) {
            split |= a.between().size() > 1 && !a.between().get(1).equals("no fault");
        }
        if (lead.hypothesis().faults().isEmpty()) {
            String worn = beyondTolerance(dm, lead);
            if (worn.isEmpty()) {
                sb.append(String.format(Locale.ROOT, "No part needs to be outside its band to explain the measurement"
                        + " (probability %.2f).", p));
            } else {
                sb.append(String.format(Locale.ROOT, "No part needs to be faulty to explain the measurement"
                        + " (probability %.2f), but that explanation puts %s.", p, worn));
            }
            if (split) {
                sb.append(" If a part is off, the measurement cannot tell which: ")
                        .append(Identifiability.alternatives(ambiguities.get(0).between())).append('.');
            }
            return sb.toString();
        }
        if (split) {
            Ambiguity a = ambiguities.get(0);
            sb.append("Ambiguous: ").append(Identifiability.alternatives(a.between()))
                    .append(" fit the measurement equally well; ").append(a.determined()).append('.');
            return sb.toString();
        }
        List<String> parts = new ArrayList<>();
        for (Fault f : lead.hypothesis().faults()) {
            for (Suspect s : suspects) {
                if (s.name().equals(f.name())) {
                    parts.add(describe(s));
                }
            }
        }
        sb.append(Identifiability.capital(String.join(" and ", parts)))
                .append(lead.hypothesis().faults().size() > 1 ? " are the likely faults" : " is the likely fault")
                .append(String.format(Locale.ROOT, " (probability %.2f).", p));
        if (!ambiguities.isEmpty()) {
            sb.append(" The measurement is also consistent with every part inside its band.");
        }
        return sb.toString();
    }

    /**
     * For a no-fault lead: the parts it places beyond their stated tolerance (but within the drift
     * their kind allows: ageing, bias, temperature), so the line never reads as "all parts in
     * tolerance" while the board fails its worst case. Empty when every part is inside its tolerance;
     * otherwise a clause such as {@code C1 at 7 µF (-30.0 %, 1.5× its tolerance) beyond the stated tolerance, ...}.
     */
    static String beyondTolerance(DiagnosisModel dm, Fit lead) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < lead.coords().size(); i++) {
            Coordinate c = lead.coords().get(i);
            if (dm.design.part(c.name()) == null) {
                continue;
            }
            double nominal = dm.base[c.index()];
            double dev = c.value(lead.z()[i]) / nominal - 1;
            Tolerance t = dm.tolerance(c.name());
            double side = dev < 0 ? t.minusFraction() : t.plusFraction();
            if (side > 0 && Math.abs(dev) > side) {
                out.add(c.name() + " at " + ValueCode.formatSi(c.value(lead.z()[i]), dm.table.unit(c.index()), 3)
                        + String.format(Locale.ROOT, " (%+.1f %%, %.1f× its tolerance)", dev * 100, Math.abs(dev) / side));
            }
        }
        if (out.isEmpty()) {
            return "";
        }
        return String.join(" and ", out) + " beyond the stated tolerance, within the drift its kind can show with"
                + " age, bias or temperature";
    }

    /** A suspect in words: {@code C1 at 68.7 nF (-31.3 %, 6.3× its tolerance)}. */
    static String describe(Suspect s) {
        switch (s.kind()) {
            case FAMILY:
                return s.label();
            case LEAKAGE:
                return s.label() + " of about " + ValueCode.formatSi(s.value(), Unit.OHM, 2);
            case CONTROL_LOAD:
                return "a load of about " + ValueCode.formatSi(s.value(), Unit.OHM, 2) + " on the control pin";
            default:
                return s.label() + " at " + ValueCode.formatSi(s.value(), s.unit(), 3)
                        + String.format(Locale.ROOT, " (%+.1f %%", s.deviation() * 100)
                        + (Double.isFinite(s.toleranceMultiple())
                                ? String.format(Locale.ROOT, ", %.1f× its tolerance)", s.toleranceMultiple()) : ")");
        }
    }
}
