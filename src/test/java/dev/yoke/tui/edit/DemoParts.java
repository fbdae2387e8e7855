package dev.yoke.tui.edit;

import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;

/** Invented parts for the editor tests (demo data: no real part numbers or makers). */
final class DemoParts {

    private DemoParts() {
    }

    static Motor motor(String id, String label, double resistance) {
        return new Motor(id, label, 24.0, resistance, 20.0, 0.00045, 0.052, 0.12, 4.0, 20.0, 680.0,
                2.1e-5, 3.2, 6.5, 30.0, 900.0, 155.0, 0.0, 0.6, 80.0);
    }

    static PowerSwitch mosfet(String id, String label) {
        return new PowerSwitch(id, label, "power-8", 60.0, 90.0, 360.0, 0.0032, 0.0058, 150.0,
                5.2e-8, 1.5e-8, 1.2e-8, 4.4, 1.1, 9e-10, 0.85, 4.5e-8, 0.9, 175.0, 1.4);
    }
}
