package kitwright.report;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;
import java.util.zip.ZipException;

/**
 * The entries of a zip archive written as a stream, by name in archive order. Problem: FastExcel's zip writer
 * follows each deflated entry with a ZIP64 data descriptor (sizes in 8 bytes), which {@code java.util.zip
 * .ZipInputStream} misreads. Method: walk the local headers (PKWARE APPNOTE 6.3, sections 4.3.7 and 4.3.9): inflate
 * each entry's data until the deflate stream ends, then step over its data descriptor, whose length (12 bytes, or
 * 20 with ZIP64 sizes, after an optional signature) is told by the header signature that follows it.
 */
final class ZipEntries {
    private static final int LOCAL_HEADER = 0x04034b50;
    private static final int DESCRIPTOR = 0x08074b50;
    private static final int CENTRAL_HEADER = 0x02014b50;

    private ZipEntries() {
    }

    static Map<String, byte[]> of(byte[] zip) throws ZipException {
        ByteBuffer in = ByteBuffer.wrap(zip).order(ByteOrder.LITTLE_ENDIAN);
        Map<String, byte[]> entries = new LinkedHashMap<>();
        int at = 0;
        while (at + 30 <= zip.length && in.getInt(at) == LOCAL_HEADER) {
            boolean descriptor = (in.getShort(at + 6) & 0x8) != 0;
            int method = in.getShort(at + 8) & 0xffff;
            int nameLength = in.getShort(at + 26) & 0xffff;
            int extraLength = in.getShort(at + 28) & 0xffff;
            String name = new String(zip, at + 30, nameLength, StandardCharsets.UTF_8);
            int data = at + 30 + nameLength + extraLength;
            if (method != 8) {
                throw new ZipException("entry " + name + " is not deflated");
            }
            Inflater inflater = new Inflater(true);
            try {
                inflater.setInput(zip, data, zip.length - data);
                ByteArrayOutputStream content = new ByteArrayOutputStream();
                byte[] buffer = new byte[8192];
                while (!inflater.finished()) {
                    int n = inflater.inflate(buffer);
                    if (n == 0 && (inflater.needsInput() || inflater.needsDictionary())) {
                        throw new ZipException("entry " + name + " ends early");
                    }
                    content.write(buffer, 0, n);
                }
                entries.put(name, content.toByteArray());
                at = data + (int) inflater.getBytesRead();
            } catch (DataFormatException e) {
                throw new ZipException("entry " + name + ": " + e.getMessage());
            } finally {
                inflater.end();
            }
            if (descriptor) { // crc and sizes after the data, their signature optional (APPNOTE 4.3.9.3)
                int start = at + 4 <= zip.length && in.getInt(at) == DESCRIPTOR ? at + 4 : at;
                at = next(in, start + 12) ? start + 12 : start + 20;
            }
        }
        return entries;
    }

    /** True when a local or central header starts at {@code at}. */
    private static boolean next(ByteBuffer in, int at) {
        return at + 4 <= in.capacity() && (in.getInt(at) == LOCAL_HEADER || in.getInt(at) == CENTRAL_HEADER);
    }
}
