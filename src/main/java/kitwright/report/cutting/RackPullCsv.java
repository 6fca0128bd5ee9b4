package kitwright.report.cutting;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.report.CuttingFigures;
import kitwright.report.CuttingFigures.OrderLine;

/**
 * The rack offcuts to take, {@code rack-pull.csv}: one row per section and offcut length the plan cuts from the
 * rack (sections in plan order, lengths in catalog order), for the shop to pull before the saw starts. Nothing here
 * is bought. {@code unit_price} is the rack value of one piece (the catalog's rack price worked out per piece on its
 * basis, 0 when it gives none), and {@code total} is pieces x unit price: the rack part of the plan's cost.
 */
public final class RackPullCsv {
    public static final List<String> HEADER = List.of("section", "material", "outer_diameter_mm", "wall_mm",
            "length_mm", "pieces", "mass_kg", "unit_price", "total");

    private RackPullCsv() {
    }

    public static String format(Kit kit, CutPlan plan) {
        List<List<Object>> rows = new ArrayList<>();
        for (SectionCutPlan section : plan.sections()) {
            Section info = kit.catalog().section(section.section()).orElseThrow();
            for (OrderLine line : CuttingFigures.of(kit, section).lines()) {
                if (line.origin() == Origin.RACK) {
                    List<Object> row = new ArrayList<>(List.of(info.name(), info.material(),
                            info.outerDiameterMm(), info.wallMm(), line.stockLengthMm(), line.pieces()));
                    row.add(line.massKg());
                    row.add(line.unitPrice());
                    row.add(line.total());
                    rows.add(row);
                }
            }
        }
        return CsvText.of(HEADER, ColumnFormat.apply(HEADER, Set.of("unit_price", "total"), rows));
    }
}
