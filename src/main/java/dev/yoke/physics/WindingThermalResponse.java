package dev.yoke.physics;

/**
 * Winding temperature rises above ambient, in kelvin, piece by piece of a loss history.
 *
 * @param startRise winding rise at the start of each piece
 * @param meanRise  time-average winding rise over each piece
 * @param peakRise  hottest winding rise within each piece
 * @param runaway   true when the copper loss grows with temperature faster than the network sheds it:
 *                  no periodic state exists, or a single run heats beyond any meaningful temperature
 */
public record WindingThermalResponse(double[] startRise, double[] meanRise, double[] peakRise, boolean runaway) {

    public WindingThermalResponse {
        startRise = startRise.clone();
        meanRise = meanRise.clone();
        peakRise = peakRise.clone();
    }

    @Override
    public double[] startRise() {
        return startRise.clone();
    }

    @Override
    public double[] meanRise() {
        return meanRise.clone();
    }

    @Override
    public double[] peakRise() {
        return peakRise.clone();
    }

    /** Hottest rise over the whole history, K. */
    public double maxRise() {
        double max = 0;
        for (double p : peakRise) {
            max = Math.max(max, p);
        }
        return max;
    }
}
