package org.chillwright.selection;

import static org.chillwright.web.SpreadsheetText.safe;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Locale;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.chillwright.physics.Units;

/**
 * A ranking as one CSV table: the ranked designs, then the modules that cannot do the job with their
 * reason. SI units with °C, named in the header like the API fields.
 */
public final class RankingCsv {

    static final String[] HEADER = {"rank", "feasible", "moduleId", "supplier", "partNumber", "lifecycle",
        "seriesCount", "parallelCount", "currentA", "voltageV", "powerW", "cop", "setPointC", "coldSideC", "hotSideC",
        "heatRejectedW", "fractionOfImax", "maxHeatLoadW", "marginK", "unitPrice", "arrayCost", "currency",
        "paretoFront", "requiredSinkKPerW", "warnings", "reason"};

    private RankingCsv() {
    }

    public static String of(RankingResult result) {
        var out = new StringWriter();
        try (var csv = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setHeader(HEADER).get())) {
            for (var row : result.candidates()) {
                var d = row.design();
                var p = d.point();
                csv.printRecord(d.rank(), true, d.moduleId(), safe(row.supplier()), safe(row.partNumber()),
                        row.lifecycle(),
                        d.seriesCount(), d.parallelCount(), num(p.currentA()), num(p.voltageV()), num(p.powerW()),
                        num(p.cop()), num(Units.celsiusFromKelvin(p.setPointK())),
                        num(Units.celsiusFromKelvin(p.coldSideK())), num(Units.celsiusFromKelvin(p.hotSideK())),
                        num(p.heatRejectedW()), num(p.fractionOfImax()), num(p.maxHeatLoadW()), num(p.marginK()),
                        num(d.unitPrice()), num(d.arrayCost()), row.currency(), d.paretoFront(),
                        num(d.requiredSinkKPerW()),
                        p.warnings().stream().map(w -> w.code().name()).collect(Collectors.joining(" ")), "");
            }
            for (var refusal : result.infeasible()) {
                csv.printRecord("", false, refusal.moduleId(), safe(refusal.supplier()), safe(refusal.partNumber()), "",
                        "", "", "",
                        "", "", "", "", "", "", "", "", "", "", "", "", "", "", "", "",
                        refusal.code() + ": " + refusal.message());
            }
        } catch (IOException e) {
            throw new UncheckedIOException("writing a CSV to memory failed", e);
        }
        return out.toString();
    }

    /** Plain decimal with a point, empty for a value that does not exist. */
    private static String num(double value) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%.6g", value) : "";
    }
}
