package kitwright.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Mass per metre of circular hollow sections, M = pi * (D - T) * T * rho * 1e-6 kg/m, against the tabulated values
 * of EN 10219-2 (cold-formed CHS; the same figures appear in EN 10210-2), steel density 7850 kg/m3 from
 * EN 1993-1-1 section 3.2.6. Table values as listed in the project's domain notes.
 */
class MassPerMetreTest {
    private static final double STEEL_DENSITY_KG_M3 = 7850; // EN 1993-1-1 §3.2.6

    @ParameterizedTest(name = "EN 10219-2 table: CHS {0}x{1} weighs {2} kg/m")
    @CsvSource({
        "33.7, 2.6, 1.99",
        "42.4, 2.6, 2.55",
        "48.3, 3.2, 3.56",
        "60.3, 3.2, 4.51",
        "76.1, 3.2, 5.75",
        "88.9, 3.2, 6.76",
        "114.3, 3.6, 9.83"
    })
    void massPerMetreMatchesTheEn10219Table(double diameter, double wall, double tableKgPerMetre) {
        Section section = new Section("CHS", "steel", diameter, wall, null, null, null);

        // EN 10219-2 tabulated mass per metre, rounded to 0.01 kg/m in the table
        assertThat(section.massPerMetreKg(STEEL_DENSITY_KG_M3)).isCloseTo(tableKgPerMetre, within(0.01));
    }
}
