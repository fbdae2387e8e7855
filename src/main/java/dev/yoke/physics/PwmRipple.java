package dev.yoke.physics;

/**
 * Exact periodic steady-state current of a series R-L load (a motor winding, with its back-EMF)
 * driven by a two-level voltage that steps by ΔV and stays high for a fraction δ of each period T_p.
 *
 * <p>With τ = L/R each interval is a first-order exponential toward its own asymptote; matching the
 * ends of the two intervals gives the peak-to-peak ripple
 * ΔI = (ΔV/R)·(1 − e^(−δT_p/τ))·(1 − e^(−(1−δ)T_p/τ)) / (1 − e^(−T_p/τ))
 * (first-order circuit analysis, e.g. Mohan, Undeland &amp; Robbins, <i>Power Electronics</i>, ch. 7,
 * dc-motor drive ripple). For τ ≫ T_p it tends to ΔV·δ(1−δ)·T_p/L, the triangular ripple.
 *
 * <p>The mean square of the deviation is integrated in closed form over both exponential pieces,
 * so the RMS stays exact when L/R is comparable to the period (the triangular I² + ΔI²/12 is only
 * its τ ≫ T_p limit, used here when T_p/τ &lt; 10⁻³ where the closed form would lose digits). The same
 * integrals, kept per interval, give the mean and mean square of the deviation over the high and the low
 * interval separately: what each switch of the bridge carries.
 */
public final class PwmRipple {

    /** Below this T_p/τ the triangular limit is used (its relative error is below 10⁻⁶ there). */
    static final double TRIANGULAR_LIMIT = 1e-3;

    private PwmRipple() {
    }

    /** Peak-to-peak ripple, A (the formula in the class comment). */
    public static double peakToPeak(double swing, double resistance, double inductance, double onFraction,
            double period) {
        return waveform(swing, resistance, inductance, onFraction, period).peakToPeak();
    }

    /**
     * The whole periodic waveform around its average.
     *
     * @param swing      ΔV, V (2·V_bus bipolar, V_bus unipolar and sign-magnitude)
     * @param resistance R, Ω
     * @param inductance L, H
     * @param onFraction δ in [0, 1]
     * @param period     T_p, s
     */
    public static RippleWaveform waveform(double swing, double resistance, double inductance, double onFraction,
            double period) {
        double d = Math.min(1.0, Math.max(0.0, onFraction));
        double on = d * period;
        double off = period - on;
        if (swing == 0 || on <= 0 || off <= 0) {
            return RippleWaveform.NONE;
        }
        double tau = inductance / resistance;
        if (!(resistance > 0) || period / tau < TRIANGULAR_LIMIT) {
            double pp = swing * d * (1 - d) * period / inductance;
            // Triangle: the lowest point is at the end of the off interval, −(pp/2), highest +pp/2.
            // Each interval is one straight ramp between the extremes: mean 0, mean square pp²/12.
            double square = pp * pp / 12.0;
            return new RippleWaveform(pp, -pp / 2, pp / 2, square, 0, square, 0, square);
        }
        // Asymptotes of the deviation during each interval (relative to the average current).
        double high = (1 - d) * swing / resistance;
        double low = -d * swing / resistance;
        double gOn = -Math.expm1(-on / tau);    // 1 − a_on
        double gOff = -Math.expm1(-off / tau);  // 1 − a_off
        double aOn = 1 - gOn;
        double aOff = 1 - gOff;
        double gAll = gOn + gOff - gOn * gOff; // 1 − a_on·a_off = 1 − e^(−T_p/τ)
        double pp = (swing / resistance) * gOn * gOff / gAll;
        // Deviation at the start of the on interval (its minimum): periodic boundary condition.
        double yMin = (low * gOff + high * gOn * aOff) / gAll;
        double yMax = yMin + pp;
        double cOn = yMin - high;
        double cOff = yMax - low;
        double sumOn = high * high * on + 2 * high * cOn * tau * gOn + cOn * cOn * tau / 2 * gOn * (1 + aOn);
        double sumOff = low * low * off + 2 * low * cOff * tau * gOff + cOff * cOff * tau / 2 * gOff * (1 + aOff);
        double variance = Math.max(0.0, (sumOn + sumOff) / period);
        // First moments of each exponential piece: ∫(a + c·e^(−t/τ))dt = a·t + c·τ·(1 − e^(−t/τ)).
        double meanOn = (high * on + cOn * tau * gOn) / on;
        double meanOff = (low * off + cOff * tau * gOff) / off;
        return new RippleWaveform(pp, yMin, yMax, variance, meanOn, Math.max(0.0, sumOn / on), meanOff,
                Math.max(0.0, sumOff / off));
    }
}
