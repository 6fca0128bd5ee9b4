package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import kitwright.model.Kit;
import kitwright.model.PriceBasis;
import kitwright.model.StockLength;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The tube catalog's buying columns: price basis, currency, grade, standard and supplier (figures worked by hand). */
class StockTermsColumnsTest {
    private static final String HEADER =
            "section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin,price_basis,currency,grade,"
                    + "standard,supplier\n";

    @Test
    void pricesPerMetreAndPerKilogramAreTurnedIntoPricesPerPiece(@TempDir Path dir) throws Exception {
        Kit kit = KitReader.read(kitWith(dir, HEADER
                + "CHS 48.3x3.2,steel,48.3,3.2,6000,5.10,,mill,m,eur,S355J2H,EN 10210-1,Mill A\n"
                + "CHS 48.3x3.2,steel,48.3,3.2,3200,2.00,3,rack,,EUR,,,\n"
                + "CHS 33.7x2.6,steel,33.7,2.6,6000,1.20,,mill,kg,GBP,S235JRH,,Mill B\n"));
        StockLength perMetre = kit.catalog().stockFor("CHS 48.3x3.2").get(0);
        assertThat(perMetre.price()).as("5.10 per m x 6 m").isCloseTo(30.60, within(1e-9));
        assertThat(perMetre.terms().basis()).isEqualTo(PriceBasis.METRE);
        assertThat(perMetre.terms().quotedPrice()).isEqualTo(5.10);
        assertThat(perMetre.terms().currency()).as("ISO 4217 codes upper-cased").isEqualTo("EUR");
        assertThat(perMetre.terms().grade()).isEqualTo("S355J2H");
        assertThat(perMetre.terms().standard()).isEqualTo("EN 10210-1");
        assertThat(perMetre.terms().supplier()).isEqualTo("Mill A");
        StockLength rack = kit.catalog().stockFor("CHS 48.3x3.2").get(1);
        assertThat(rack.terms().basis()).as("piece is the default").isEqualTo(PriceBasis.PIECE);
        assertThat(rack.price()).isEqualTo(2.0);
        StockLength perKilogram = kit.catalog().stockFor("CHS 33.7x2.6").get(0);
        // M = pi (D - T) T rho 1e-6 = pi x 31.1 x 2.6 x 7850e-6 = 1.99411 kg/m (EN 10219-2 tables give 1.99 kg/m)
        double massPerMetre = Math.PI * 31.1 * 2.6 * 7850e-6;
        assertThat(massPerMetre).isCloseTo(1.99, within(0.005));
        assertThat(perKilogram.price()).as("1.20 per kg x 6 m x 1.994 kg/m")
                .isCloseTo(1.20 * 6 * massPerMetre, within(1e-9)).isCloseTo(14.36, within(0.005));
    }

    @Test
    void aPricePerKilogramWithoutMaterialsIsInvalidInput(@TempDir Path dir) {
        Path stock = KitFiles.write(dir, "stock.csv", HEADER
                + "CHS 33.7x2.6,steel,33.7,2.6,6000,1.20,,mill,kg,,,,\n");
        assertThatThrownBy(() -> TubeCatalogReader.read(stock)).isInstanceOf(InvalidInputException.class)
                .hasMessageContaining("stock.csv:2: price_basis: a price per kg needs the material's density");
    }

    @Test
    void oneSectionInTwoCurrenciesIsInvalidInput(@TempDir Path dir) {
        Path stock = KitFiles.write(dir, "stock.csv", HEADER
                + "CHS 48.3x3.2,steel,48.3,3.2,6000,30,,mill,,EUR,,,\n"
                + "CHS 48.3x3.2,steel,48.3,3.2,12000,50,,mill,,GBP,,,\n"
                + "CHS 33.7x2.6,steel,33.7,2.6,6000,17,,mill,,GBP,,,\n");
        assertThatThrownBy(() -> TubeCatalogReader.read(stock)).isInstanceOf(InvalidInputException.class)
                .hasMessageContaining("stock.csv:3: currency: CHS 48.3x3.2 is priced in GBP here but in EUR on line 2")
                .hasMessageNotContaining("stock.csv:4");
    }

    @Test
    void anUnknownBasisOrAMalformedCurrencyIsInvalidInput(@TempDir Path dir) {
        Path stock = KitFiles.write(dir, "stock.csv", HEADER
                + "CHS 48.3x3.2,steel,48.3,3.2,6000,30,,mill,tonne,€,,,\n");
        assertThatThrownBy(() -> TubeCatalogReader.read(stock)).isInstanceOfSatisfying(InvalidInputException.class,
                e -> assertThat(e.problems()).extracting(Problem::toString).anySatisfy(
                        p -> assertThat(p).contains("stock.csv:2: price_basis: 'tonne' is not a price basis"))
                        .anySatisfy(p -> assertThat(p).contains("stock.csv:2: currency: '€' is not a currency code")));
    }

    private static Path kitWith(Path dir, String stock) {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,2500,2\n");
        KitFiles.write(dir, "stock.csv", stock);
        return dir;
    }
}
