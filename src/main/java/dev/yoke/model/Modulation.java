package dev.yoke.model;

/** How the H-bridge is switched (any power-electronics text, e.g. Mohan, Undeland &amp; Robbins, ch. 7). */
public enum Modulation {
    /** Both legs switch in opposition; the output swings between +V_bus and −V_bus. */
    BIPOLAR("bipolar"),
    /** Both legs switch with carriers 180° apart; the output ripples at twice the switching frequency. */
    UNIPOLAR("unipolar"),
    /** One leg switches, the other holds its low (or high) switch on, chosen by the sign of the voltage. */
    SIGN_MAGNITUDE("sign-magnitude");

    private final String fileName;

    Modulation(String fileName) {
        this.fileName = fileName;
    }

    /** The word used in scenario files. */
    public String fileName() {
        return fileName;
    }

    /** @throws IllegalArgumentException when the word is not one of the three schemes */
    public static Modulation fromFileName(String word) {
        for (Modulation m : values()) {
            if (m.fileName.equalsIgnoreCase(word.trim())) {
                return m;
            }
        }
        throw new IllegalArgumentException("expected bipolar, unipolar or sign-magnitude, got '" + word + "'");
    }
}
