package kitwright.report.labels;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import com.github.mustachejava.MustacheFactory;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import kitwright.io.Figures;

/**
 * {@code labels.html}: the labels of a plan on A4 label sheets of 3 x 8 labels, 70 x 37 mm each, edge to edge
 * (a common self-adhesive sheet; common practice). Piece labels come first in saw order, then the remnant tags.
 * Each label carries its QR code ({@link QrCodeSvg}, 25 mm) and the same fields as text; spares and miscut
 * allowance carry their kind in a dark band, so they stand apart from the kit's own bars. The page is one file
 * with inline SVG and no script, font or image from elsewhere.
 */
public final class LabelsHtml {
    public static final String FILE = "labels.html";
    static final int COLUMNS = 3;
    static final int ROWS = 8;
    static final double CODE_MM = 25;
    private static final MustacheFactory TEMPLATES = new DefaultMustacheFactory("kitwright/labels");

    /** One label as the template draws it: a title line, text lines, an optional band, the code. */
    record LabelView(String kind, String title, List<String> lines, String band, String code, String text) {
    }

    record Sheet(int number, List<LabelView> labels) {
    }

    record Page(String kitName, String date, String summary, int sheetCount, List<Sheet> sheets) {
    }

    private LabelsHtml() {
    }

    public static String render(String kitName, String date, LabelSet labels) {
        List<LabelView> views = new ArrayList<>();
        labels.pieces().forEach(p -> views.add(view(p)));
        labels.remnants().forEach(r -> views.add(view(r)));
        List<Sheet> sheets = new ArrayList<>();
        int perSheet = COLUMNS * ROWS;
        for (int from = 0; from < views.size(); from += perSheet) {
            sheets.add(new Sheet(sheets.size() + 1, views.subList(from, Math.min(views.size(), from + perSheet))));
        }
        String summary = labels.pieces().size() + " piece label" + (labels.pieces().size() == 1 ? "" : "s")
                + " and " + labels.remnants().size() + " remnant tag" + (labels.remnants().size() == 1 ? "" : "s")
                + " on " + sheets.size() + " A4 sheet" + (sheets.size() == 1 ? "" : "s") + " of "
                + COLUMNS + " \u00D7 " + ROWS + " labels, 70 \u00D7 37 mm";
        Mustache mustache = TEMPLATES.compile("labels.mustache");
        StringWriter out = new StringWriter();
        try {
            mustache.execute(out, new Page(kitName, date, summary, sheets.size(), sheets)).flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    private static LabelView view(PieceLabel p) {
        String tolerance = p.toleranceMm() == null ? "" : " \u00B1\u2009" + Figures.plain(p.toleranceMm());
        String travels = p.bundle().isEmpty() ? "not bundled"
                : "bundle " + p.bundle() + (p.crate().isEmpty() ? "" : " \u00B7 crate " + p.crate());
        List<String> lines = List.of(p.section(), Figures.plain(p.lengthMm()) + " mm" + tolerance,
                "piece " + p.piece() + " of " + p.ofPieces(), travels);
        String band = "cut".equals(p.kind()) ? null : p.kind();
        return new LabelView(p.kind(), p.mark(), lines, band, QrCodeSvg.of(p.code(), CODE_MM), p.code());
    }

    private static LabelView view(RemnantTag r) {
        List<String> lines = List.of(r.section(), Figures.plain(r.lengthMm()) + " mm",
                "from stock piece " + r.stockPiece(), r.date() + " \u00B7 " + r.kit());
        return new LabelView("remnant", "Remnant", lines, "back to the rack", QrCodeSvg.of(r.code(), CODE_MM),
                r.code());
    }
}
