package org.chillwright.selection;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.FontFactory;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.Color;
import java.io.ByteArrayOutputStream;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.chillwright.physics.Units;

/**
 * The PDF report of a ranking: the case, the top candidates, their cooling curves with the operating
 * point, the warnings, the method's sources and the safety cautions.
 */
public final class RankingReport {

    private static final Font TITLE = FontFactory.getFont(FontFactory.HELVETICA_BOLD, 16);
    private static final Font HEADING = FontFactory.getFont(FontFactory.HELVETICA_BOLD, 12);
    private static final Font BODY = FontFactory.getFont(FontFactory.HELVETICA, 9);
    private static final Font SMALL = FontFactory.getFont(FontFactory.HELVETICA, 7.5f);
    private static final Font CELL_BOLD = FontFactory.getFont(FontFactory.HELVETICA_BOLD, 8);
    private static final Font CELL = FontFactory.getFont(FontFactory.HELVETICA, 8);
    private static final Color COOL = new Color(0x1f, 0x5f, 0x7a);
    private static final Color WARM = new Color(0xa6, 0x3d, 0x26);
    private static final int TABLE_ROWS = 15;

    static final String CAUTION = "Results are engineering estimates from lumped constant-property models; confirm "
            + "them by test. Keep modules and drivers within their electrical limits. Never power a module without "
            + "its heat sink: if a fan or pump fails the hot side overheats within seconds, so fit an "
            + "over-temperature cut-off independent of the controller. Keep cold surfaces near electronics above "
            + "the dew point (the frost point below 0 C). Arrays above 60 V DC (SHOCK_HAZARD_VOLTAGE) are a shock "
            + "hazard: guard live parts and follow the applicable standard. Follow local codes and licensed practice "
            + "for electrical and safety matters.";

    static final String SOURCES = "Module equations: A.F. Ioffe, Semiconductor Thermoelements and Thermoelectric "
            + "Cooling (1957); H.J. Goldsmid, Introduction to Thermoelectricity (2016). Parameters from ratings: "
            + "S. Luo, Electronics Cooling (2008); H.S. Lee, Thermoelectrics: Design and Materials (2016), sec. 3.5. "
            + "Dew point: O.A. Alduchov and R.E. Eskridge, J. Appl. Meteorol. 35(4) (1996) 601-609. Heat-sink "
            + "coupling solved for the lower-current root of the cooling equation. Warning thresholds (0.8 Imax, "
            + "0.7 dTmax, dew or frost point + 2 K, 60 V DC, a 250 C hot face for modules without a stated "
            + "maximum) are common practice with no single source.";

    private RankingReport() {
    }

    /**
     * @param caseLines what the case was, label to value, in the person's units
     * @param top       the first candidates in full detail, whose curves are drawn
     */
    public static byte[] of(RankingResult result, Map<String, String> caseLines, List<CandidateDetail> top,
                            Instant generatedAt) {
        var bytes = new ByteArrayOutputStream();
        var document = new Document(PageSize.A4.rotate(), 36, 36, 36, 36);
        try {
            var writer = PdfWriter.getInstance(document, bytes);
            // keep each curve with its heading: by default an image that does not fit waits for the next
            // page while the text after it runs on
            writer.setStrictImageSequence(true);
            document.addTitle("Chillwright ranking report");
            document.addCreator("Chillwright");
            document.open();
            document.add(new Paragraph("Chillwright ranking report", TITLE));
            document.add(new Paragraph("Generated " + generatedAt + " from catalog revision " + result.catalogRevision()
                    + "; " + result.evaluated() + " designs evaluated, " + result.feasible() + " feasible.", SMALL));

            document.add(heading("The case"));
            var caseTable = new PdfPTable(2);
            caseTable.setWidthPercentage(60);
            caseTable.setHorizontalAlignment(Element.ALIGN_LEFT);
            caseLines.forEach((label, value) -> {
                caseTable.addCell(cell(label, CELL_BOLD));
                caseTable.addCell(cell(value, CELL));
            });
            document.add(caseTable);

            document.add(heading("Top candidates"));
            if (result.candidates().isEmpty()) {
                document.add(new Paragraph("No design in the catalog can hold this case.", BODY));
            } else {
                document.add(candidateTable(result));
            }

            for (var detail : top) {
                document.add(heading("Curves: " + detail.module().partNumber() + " (" + detail.module().supplier()
                        + "), " + detail.seriesCount() + " series x " + detail.parallelCount() + " parallel"));
                document.add(com.lowagie.text.Image.getInstance(curvePlot(writer.getDirectContent(), detail)));
                var heating = detail.heating();
                if (heating != null) {
                    document.add(new Paragraph(!heating.needsHeating() ? "Coldest day: no heating current needed."
                            : !heating.reachable() ? "Coldest day: cannot hold the set-point."
                            : "Coldest day: heats with the current reversed at " + fmt(heating.currentA(), 2) + " A, "
                                    + fmt(heating.voltageV(), 2) + " V, " + fmt(heating.powerW(), 2) + " W"
                                    + (heating.withinLimits() ? "." : ", above the current limit."), BODY));
                }
                var solved = detail.solved();
                if (solved != null && !solved.warnings().isEmpty()) {
                    for (var w : solved.warnings()) {
                        document.add(new Paragraph(new Chunk(w.code().name() + ": " + w.sentence(),
                                FontFactory.getFont(FontFactory.HELVETICA, 9, WARM))));
                    }
                }
            }

            if (!result.infeasible().isEmpty()) {
                document.add(heading("Modules that cannot do this job"));
                for (var refusal : result.infeasible().subList(0, Math.min(20, result.infeasible().size()))) {
                    document.add(new Paragraph(refusal.partNumber() + " (" + refusal.supplier() + "): " + refusal.code()
                            + ", " + refusal.message(), SMALL));
                }
                if (result.infeasible().size() > 20) {
                    document.add(new Paragraph("... and " + (result.infeasible().size() - 20) + " more.", SMALL));
                }
            }

            document.add(heading("Method and sources"));
            document.add(new Paragraph(SOURCES, SMALL));
            document.add(heading("Cautions"));
            document.add(new Paragraph(CAUTION, BODY));
            document.close();
        } catch (DocumentException e) {
            throw new IllegalStateException("building the PDF report failed", e);
        }
        return bytes.toByteArray();
    }

    private static Paragraph heading(String text) {
        var p = new Paragraph(text, HEADING);
        p.setSpacingBefore(10);
        p.setSpacingAfter(4);
        return p;
    }

    private static PdfPCell cell(String text, Font font) {
        var cell = new PdfPCell(new Phrase(text == null ? "" : text, font));
        cell.setPadding(3);
        return cell;
    }

    private static PdfPTable candidateTable(RankingResult result) {
        String[] header = {"#", "Part", "Supplier", "Design", "I (A)", "V (V)", "P (W)", "COP", "Hot side (C)",
            "Margin (K)", "of Imax", "Cost", "Warnings"};
        var table = new PdfPTable(header.length);
        table.setWidthPercentage(100);
        for (String h : header) {
            table.addCell(cell(h, CELL_BOLD));
        }
        for (var row : result.candidates().subList(0, Math.min(TABLE_ROWS, result.candidates().size()))) {
            var d = row.design();
            var p = d.point();
            table.addCell(cell(String.valueOf(d.rank()), CELL));
            table.addCell(cell(row.partNumber(), CELL));
            table.addCell(cell(row.supplier(), CELL));
            table.addCell(cell(d.seriesCount() + "s x " + d.parallelCount() + "p", CELL));
            table.addCell(cell(fmt(p.currentA(), 2), CELL));
            table.addCell(cell(fmt(p.voltageV(), 2), CELL));
            table.addCell(cell(fmt(p.powerW(), 2), CELL));
            table.addCell(cell(fmt(p.cop(), 2), CELL));
            table.addCell(cell(fmt(Units.celsiusFromKelvin(p.hotSideK()), 1), CELL));
            table.addCell(cell(fmt(p.marginK(), 1), CELL));
            table.addCell(cell(Double.isFinite(p.fractionOfImax()) ? fmt(100 * p.fractionOfImax(), 0) + " %" : "-", CELL));
            table.addCell(cell(Double.isFinite(d.arrayCost()) ? fmt(d.arrayCost(), 2) + " " + row.currency() : "-", CELL));
            table.addCell(cell(String.join(" ", p.warnings().stream().map(w -> w.code().name()).toList()), CELL));
        }
        return table;
    }

    /** Cooling against current with this heat sink, and the operating point, as vector graphics. */
    private static PdfTemplate curvePlot(PdfContentByte canvas, CandidateDetail detail) {
        float width = 420;
        float height = 190;
        float left = 42;
        float bottom = 26;
        var t = canvas.createTemplate(width, height);
        var curves = detail.curves();
        double maxX = curves.currentA()[curves.currentA().length - 1];
        double maxY = 0;
        for (double[] family : curves.coolingAtDeltaW()) {
            for (double v : family) {
                maxY = Math.max(maxY, Double.isFinite(v) ? v : 0);
            }
        }
        for (double v : curves.coolingW()) {
            maxY = Math.max(maxY, Double.isFinite(v) ? v : 0);
        }
        maxY = maxY > 0 ? maxY * 1.1 : 1;
        float plotW = width - left - 10;
        float plotH = height - bottom - 10;
        // axes
        t.setColorStroke(Color.DARK_GRAY);
        t.setLineWidth(0.6f);
        t.moveTo(left, bottom);
        t.lineTo(left + plotW, bottom);
        t.moveTo(left, bottom);
        t.lineTo(left, bottom + plotH);
        t.stroke();
        com.lowagie.text.pdf.BaseFont font;
        try {
            font = com.lowagie.text.pdf.BaseFont.createFont();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException("the built-in Helvetica font could not be loaded", e);
        }
        t.beginText();
        t.setFontAndSize(font, 7);
        t.showTextAligned(Element.ALIGN_CENTER, "current (A), 0 to " + fmt(maxX, 2), left + plotW / 2, 6, 0);
        t.showTextAligned(Element.ALIGN_CENTER, "heat pumped (W), 0 to " + fmt(maxY, 1), 10, bottom + plotH / 2, 90);
        t.showTextAligned(Element.ALIGN_LEFT, "blue: with this heat sink; grey: at fixed dT of "
                + java.util.Arrays.toString(curves.fixedDeltaTK()).replace(".0", "") + " K, top to bottom; dot: "
                + "operating point", left + 4, height - 8, 0);
        t.endText();
        // fixed-ΔT family in grey, then the heat-sink curve in blue
        for (double[] family : curves.coolingAtDeltaW()) {
            line(t, curves.currentA(), family, maxX, maxY, left, bottom, plotW, plotH, new Color(0x99, 0x99, 0x99), 0.5f);
        }
        line(t, curves.currentA(), curves.coolingW(), maxX, maxY, left, bottom, plotW, plotH, COOL, 1.4f);
        var solved = detail.solved();
        if (solved != null && maxX > 0) {
            float x = (float) (left + plotW * solved.currentA() / maxX);
            float y = (float) (bottom + plotH * solved.heatLoadW() / maxY);
            t.setColorFill(WARM);
            t.circle(x, y, 3);
            t.fill();
        }
        return t;
    }

    private static void line(PdfTemplate t, double[] xs, double[] ys, double maxX, double maxY, float left,
                             float bottom, float plotW, float plotH, Color colour, float widthPt) {
        t.setColorStroke(colour);
        t.setLineWidth(widthPt);
        boolean drawing = false;
        for (int n = 0; n < xs.length; n++) {
            double y = ys[n];
            if (!Double.isFinite(y) || y < 0 || maxX <= 0) {
                drawing = false;
                continue;
            }
            float px = (float) (left + plotW * xs[n] / maxX);
            float py = (float) (bottom + plotH * Math.min(y, maxY) / maxY);
            if (drawing) {
                t.lineTo(px, py);
            } else {
                t.moveTo(px, py);
                drawing = true;
            }
        }
        t.stroke();
    }

    private static String fmt(double value, int decimals) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%." + decimals + "f", value) : "-";
    }
}
