package dev.yoke.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A small CSV reader written straight from RFC 4180 §2 (fields separated by commas, records by
 * CRLF, a field in double quotes may hold commas, CRLF and doubled quotes), independent of
 * Jackson, so that the export is checked by a second reader. It is strict: a bare LF or a
 * quote inside an unquoted field is an error, as the RFC's grammar does not allow them.
 */
final class Rfc4180Reader {

    private Rfc4180Reader() {
    }

    static List<List<String>> read(String text) {
        List<List<String>> records = new ArrayList<>();
        List<String> record = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int i = 0;
        int n = text.length();
        boolean quoted = false;
        boolean fieldStart = true;
        while (i < n) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < n && text.charAt(i + 1) == '"') {
                        field.append('"');
                        i += 2;
                        continue;
                    }
                    quoted = false;
                    i++;
                    if (i < n && text.charAt(i) != ',' && text.charAt(i) != '\r') {
                        throw new IllegalArgumentException("text after a closing quote at " + i);
                    }
                    continue;
                }
                field.append(c);
                i++;
                continue;
            }
            if (c == '"') {
                if (!fieldStart) {
                    throw new IllegalArgumentException("quote inside an unquoted field at " + i);
                }
                quoted = true;
                fieldStart = false;
                i++;
            } else if (c == ',') {
                record.add(field.toString());
                field.setLength(0);
                fieldStart = true;
                i++;
            } else if (c == '\r') {
                if (i + 1 >= n || text.charAt(i + 1) != '\n') {
                    throw new IllegalArgumentException("CR without LF at " + i);
                }
                record.add(field.toString());
                field.setLength(0);
                records.add(record);
                record = new ArrayList<>();
                fieldStart = true;
                i += 2;
            } else if (c == '\n') {
                throw new IllegalArgumentException("bare LF at " + i);
            } else {
                field.append(c);
                fieldStart = false;
                i++;
            }
        }
        if (quoted) {
            throw new IllegalArgumentException("unterminated quote");
        }
        if (!fieldStart || field.length() > 0 || !record.isEmpty()) {
            record.add(field.toString());
            records.add(record);
        }
        return records;
    }
}
