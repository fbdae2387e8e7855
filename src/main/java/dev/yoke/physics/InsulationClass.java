package dev.yoke.physics;

/**
 * Thermal classes of electrical insulation and their limiting temperatures (IEC 60085, "Electrical
 * insulation — Thermal evaluation and designation"). A winding's hottest spot must stay below its class.
 */
public enum InsulationClass {
    A(105),
    E(120),
    B(130),
    F(155),
    H(180),
    N(200),
    R(220);

    private final double limitTemp;

    InsulationClass(double limitTemp) {
        this.limitTemp = limitTemp;
    }

    /** Limiting temperature of the class, °C. */
    public double limitTemp() {
        return limitTemp;
    }

    /** @throws IllegalArgumentException when the letter names no class */
    public static InsulationClass fromLetter(String letter) {
        for (InsulationClass c : values()) {
            if (c.name().equalsIgnoreCase(letter.trim())) {
                return c;
            }
        }
        throw new IllegalArgumentException("expected an insulation class A, E, B, F, H, N or R, got '" + letter + "'");
    }
}
