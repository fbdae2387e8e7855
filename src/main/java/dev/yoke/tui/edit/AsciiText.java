package dev.yoke.tui.edit;

/**
 * Unit symbols and marks spelt in ASCII for terminals whose locale is not UTF-8 (Java then
 * prints '?' for anything else): {@code Ω} becomes {@code Ohm}, {@code °C} {@code degC},
 * {@code ·} {@code *}, {@code ²} {@code ^2}, {@code µ} {@code u}, {@code ≥} {@code >=}. These are
 * the ASCII spellings the unit reader accepts, so what is shown can be typed back.
 */
final class AsciiText {

    private AsciiText() {
    }

    /** {@code text} unchanged when {@code unicode}, else with the replacements above. */
    static String of(String text, boolean unicode) {
        if (unicode || text == null) {
            return text;
        }
        StringBuilder b = new StringBuilder(text.length() + 8);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case 'Ω', '\u2126' -> b.append("Ohm");
                case '°' -> b.append("deg");
                case '·', '×' -> b.append('*');
                case '²' -> b.append("^2");
                case 'µ', 'μ' -> b.append('u');
                case '≥' -> b.append(">=");
                case '≤' -> b.append("<=");
                case '…' -> b.append("...");
                case '−', '–', '—' -> b.append('-');
                default -> b.append(c < 128 ? c : '?');
            }
        }
        return b.toString();
    }
}
