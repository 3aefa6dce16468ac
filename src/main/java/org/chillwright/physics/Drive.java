package org.chillwright.physics;

/**
 * How a cooler is driven: the waveform of its current. Cooling follows the average current, while the Joule heat
 * follows the RMS current: over a period the Peltier term S·i·T averages to S·Iavg·T and the Joule term R·i² to
 * R·Irms², as long as the junction temperatures do not follow the waveform (a period far shorter than the module's
 * thermal time constant, which is of the order of a second for millimetre legs). So a drive is the ideal equations
 * of the Ioffe 1957 / Goldsmid 2016 ideal equations with the Joule term scaled by {@link #jouleFactor()} = Irms²/Iavg² (derived here from those
 * equations). The terminal voltage v = S·ΔT + R·i averages to S·ΔT + R·Iavg, and the power, the average of v·i,
 * is S·ΔT·Iavg + R·Irms².
 */
public sealed interface Drive permits Drive.Linear, Drive.Pwm, Drive.Ripple {

    /** Irms²/Iavg², ≥ 1: how much more Joule heat the waveform makes than a steady current of the same average. */
    double jouleFactor();

    /** Ipeak/Iavg, ≥ 1. */
    double peakFactor();

    /** A linear supply: a steady current. Irms = Iavg = Ipeak. */
    record Linear() implements Drive {
        @Override
        public double jouleFactor() {
            return 1.0;
        }

        @Override
        public double peakFactor() {
            return 1.0;
        }
    }

    /**
     * Unfiltered pulse-width modulation: the current is Ipeak for a fraction D of each period and zero otherwise.
     * Derived here: Iavg = D·Ipeak and Irms² = D·Ipeak², so Irms² = Iavg²/D and Ipeak = Iavg/D.
     *
     * @param duty        the fraction of the period the current flows, D, (0, 1]
     * @param frequencyHz switching frequency, Hz, &gt; 0; it does not enter the averages (see {@link Drive}), but
     *                    a slow drive cycles the junctions thermally (see {@link RippleAnalysis})
     */
    record Pwm(double duty, double frequencyHz) implements Drive {
        public Pwm {
            Check.fraction("duty", duty);
            Check.positive("frequencyHz", frequencyHz);
        }

        @Override
        public double jouleFactor() {
            return 1 / duty;
        }

        @Override
        public double peakFactor() {
            return 1 / duty;
        }
    }

    /**
     * A steady current with a triangular ripple of peak-to-peak r·Iavg on it, as the inductor current of a
     * switching regulator. Derived here: the ripple is a zero-mean ramp between −a and +a, a = r·Iavg/2, whose mean
     * square is (1/2a)·∫ x² dx over [−a, a] = a²/3; the cross term averages to zero, so
     * Irms² = Iavg² + a²/3 = Iavg²(1 + r²/12), and Ipeak = Iavg(1 + r/2). (A sine of the same peak-to-peak would
     * give 1 + r²/8.)
     *
     * @param peakToPeakFraction r, peak-to-peak ripple as a fraction of the average current, [0, 2] (above 2 the
     *                           current would reverse)
     */
    record Ripple(double peakToPeakFraction) implements Drive {
        public Ripple {
            Check.within("peakToPeakFraction", peakToPeakFraction, 0, 2);
        }

        @Override
        public double jouleFactor() {
            return 1 + peakToPeakFraction * peakToPeakFraction / 12;
        }

        @Override
        public double peakFactor() {
            return 1 + peakToPeakFraction / 2;
        }
    }
}
