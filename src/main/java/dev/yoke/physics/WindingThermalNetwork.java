package dev.yoke.physics;

/**
 * Two-node thermal network of a motor: winding (capacity C_w) — R_wh — housing (capacity C_h) — R_ha —
 * ambient, the lumped model behind the two thermal time constants of motor datasheets (common practice;
 * e.g. Hughes &amp; Drury, <i>Electric Motors and Drives</i>, ch. 11, motor rating and cooling).
 *
 * <p>State x = (winding rise, housing rise) above ambient obeys dx/dt = A·x + u. Copper loss rises with
 * the winding temperature (IEC 60028): P_w = a + b·x_w, so the slope b enters A and each piece of constant
 * current is an exactly solved linear system. A has real distinct eigenvalues (its off-diagonal product is
 * positive), so the exponential is the spectral sum e^(At) = e^(λ1t)·M1 + e^(λ2t)·M2 (Sylvester's formula for
 * a 2×2 matrix); its integrals give the mean over a piece, and the single stationary point of the winding
 * curve gives the peak within a piece. A repeating cycle's periodic state solves x0 = Φ·x0 + c, i.e.
 * x0 = (I − Φ)⁻¹·c with Φ the product of the pieces' exponentials; it exists when Φ's spectral radius is
 * below 1, else the cycle runs away. A single run starts from ambient and is followed exactly, positive
 * feedback included (a short burst above the steady-state limit is not a runaway); it is reported as a
 * runaway only when the rise passes {@link #MAX_RISE}, where the model stops meaning anything.
 */
public final class WindingThermalNetwork {

    /**
     * Rises are clamped to this many kelvin, and a winding that would rise further is reported as a runaway.
     * Beyond it the model means nothing: the hottest insulation class of IEC 60085 is rated for 250 °C and
     * copper melts at 1085 °C (handbook value). The clamp also keeps every figure finite.
     */
    public static final double MAX_RISE = 1000;

    private final double rWindingHousing;
    private final double rHousingAmbient;
    private final double windingCapacity;
    private final double housingCapacity;

    /**
     * @param rWindingHousing  K/W
     * @param rHousingAmbient  K/W
     * @param windingCapacity  J/K
     * @param housingCapacity  J/K
     */
    public WindingThermalNetwork(double rWindingHousing, double rHousingAmbient, double windingCapacity,
            double housingCapacity) {
        if (!(rWindingHousing > 0 && rHousingAmbient > 0 && windingCapacity > 0 && housingCapacity > 0)) {
            throw new IllegalArgumentException("thermal resistances and capacities must be positive");
        }
        this.rWindingHousing = rWindingHousing;
        this.rHousingAmbient = rHousingAmbient;
        this.windingCapacity = windingCapacity;
        this.housingCapacity = housingCapacity;
    }

    /**
     * Response to piecewise-constant loss.
     *
     * @param durations    s, each &gt; 0
     * @param windingLoss  winding loss when the winding is at ambient (a), W
     * @param lossSlope    rise of winding loss per kelvin of winding rise (b), W/K
     * @param housingLoss  loss fed to the housing node (bearings, brushes), W
     * @param periodic     true: the history repeats forever; false: one run from ambient
     */
    public WindingThermalResponse respond(double[] durations, double[] windingLoss, double[] lossSlope,
            double[] housingLoss, boolean periodic) {
        int n = durations.length;
        Piece[] pieces = new Piece[n];
        for (int k = 0; k < n; k++) {
            pieces[k] = new Piece(durations[k], windingLoss[k], lossSlope[k], housingLoss[k]);
        }
        double x0w = 0;
        double x0h = 0;
        boolean runaway;
        if (periodic) {
            // Monodromy: x_end = Φ·x0 + c over one cycle.
            double p11 = 1, p12 = 0, p21 = 0, p22 = 1, c1 = 0, c2 = 0;
            for (Piece p : pieces) {
                double n11 = p.f11 * p11 + p.f12 * p21;
                double n12 = p.f11 * p12 + p.f12 * p22;
                double n21 = p.f21 * p11 + p.f22 * p21;
                double n22 = p.f21 * p12 + p.f22 * p22;
                double d1 = p.f11 * c1 + p.f12 * c2 + p.g1;
                double d2 = p.f21 * c1 + p.f22 * c2 + p.g2;
                p11 = n11;
                p12 = n12;
                p21 = n21;
                p22 = n22;
                c1 = d1;
                c2 = d2;
            }
            double tr = p11 + p22;
            double radius = (tr + Math.sqrt((p11 - p22) * (p11 - p22) + 4 * p12 * p21)) / 2;
            runaway = !(radius < 1 - 1e-12) || !Double.isFinite(radius);
            if (!runaway) {
                double m11 = 1 - p11, m12 = -p12, m21 = -p21, m22 = 1 - p22;
                double det = m11 * m22 - m12 * m21;
                x0w = (m22 * c1 - m12 * c2) / det;
                x0h = (m11 * c2 - m21 * c1) / det;
            }
        } else {
            runaway = false;
        }
        double[] start = new double[n];
        double[] mean = new double[n];
        double[] peak = new double[n];
        double xw = x0w;
        double xh = x0h;
        for (int k = 0; k < n; k++) {
            Piece p = pieces[k];
            start[k] = clamp(xw);
            mean[k] = clamp(p.meanWinding(xw, xh));
            double rawPeak = p.peakWinding(xw, xh);
            peak[k] = clamp(rawPeak);
            runaway |= !(rawPeak < MAX_RISE);
            double nw = p.f11 * xw + p.f12 * xh + p.g1;
            double nh = p.f21 * xw + p.f22 * xh + p.g2;
            xw = clamp(nw);
            xh = clamp(nh);
        }
        return new WindingThermalResponse(start, mean, peak, runaway);
    }

    private static double clamp(double rise) {
        if (Double.isNaN(rise)) {
            return MAX_RISE;
        }
        return Math.max(-MAX_RISE, Math.min(MAX_RISE, rise));
    }

    /** (e^z − 1)/z, accurate near 0. */
    static double h1(double z) {
        if (Math.abs(z) < 1e-5) {
            return 1 + z / 2 + z * z / 6;
        }
        return Math.expm1(z) / z;
    }

    /** (e^z − 1 − z)/z², accurate near 0. */
    static double h2(double z) {
        if (Math.abs(z) < 1e-3) {
            return 0.5 + z / 6 + z * z / 24 + z * z * z / 120;
        }
        return (Math.expm1(z) - z) / (z * z);
    }

    /** One piece of constant loss: its exponential Φ = e^(At), forcing c = Ψ·u and spectral parts. */
    private final class Piece {
        final double t;
        final double l1;
        final double l2;
        // Spectral projectors M1 = (A − λ2 I)/(λ1 − λ2), M2 = I − M1.
        final double m11, m12, m21, m22;
        final double u1, u2;
        // Spectral parts of the forcing: M1·u (first row) and the rest, the same for every start state.
        final double qa, qb;
        final double f11, f12, f21, f22;
        final double g1, g2;
        // e^(λt), h1(λt) and h2(λt) of both eigenvalues over the whole piece, reused for its mean and end.
        final double e1, e2, k1, k2, j1, j2;

        Piece(double duration, double windingLoss, double slope, double housingLoss) {
            t = duration;
            double a11 = (slope - 1 / rWindingHousing) / windingCapacity;
            double a12 = 1 / (rWindingHousing * windingCapacity);
            double a21 = 1 / (rWindingHousing * housingCapacity);
            double a22 = -(1 / rWindingHousing + 1 / rHousingAmbient) / housingCapacity;
            u1 = windingLoss / windingCapacity;
            u2 = housingLoss / housingCapacity;
            double s = Math.sqrt((a11 - a22) * (a11 - a22) + 4 * a12 * a21);
            double tr = a11 + a22;
            double det = a11 * a22 - a12 * a21;
            if (tr <= 0) {
                l2 = (tr - s) / 2;
                l1 = det / l2;
            } else {
                l1 = (tr + s) / 2;
                l2 = det / l1;
            }
            m11 = (a11 - l2) / s;
            m12 = a12 / s;
            m21 = a21 / s;
            m22 = (a22 - l2) / s;
            qa = m11 * u1 + m12 * u2;
            qb = u1 - qa;
            e1 = Math.exp(l1 * t);
            e2 = Math.exp(l2 * t);
            f11 = e1 * m11 + e2 * (1 - m11);
            f12 = e1 * m12 - e2 * m12;
            f21 = e1 * m21 - e2 * m21;
            f22 = e1 * m22 + e2 * (1 - m22);
            k1 = h1(l1 * t);
            k2 = h1(l2 * t);
            j1 = h2(l1 * t);
            j2 = h2(l2 * t);
            double p1 = t * k1;
            double p2 = t * k2;
            g1 = (p1 * m11 + p2 * (1 - m11)) * u1 + (p1 - p2) * m12 * u2;
            g2 = (p1 - p2) * m21 * u1 + (p1 * m22 + p2 * (1 - m22)) * u2;
        }

        /** Winding rise at time τ into the piece, from the start state's spectral parts pa, pb. */
        double windingAt(double tau, double pa, double pb) {
            return Math.exp(l1 * tau) * pa + Math.exp(l2 * tau) * pb + tau * h1(l1 * tau) * qa + tau * h1(l2 * tau) * qb;
        }

        double meanWinding(double xw, double xh) {
            double pa = m11 * xw + m12 * xh;
            double pb = xw - pa;
            return k1 * pa + k2 * pb + t * (j1 * qa + j2 * qb);
        }

        double peakWinding(double xw, double xh) {
            double pa = m11 * xw + m12 * xh;
            double pb = xw - pa;
            double end = e1 * pa + e2 * pb + t * k1 * qa + t * k2 * qb;
            double best = Math.max(xw, end);
            double ga = l1 * pa + qa;
            double gb = l2 * pb + qb;
            if (ga != 0) {
                double ratio = -gb / ga;
                if (ratio > 0) {
                    double tau = Math.log(ratio) / (l1 - l2);
                    if (tau > 0 && tau < t) {
                        best = Math.max(best, windingAt(tau, pa, pb));
                    }
                }
            }
            return best;
        }
    }
}
