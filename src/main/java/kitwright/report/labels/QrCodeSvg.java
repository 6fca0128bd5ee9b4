package kitwright.report.labels;

import com.google.zxing.BarcodeFormat;
import com.google.zxing.EncodeHintType;
import com.google.zxing.WriterException;
import com.google.zxing.common.BitMatrix;
import com.google.zxing.qrcode.QRCodeWriter;
import com.google.zxing.qrcode.decoder.ErrorCorrectionLevel;
import java.util.Map;
import kitwright.report.Svg;

/**
 * A QR code as inline SVG, so a label sheet prints without images or network. ZXing's {@link QRCodeWriter}
 * (ISO/IEC 18004) chooses the smallest symbol for the text at error correction level M (15 % of the codewords
 * recoverable, enough for a smudged or scuffed label); this class only draws its modules: one path, one unit
 * square per dark module, runs of a row merged, inside the four-module quiet zone the standard asks for.
 */
public final class QrCodeSvg {
    /** Quiet zone of ISO/IEC 18004, in modules. */
    static final int QUIET_ZONE = 4;

    private QrCodeSvg() {
    }

    /**
     * The code of {@code text} (UTF-8) as an SVG element {@code sizeMm} wide and high.
     *
     * @throws IllegalArgumentException when the text does not fit a QR code
     */
    public static String of(String text, double sizeMm) {
        BitMatrix modules = modules(text);
        int side = modules.getWidth() + 2 * QUIET_ZONE;
        StringBuilder path = new StringBuilder();
        for (int y = 0; y < modules.getHeight(); y++) {
            int x = 0;
            while (x < modules.getWidth()) {
                if (!modules.get(x, y)) {
                    x++;
                    continue;
                }
                int run = x;
                while (run < modules.getWidth() && modules.get(run, y)) {
                    run++;
                }
                path.append('M').append(x + QUIET_ZONE).append(' ').append(y + QUIET_ZONE)
                        .append('h').append(run - x).append("v1h-").append(run - x).append('z');
                x = run;
            }
        }
        String size = Svg.number(sizeMm) + "mm";
        return new Svg().open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "qr", "viewBox",
                        "0 0 " + side + " " + side, "width", size, "height", size, "shape-rendering", "crispEdges",
                        "role", "img", "aria-label", "QR code: " + text)
                .rect(0, 0, side, side, "fill", "#ffffff")
                .empty("path", "d", path.toString(), "fill", "#000000")
                .close("svg").toString();
    }

    /** The modules of the symbol, one matrix cell per module, no quiet zone. */
    static BitMatrix modules(String text) {
        Map<EncodeHintType, Object> hints = Map.of(EncodeHintType.ERROR_CORRECTION, ErrorCorrectionLevel.M,
                EncodeHintType.CHARACTER_SET, "UTF-8", EncodeHintType.MARGIN, 0);
        try {
            return new QRCodeWriter().encode(text, BarcodeFormat.QR_CODE, 0, 0, hints);
        } catch (WriterException e) {
            throw new IllegalArgumentException("text does not fit a QR code: " + text, e);
        }
    }
}
