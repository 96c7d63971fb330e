package org.rcbench.report;

import java.util.List;

/**
 * The report's style sheet and its fixed wording (verdict meanings, safety cautions).
 *
 * <p>Printing: the page margins (16 mm top, 14 mm sides, 18 mm bottom) leave a printable width of
 * 182 mm on A4 (210 mm) and 187.9 mm on US Letter (8.5 in); the text column is at most 180 mm on
 * screen and fills the printable width on paper, so both sizes fit without scaling. Pictures scale
 * to the column (no fixed widths); tables, figures and the verdict box are kept on one page, and
 * headings stay with what follows them. No colour carries meaning: verdicts are words and shapes.
 */
final class ReportStyle {
    private ReportStyle() {
    }

    static final String CSS = """
            @page { margin: 16mm 14mm 18mm 14mm; }
            html { font-family: "DejaVu Sans", "Liberation Sans", Arial, sans-serif; font-size: 10pt; color: #000; background: #fff; }
            body { max-width: 180mm; margin: 0 auto; padding: 0 3mm; line-height: 1.35; }
            h1 { font-size: 17pt; margin: 4mm 0 1mm 0; }
            h2 { font-size: 12.5pt; margin: 6mm 0 2mm 0; border-bottom: 0.6pt solid #000; padding-bottom: 0.8mm;
                 break-after: avoid; page-break-after: avoid; }
            h3 { font-size: 10.5pt; margin: 3mm 0 1mm 0; break-after: avoid; page-break-after: avoid; }
            p.sub { margin: 0 0 3mm 0; }
            table { width: 100%; border-collapse: collapse; margin: 1mm 0 3mm 0; break-inside: avoid; page-break-inside: avoid; }
            thead { display: table-header-group; }
            th, td { border: 0.5pt solid #555; padding: 0.8mm 1.4mm; text-align: left; vertical-align: top; }
            th { background: #eee; font-weight: bold; }
            td.n { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
            tr { break-inside: avoid; page-break-inside: avoid; }
            figure { margin: 2mm 0 4mm 0; break-inside: avoid; page-break-inside: avoid; }
            figcaption { font-size: 9pt; margin-top: 1mm; }
            svg { display: block; width: 100%; height: auto; max-width: 100%; font-size: 8pt; }
            svg text { font-family: inherit; }
            pre { white-space: pre-wrap; overflow-wrap: anywhere; font-size: 8.5pt; border: 0.5pt solid #999;
                  padding: 1.5mm; margin: 1mm 0 3mm 0; }
            .verdict { display: flex; align-items: center; gap: 4mm; border: 1.5pt solid #000; padding: 2mm 3mm;
                       margin: 2mm 0 3mm 0; break-inside: avoid; page-break-inside: avoid; }
            .verdict .mark { flex: 0 0 14mm; width: 14mm; }
            .verdict .word { font-size: 16pt; font-weight: bold; letter-spacing: 0.08em; text-transform: uppercase; }
            .status { font-weight: bold; text-transform: uppercase; }
            .hash { font-family: "DejaVu Sans Mono", monospace; font-size: 8pt; overflow-wrap: anywhere; }
            .caution li { margin-bottom: 1.2mm; }
            footer { margin-top: 8mm; font-size: 8.5pt; border-top: 0.5pt solid #000; padding-top: 1mm; }
            @media print {
              body { max-width: none; padding: 0; }
              a { color: #000; text-decoration: none; }
            }
            """;

    /** What each verdict means, in plain words. */
    static String meaning(String verdict) {
        return switch (verdict) {
            case "pass" -> "Every checked quantity lies inside its statistical band: the board behaves as its design"
                    + " predicts for parts within tolerance.";
            case "marginal" -> "At least one quantity lies outside its statistical band but inside the worst-case band:"
                    + " legal for the parts' tolerances, yet unusual; worth a look.";
            case "fail" -> "At least one quantity lies outside even the worst-case band: some part is out of tolerance,"
                    + " wrong, or faulty.";
            default -> "The timer is not running: no usable cycles were measured.";
        };
    }

    /** The safety cautions printed on every report. */
    static final List<String> CAUTIONS = List.of(
            "The probe's ground is the computer's ground (through USB). Clip it only to the circuit's own ground;"
                    + " on anything whose ground is not earth-safe, use a battery-powered computer or a USB isolator.",
            "Never connect the probe to mains-referenced or transformerless circuits (capacitive droppers, off-line"
                    + " supplies, dimmers) without proper isolation: such boards can be lethal even when they look like"
                    + " low-voltage electronics.",
            "Capacitors keep their charge after the power is removed. Discharge large or high-voltage ones through"
                    + " a suitable resistor and confirm with a meter before touching or desoldering.",
            "Keep within the probe's input-voltage limits and feed it through a protective front end (series"
                    + " resistor, divider, clamp diodes). Probe the timer's output pin, never the timing capacitor,"
                    + " which the probe would load.",
            "These notes do not replace local electrical codes, workplace rules or the advice of a licensed"
                    + " electrician; where they differ, follow those.");
}
