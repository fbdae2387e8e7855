package dev.yoke.catalog;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;

/**
 * Generates hostile and broken documents for the loader fuzz test: random YAML-ish text, and
 * mutations of valid files (byte flips, truncations, inserted aliases and anchors, deep nesting,
 * huge and odd numbers, random units, type confusion, long lines).
 */
final class FuzzDocuments {

    /** Fragments that mean something to a YAML parser or to the unit reader. */
    private static final String[] TOKENS = {
        "- ", ": ", "? ", "\n", "\n  ", "\n    ", "\t", "  ", "#", " # c", "'", "\"", "|", "|-", ">", ">+", "[", "]",
        "{", "}", ",", "&a ", "*a", "&b ", "*b", "<<: *a", "!!binary ", "!!str ", "!!int ", "!!float ", "!!map ",
        "!!seq ", "!custom ", "%YAML 1.2\n", "%TAG ! tag:x,2000:\n", "---\n", "...\n", "~", "null", "true", "yes",
        "off", "NaN", ".nan", ".inf", "-.inf", "0x1F", "0o17", "0b101", "1_000", "1e308", "1e309", "-1e-400",
        "4.7 mH", "3 kOhm", "12 V", "2 A", "0.5 ohm", "155 degC", "-300 degC", "1 K", "3000 rpm", "300 rpm/V",
        "0.02 N*m/A", "0.02 V/krpm", "5 g*cm^2", "20 kHz", "25 nC", "1 nF", "1 µs", "3 °C/W", "1.2 K/W",
        "1e-12 pF", "5 MΩ", "\u00b5", "\u03a9", "\u2126", "\u00b0", "\u0000", "\u0007", "\u0085", "\u2028",
        "\ufeff", "\ud83d\udd27", "\ud800", "\\", "\\x", "\r\n", "\r", "motors:", "switches:", "id:", "label:",
        "bench:", "profile:", "segments:", "limits:", "name:", "modulation: bipolar", "repeat: true",
    };

    /** Values that stress number and unit reading. */
    private static final String[] QUANTITIES = {
        "0", "-0", "-1", "1e400", "-1e400", "1e-400", "4.9e-324", "1.7976931348623157e308",
        "99999999999999999999999999999999999999999999999999", "1" + "0".repeat(2000), "0." + "0".repeat(2000) + "1",
        "1e2147483648", "1e-2147483649", "NaN", "Infinity", "-Infinity", "inf", "0x10", "1/2", "1,5", "½", "٣",
        "1e", "e5", ".", "-", "+", "1..2", "1 2", "1 mmH", "1 kk", "1 Mohm", "1 mOhm", "1 uH", "1 µH", "1 μH",
        "1 meg", "1 MEG", "1 h", "1 min", "1 %", "150 %", "1 C", "25 C", "25 F", "1 rad/s", "1 rps", "1 deg/s",
        "1 kg*m^2", "1 kgm²", "1 N·m", "1 N m", "1 Nm/A", "1 V*s/rad", "1 rpm/V", "-1 rpm/V", "0 rpm/V", "1 W",
        "1 J", "1 Hz", "1 GHz", "1 THz", "1 pHz", "1 K/W", "-5 K/W", "1 degC/W", "1 g", "1 kg", "1 t", "1 lb",
        "[1, 2]", "{a: 1}", "", "~", "\"4.7 mH\"", "'12'", "true", "12 V 3 A", "12V", "12 v", "12 Volt",
    };

    private static final String[] UNITS = {
        "", "V", "A", "Ohm", "ohm", "Ω", "H", "F", "C", "s", "Hz", "W", "J", "K", "degC", "°C", "K/W", "N*m",
        "Nm/A", "V/krpm", "rpm", "rpm/V", "rad/s", "kg*m^2", "g*cm^2", "g", "%", "furlong", "m", "µ", "x/y/z",
    };

    private static final String[] PREFIXES = {"", "p", "n", "u", "µ", "m", "k", "M", "G", "T", "a", "meg"};

    private FuzzDocuments() {
    }

    /** Files to mutate: the bundled catalog, the demo scenarios, every YAML file of the test resources (the broken-file corpus among them), and {@code builtIn}. */
    static List<String> seeds(List<String> builtIn) {
        List<String> seeds = new ArrayList<>(builtIn);
        for (String folder : List.of("catalog", "demo-data", "src/main/resources", "src/test/resources")) {
            Path root = Path.of(folder);
            if (!Files.isDirectory(root)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(root)) {
                for (Path file : files.filter(p -> p.toString().endsWith(".yaml") || p.toString().endsWith(".yml"))
                        .sorted().toList()) {
                    byte[] bytes = Files.readAllBytes(file);
                    if (bytes.length < 2_000_000) {
                        seeds.add(new String(bytes, StandardCharsets.UTF_8));
                    }
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return seeds;
    }

    /** One document: a mutated seed most of the time, sometimes random text or a targeted bomb. */
    static byte[] document(Random random, List<String> seeds) {
        int kind = random.nextInt(100);
        if (kind < 10) {
            return randomText(random).getBytes(StandardCharsets.UTF_8);
        }
        if (kind < 14) {
            return bomb(random, seeds.get(random.nextInt(seeds.size()))).getBytes(StandardCharsets.UTF_8);
        }
        String text = seeds.get(random.nextInt(seeds.size()));
        int textMutations = 1 + random.nextInt(3);
        for (int i = 0; i < textMutations; i++) {
            text = mutate(random, text);
        }
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        if (random.nextInt(4) == 0) {
            bytes = byteMutation(random, bytes);
        }
        return bytes;
    }

    private static String randomText(Random random) {
        StringBuilder out = new StringBuilder();
        int pieces = random.nextInt(200);
        for (int i = 0; i < pieces; i++) {
            switch (random.nextInt(4)) {
                case 0 -> out.append(TOKENS[random.nextInt(TOKENS.length)]);
                case 1 -> out.append(QUANTITIES[random.nextInt(QUANTITIES.length)]);
                case 2 -> out.append(word(random));
                default -> out.appendCodePoint(random.nextInt(random.nextBoolean() ? 0x80 : 0x3000));
            }
        }
        return out.toString();
    }

    private static String word(Random random) {
        String letters = "abcdefghijklmnopqrstuvwxyz_-.+";
        StringBuilder w = new StringBuilder();
        int length = 1 + random.nextInt(12);
        for (int i = 0; i < length; i++) {
            w.append(letters.charAt(random.nextInt(letters.length())));
        }
        return w.toString();
    }

    private static String quantity(Random random) {
        if (random.nextBoolean()) {
            return QUANTITIES[random.nextInt(QUANTITIES.length)];
        }
        double magnitude = Math.pow(10, random.nextInt(80) - 40) * random.nextDouble();
        String number = random.nextInt(5) == 0 ? Double.toString(-magnitude) : Double.toString(magnitude);
        return number + (random.nextBoolean() ? " " : "") + PREFIXES[random.nextInt(PREFIXES.length)]
                + UNITS[random.nextInt(UNITS.length)];
    }

    /** One text-level change. */
    static String mutate(Random random, String text) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        int at = lines.isEmpty() ? 0 : random.nextInt(lines.size());
        switch (random.nextInt(13)) {
            case 0 -> { // replace a value with an odd quantity
                String line = lines.get(at);
                int colon = line.indexOf(": ");
                lines.set(at, colon < 0 ? line + " " + quantity(random) : line.substring(0, colon + 2) + quantity(random));
            }
            case 1 -> { // truncate
                return text.substring(0, random.nextInt(text.length() + 1));
            }
            case 2 -> { // insert a token
                int position = random.nextInt(text.length() + 1);
                return text.substring(0, position) + TOKENS[random.nextInt(TOKENS.length)] + text.substring(position);
            }
            case 3 -> lines.add(at, lines.get(at)); // duplicate a line (duplicate keys, duplicate ids)
            case 4 -> lines.remove(at);
            case 5 -> { // swap two lines
                int other = random.nextInt(lines.size());
                String swap = lines.get(at);
                lines.set(at, lines.get(other));
                lines.set(other, swap);
            }
            case 6 -> { // shift indentation
                String line = lines.get(at);
                lines.set(at, random.nextBoolean() ? " ".repeat(1 + random.nextInt(5)) + line : line.stripLeading());
            }
            case 7 -> { // anchor a value and alias it elsewhere
                String line = lines.get(at);
                int colon = line.indexOf(": ");
                if (colon >= 0) {
                    lines.set(at, line.substring(0, colon + 2) + "&x " + line.substring(colon + 2));
                    int other = random.nextInt(lines.size());
                    String target = lines.get(other);
                    int otherColon = target.indexOf(": ");
                    lines.set(other, otherColon < 0 ? target + " *x" : target.substring(0, otherColon + 2) + "*x");
                }
            }
            case 8 -> { // type confusion: a list or a section where a value belongs, or the reverse
                String line = lines.get(at);
                int colon = line.indexOf(':');
                String replacement = List.of("[]", "{}", "[1, 2, 3]", "{id: x}", "~", "\n      - a\n      - b",
                        "\n      nested: 1").get(random.nextInt(7));
                lines.set(at, colon < 0 ? replacement : line.substring(0, colon + 1) + " " + replacement);
            }
            case 9 -> { // a long line
                lines.set(at, lines.get(at) + "x".repeat(random.nextInt(200_000)));
            }
            case 10 -> { // random words in place of keys
                String line = lines.get(at);
                int colon = line.indexOf(':');
                if (colon >= 0) {
                    String indent = line.substring(0, line.length() - line.stripLeading().length());
                    lines.set(at, indent + word(random) + line.substring(colon));
                }
            }
            case 11 -> { // tabs and odd line ends
                lines.set(at, lines.get(at).replace("  ", random.nextBoolean() ? "\t" : "\r"));
            }
            default -> lines.add(at, randomText(random));
        }
        return String.join("\n", lines);
    }

    private static byte[] byteMutation(Random random, byte[] bytes) {
        byte[] out = bytes.clone();
        if (out.length == 0) {
            return new byte[] {(byte) random.nextInt(256)};
        }
        int flips = 1 + random.nextInt(8);
        for (int i = 0; i < flips; i++) {
            int position = random.nextInt(out.length);
            out[position] = random.nextBoolean() ? (byte) random.nextInt(256) : (byte) (out[position] ^ (1 << random.nextInt(8)));
        }
        if (random.nextInt(8) == 0) {
            byte[] withMark = new byte[out.length + 2];
            withMark[0] = (byte) 0xFF;
            withMark[1] = (byte) 0xFE;
            System.arraycopy(out, 0, withMark, 2, out.length);
            return withMark;
        }
        return out;
    }

    /** Documents aimed at parser limits: alias expansion, deep nesting, huge sizes. */
    private static String bomb(Random random, String seed) {
        switch (random.nextInt(6)) {
            case 0 -> { // exponential alias expansion ("billion laughs")
                StringBuilder out = new StringBuilder("a0: &a0 [\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\"]\n");
                for (int i = 1; i < 12; i++) {
                    out.append("a").append(i).append(": &a").append(i).append(" [");
                    for (int j = 0; j < 9; j++) {
                        out.append(j == 0 ? "" : ",").append("*a").append(i - 1);
                    }
                    out.append("]\n");
                }
                return out.append("motors: *a11\n").toString();
            }
            case 1 -> { // deep flow nesting
                int depth = 100 + random.nextInt(20_000);
                return "motors: " + "[".repeat(depth) + "]".repeat(random.nextBoolean() ? depth : depth / 2) + "\n";
            }
            case 2 -> { // deep block nesting
                StringBuilder out = new StringBuilder("motors:\n");
                int depth = 50 + random.nextInt(2000);
                for (int i = 0; i < depth; i++) {
                    out.append(" ".repeat(i + 1)).append("- ").append('\n');
                }
                return out.toString();
            }
            case 3 -> { // a recursive anchor
                return "motors: &m\n  - id: a\n    self: *m\n" + seed;
            }
            case 4 -> { // many documents and directives
                return "%YAML 1.1\n---\n" + seed + "\n---\n" + seed + "\n...\n";
            }
            default -> { // one huge scalar
                return "motors:\n  - id: " + "a".repeat(1 + random.nextInt(3_000_000)) + "\n";
            }
        }
    }
}
