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
    @DisplayName("the test fixture: EU 96/53/EC and ISO 668 outside, ISO 1496-1 least inside sizes, 96/53/EC "
            + "semi-trailer length, 7.5 t gross")
    void fixture() {
        withinPublishedLimits(LoadFixtures.FLEET);
        // ISO 1496-1 least inside sizes of a general-purpose container (from memory): 1CC 5867 x 2330 x 2350 mm,
        // 1AA 11 998 x 2330 x 2350 mm; the fixture's inside sizes must lie between those and ISO 668's outside ones
        insideAtLeast(LoadFixtures.CONTAINER_20, 5867, 2330, 2350);
        insideAtLeast(LoadFixtures.CONTAINER_40, 11_998, 2330, 2350);
        // EU 96/53/EC Annex I 1.6 (from memory): a semi-trailer is at most 12.00 m from king-pin to rear with a
        // front swing radius of at most 2.04 m, so its load floor is at most 14.04 m long
        assertThat(LoadFixtures.SEMI.deckLengthMm()).as("semi-trailer load length, 96/53/EC")
                .isLessThanOrEqualTo(14_040);
        // a 7.5 t box truck carries less than its 7500 kg gross vehicle mass (EU driving licence category C1)
        assertThat(LoadFixtures.BOX_TRUCK.payloadKg()).as("7.5 t gross").isLessThan(7500);
    }

    private static void insideAtLeast(VehicleType v, double length, double width, double height) {
        assertThat(v.deckLengthMm()).as("%s inside length, ISO 1496-1", v.name()).isGreaterThanOrEqualTo(length);
        assertThat(v.deckWidthMm()).as("%s inside width, ISO 1496-1", v.name()).isGreaterThanOrEqualTo(width);
        assertThat(v.deckHeightMm()).as("%s inside height, ISO 1496-1", v.name()).isGreaterThanOrEqualTo(height);
    }

    @Test
    @DisplayName("the check fails for a deck wider than 2.55 m (the limit bites)")
    void limitBites() {
        VehicleType wide = new VehicleType("too wide", 13_600, 2600, 2700, 24_000, 1, "invented");
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> withinPublishedLimits(List.of(wide)))
                .isInstanceOf(AssertionError.class).hasMessageContaining("96/53/EC");
    }
}
