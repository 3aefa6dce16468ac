package org.chillwright.selection;

import java.math.BigDecimal;
import java.util.List;

/**
 * What purchasing compares for each design of a short list.
 *
 * @param unitPrice       price of one module at the pieces this build quantity needs, or null
 * @param arrayCost       modules per design × unit price, or null
 * @param secondSource    the best feasible design from another supplier, or null when there is none
 */
public record Comparison(int buildQuantity, List<Row> rows) {

    public Comparison {
        rows = List.copyOf(rows);
    }

    public record Row(long moduleId, String supplier, String partNumber, String lifecycle, BigDecimal unitPrice,
                      BigDecimal arrayCost, String currency, Integer leadTimeDays, Integer minOrderQuantity,
                      SecondSource secondSource) {
    }

    /** Another supplier's part that also does the job. */
    public record SecondSource(long moduleId, String supplier, String partNumber, int seriesCount, int parallelCount,
                               double cop) {
    }
}
