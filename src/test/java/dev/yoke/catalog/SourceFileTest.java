package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

class SourceFileTest {

    /** The UTF-8 form of the byte-order mark U+FEFF: EF BB BF (RFC 3629, section 6, "Byte order mark"). */
    private static final byte[] UTF8_BYTE_ORDER_MARK = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    @Test
    void leadingUtf8ByteOrderMarkIsRemoved() {
        byte[] body = "# motors\nmotors: []\n".getBytes(StandardCharsets.UTF_8);
        byte[] marked = new byte[UTF8_BYTE_ORDER_MARK.length + body.length];
        System.arraycopy(UTF8_BYTE_ORDER_MARK, 0, marked, 0, UTF8_BYTE_ORDER_MARK.length);
        System.arraycopy(body, 0, marked, UTF8_BYTE_ORDER_MARK.length, body.length);
        assertEquals("# motors\nmotors: []\n", SourceFile.textOf(marked));
        assertEquals("", SourceFile.textOf(UTF8_BYTE_ORDER_MARK), "a file holding only the mark is empty text");
    }

    @Test
    void textWithoutByteOrderMarkIsUnchanged() {
        String text = "label: \"Ø 42 mm, 4.7 mΩ\"\r\n";
        assertEquals(text, SourceFile.textOf(text.getBytes(StandardCharsets.UTF_8)));
        assertEquals("", SourceFile.textOf(new byte[0]));
        // Only a leading mark is a byte-order mark; inside the text U+FEFF is a character of the text.
        String inner = "a\uFEFFb";
        assertEquals(inner, SourceFile.textOf(inner.getBytes(StandardCharsets.UTF_8)));
    }
}
