package org.chillwright.physics;

import java.util.Arrays;

/**
 * Source and sink temperatures over time, as points (time, hot, cold): a skin temperature over a day, an
 * exhaust that runs in shifts. Between points the temperatures are linear ({@link Interpolation#LINEAR}) or
 * held at the earlier point's values until the next point ({@link Interpolation#STEPWISE}); before the first
 * and after the last point they are held. The source may be at or below the sink at some times: the generator
 * then gives nothing. Parsing CSV text (columns time, hot, cold) is the edge's job; this record takes the
 * parsed columns.
 *
 * @param timesS        times, s: at least two, finite, strictly increasing
 * @param hotSourceK    source temperature at each time, K, finite and &gt; 0
 * @param coldSinkK     sink temperature at each time, K, finite and &gt; 0
 * @param interpolation how to fill between points; null means {@link Interpolation#LINEAR}
 */
public record TemperatureSchedule(double[] timesS, double[] hotSourceK, double[] coldSinkK,
                                  Interpolation interpolation) {

    /** How the temperatures run between two points. */
    public enum Interpolation {
        /** Straight lines between points. */
        LINEAR,
        /** Each point's values hold until the next point. */
        STEPWISE
    }

    public TemperatureSchedule {
        if (timesS == null || timesS.length < 2) {
            throw new InvalidQuantityException("timesS", Double.NaN, "timesS must hold at least two times");
        }
        timesS = timesS.clone();
        hotSourceK = column("hotSourceK", hotSourceK, timesS.length);
        coldSinkK = column("coldSinkK", coldSinkK, timesS.length);
        for (int i = 0; i < timesS.length; i++) {
            Check.finite("timesS[" + i + "]", timesS[i]);
            if (i > 0) {
                Check.above("timesS[" + i + "]", timesS[i], timesS[i - 1], "timesS[" + (i - 1) + "]");
            }
        }
        interpolation = interpolation == null ? Interpolation.LINEAR : interpolation;
    }

    private static double[] column(String field, double[] values, int length) {
        if (values == null || values.length != length) {
            throw new InvalidQuantityException(field, Double.NaN,
                    field + " must have one value per time (" + length + "), had "
                            + (values == null ? "none" : values.length));
        }
        double[] copy = values.clone();
        for (int i = 0; i < copy.length; i++) {
            Check.positive(field + "[" + i + "]", copy[i]);
        }
        return copy;
    }

    /** Constant temperatures from 0 for a duration. */
    public static TemperatureSchedule constant(double hotSourceK, double coldSinkK, double durationS) {
        Check.positive("durationS", durationS);
        return new TemperatureSchedule(new double[] {0, durationS}, new double[] {hotSourceK, hotSourceK},
                new double[] {coldSinkK, coldSinkK}, Interpolation.STEPWISE);
    }

    /** First time, s. */
    public double startS() {
        return timesS[0];
    }

    /** Last time, s. */
    public double endS() {
        return timesS[timesS.length - 1];
    }

    /** Source temperature at a time, K. */
    public double hotSourceAtK(double timeS) {
        return valueAt(hotSourceK, timeS);
    }

    /** Sink temperature at a time, K. */
    public double coldSinkAtK(double timeS) {
        return valueAt(coldSinkK, timeS);
    }

    private double valueAt(double[] values, double timeS) {
        int last = timesS.length - 1;
        if (timeS <= timesS[0]) {
            return values[0];
        }
        if (timeS >= timesS[last]) {
            return values[last];
        }
        int i = Arrays.binarySearch(timesS, timeS);
        if (i >= 0) {
            return values[i];
        }
        i = -i - 2; // timesS[i] < timeS < timesS[i + 1]
        if (interpolation == Interpolation.STEPWISE) {
            return values[i];
        }
        double w = (timeS - timesS[i]) / (timesS[i + 1] - timesS[i]);
        return values[i] + w * (values[i + 1] - values[i]);
    }

    @Override
    public double[] timesS() {
        return timesS.clone();
    }

    @Override
    public double[] hotSourceK() {
        return hotSourceK.clone();
    }

    @Override
    public double[] coldSinkK() {
        return coldSinkK.clone();
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof TemperatureSchedule s && Arrays.equals(s.timesS, timesS)
                && Arrays.equals(s.hotSourceK, hotSourceK) && Arrays.equals(s.coldSinkK, coldSinkK)
                && s.interpolation == interpolation;
    }

    @Override
    public int hashCode() {
        return ((31 * Arrays.hashCode(timesS) + Arrays.hashCode(hotSourceK)) * 31 + Arrays.hashCode(coldSinkK)) * 31
                + interpolation.hashCode();
    }

    @Override
    public String toString() {
        return "TemperatureSchedule[timesS=" + Arrays.toString(timesS) + ", hotSourceK=" + Arrays.toString(hotSourceK)
                + ", coldSinkK=" + Arrays.toString(coldSinkK) + ", interpolation=" + interpolation + "]";
    }
}
