package kitwright.loading;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import kitwright.io.VehicleCatalogReader;
import kitwright.model.VehicleType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The vehicle catalog against the published limits: EU Directive 96/53/EC as amended by 2015/719 (width 2.55 m,
 * articulated vehicle 16.5 m, 40 t gross for 5 axles) and ISO 668 container sizes (1CC 20 ft outside 6058 x 2438 x
 * 2591 mm, 1AA 40 ft 12192 x 2438 x 2591 mm, rated gross 30 480 kg), as src/docs/sources.md quotes them.
 */
class VehicleCatalogTest {
    private static final Path CATALOG = Path.of("stock-catalogs", "vehicles.csv");

    static void withinPublishedLimits(List<VehicleType> vehicles) {
        assertThat(vehicles).isNotEmpty();
        for (VehicleType v : vehicles) {
            String name = v.name().toLowerCase(Locale.ROOT);
            // EU 96/53/EC: no road vehicle wider than 2.55 m, so no load space either
            assertThat(v.deckWidthMm()).as("%s deck width (96/53/EC: 2550 mm)", v.name()).isLessThanOrEqualTo(2550);
            // EU 96/53/EC: articulated vehicle 16.5 m long overall
            assertThat(v.deckLengthMm()).as("%s deck length (96/53/EC: 16.5 m)", v.name()).isLessThan(16_500);
            // EU 96/53/EC: 40 t gross for a 5-axle combination; the payload is what is left after the tare
            assertThat(v.payloadKg()).as("%s payload (96/53/EC: 40 t gross)", v.name()).isLessThan(40_000);
            assertThat(v.deckHeightMm()).isPositive();
            if (name.matches(".*\\b20\\s*ft.*") || name.contains("20ft")) {
                // ISO 668 1CC
                assertThat(v.deckLengthMm()).as("ISO 668 1CC outside length").isLessThan(6058);
                assertThat(v.deckWidthMm()).as("ISO 668 1CC outside width").isLessThan(2438);
                assertThat(v.deckHeightMm()).as("ISO 668 1CC outside height").isLessThan(2591);
                assertThat(v.payloadKg()).as("ISO 668 rated gross").isLessThan(30_480);
            }
            if (name.matches(".*\\b40\\s*ft.*") || name.contains("40ft")) {
                // ISO 668 1AA
                assertThat(v.deckLengthMm()).as("ISO 668 1AA outside length").isLessThan(12_192);
                assertThat(v.deckWidthMm()).as("ISO 668 1AA outside width").isLessThan(2438);
                assertThat(v.deckHeightMm()).as("ISO 668 1AA outside height").isLessThan(2591);
                assertThat(v.payloadKg()).as("ISO 668 rated gross").isLessThan(30_480);
            }
        }
    }

    @Test
    @DisplayName("the shipped catalog stock-catalogs/vehicles.csv: EU 96/53/EC and ISO 668")
    void shippedCatalog() throws Exception {
        List<VehicleType> vehicles = VehicleCatalogReader.read(CATALOG);
        withinPublishedLimits(vehicles);
        assertThat(vehicles).anySatisfy(v -> assertThat(v.name()).containsIgnoringCase("20"));
        assertThat(vehicles).anySatisfy(v -> assertThat(v.name()).containsIgnoringCase("40"));
    }

    @Test
    @DisplayName("the test fixture: EU 96/53/EC and ISO 668; inside sizes as src/docs/sources.md quotes them")
    void fixture() {
        withinPublishedLimits(LoadFixtures.FLEET);
        // ISO 668 1CC inside about 5898 x 2352 x 2393, 1AA 12032 x 2352 x 2393 (common practice)
        assertThat(LoadFixtures.CONTAINER_20.deckLengthMm()).isEqualTo(5898);
        assertThat(LoadFixtures.CONTAINER_40.deckLengthMm()).isEqualTo(12_032);
        // 13.6 m semi-trailer (common practice)
        assertThat(LoadFixtures.SEMI.deckLengthMm()).isEqualTo(13_600);
    }

    @Test
    @DisplayName("the check fails for a deck wider than 2.55 m (the limit bites)")
    void limitBites() {
        VehicleType wide = new VehicleType("too wide", 13_600, 2600, 2700, 24_000, 1, "invented");
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> withinPublishedLimits(List.of(wide)))
                .isInstanceOf(AssertionError.class).hasMessageContaining("96/53/EC");
    }
}
