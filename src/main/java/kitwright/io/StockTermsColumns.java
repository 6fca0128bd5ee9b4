package kitwright.io;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import kitwright.model.Material;
import kitwright.model.PriceBasis;
import kitwright.model.Section;
import kitwright.model.StockTerms;

/**
 * The tube catalog's optional buying columns, {@code price_basis,currency,grade,standard,supplier}, for one catalog.
 * {@code price_basis} is {@code piece} (the default), {@code m} or {@code kg}; a price per kg needs the material's
 * density, so it is invalid without a materials catalog. {@code currency} is an ISO 4217 code (three letters) or
 * blank. {@code grade}, {@code standard} and {@code supplier} are names (one line, no formula start) or blank.
 * Every row of one section must give the same currency: the cutting stage adds the prices of a section's
 * rows, mill and rack, into one objective, and a sum of two currencies means nothing.
 */
final class StockTermsColumns {
    private static final Pattern CURRENCY = Pattern.compile("[A-Za-z]{3}");

    private final Map<String, Material> materials;
    private final Path materialsFile;
    private final Map<String, String> currencyBySection = new HashMap<>();
    private final Map<String, Integer> currencyLine = new HashMap<>();

    /** @param materials the known materials, or null when there are none (or they could not be read) */
    StockTermsColumns(Map<String, Material> materials, Path materialsFile) {
        this.materials = materials;
        this.materialsFile = materialsFile;
    }

    /** The row's terms; a problem on the row for an unknown basis, a malformed currency or kg without materials. */
    StockTerms read(CsvRow row, Double price) {
        PriceBasis basis = PriceBasis.PIECE;
        if (!row.blank("price_basis")) {
            Optional<PriceBasis> parsed = PriceBasis.parse(row.text("price_basis"));
            if (parsed.isEmpty()) {
                row.problem("price_basis", "'" + row.text("price_basis") + "' is not a price basis (expected piece,"
                        + " for a price per stock piece, m, for a price per metre, or kg, for a price per"
                        + " kilogram)");
            } else {
                basis = parsed.get();
            }
        }
        if (basis == PriceBasis.KILOGRAM && materials == null && !materialsFileExists()) {
            row.problem("price_basis", "a price per kg needs the material's density, and there is no materials"
                    + " catalog (expected materials.csv beside the tube catalog, \"materials\" in kit.json or"
                    + " --materials FILE; or price_basis piece or m)");
        }
        String currency = row.text("currency").trim();
        if (!currency.isEmpty() && !CURRENCY.matcher(currency).matches()) {
            row.problem("currency", "'" + currency + "' is not a currency code (expected an ISO 4217 code of three"
                    + " letters, e.g. EUR, GBP, USD, or blank)");
        }
        return new StockTerms(basis, price, currency.toUpperCase(Locale.ROOT),
                name(row, "grade", "the steel grade, e.g. S355J2H"),
                name(row, "standard", "the product standard, e.g. EN 10219"),
                name(row, "supplier", "the supplier's name"));
    }

    /**
     * An optional name column: blank, or a name as {@link Names} allows, since it goes onto order.csv and the
     * purchase order as it is; empty after reporting a bad one.
     */
    private static String name(CsvRow row, String column, String expected) {
        String text = row.text(column);
        if (text.isEmpty()) {
            return text;
        }
        Optional<String> problem = Names.problem(text, expected);
        problem.ifPresent(p -> row.problem(column, p));
        return problem.isPresent() ? "" : text;
    }

    /** False, with a problem on the row, when a section's rows give two currencies. */
    boolean sameCurrency(CsvRow row, String section, StockTerms terms) {
        String first = currencyBySection.putIfAbsent(section, terms.currency());
        currencyLine.putIfAbsent(section, row.line());
        if (first == null || first.equals(terms.currency())) {
            return true;
        }
        row.problem("currency", section + " is priced in " + shown(terms.currency()) + " here but in "
                + shown(first) + " on " + row.at(currencyLine.get(section)) + " (expected one currency for every row"
                + " of a section: the plan adds the prices of a section's stock lengths, mill and rack)");
        return false;
    }

    /**
     * The price of one piece of {@code lengthMm} on the row's basis; null without a quoted price, or for a price per
     * kg when the material's density is unknown (a problem reported elsewhere: the materials file or the material).
     */
    Double perPiece(Section section, double lengthMm, StockTerms terms) {
        if (terms.quotedPrice() == null) {
            return null;
        }
        double massPerMetre = 0;
        if (terms.basis() == PriceBasis.KILOGRAM) {
            Material material = materials == null ? null : materials.get(section.material());
            if (material == null) {
                return null;
            }
            massPerMetre = section.massPerMetreKg(material.densityKgM3());
        }
        return terms.basis().perPiece(terms.quotedPrice(), lengthMm, massPerMetre);
    }

    private boolean materialsFileExists() {
        return materialsFile != null && Files.exists(materialsFile);
    }

    private static String shown(String currency) {
        return currency.isEmpty() ? "no stated currency (blank)" : currency;
    }
}
