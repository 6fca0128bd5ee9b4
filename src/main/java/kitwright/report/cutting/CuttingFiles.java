package kitwright.report.cutting;

import java.io.IOException;
import kitwright.cutting.CutPlan;
import kitwright.io.OutputFolder;
import kitwright.model.Kit;

/** Writes the cutting stage's files into a result folder: {@code cut-list.csv}, {@code order.csv},
 * {@code rack-pull.csv}, {@code rack-after.csv}. */
public final class CuttingFiles {
    public static final String CUT_LIST = "cut-list.csv";
    public static final String ORDER = "order.csv";
    public static final String RACK_PULL = "rack-pull.csv";
    public static final String RACK_AFTER = "rack-after.csv";

    private CuttingFiles() {
    }

    public static void write(OutputFolder folder, Kit kit, CutPlan plan) throws IOException {
        folder.write(CUT_LIST, CutListCsv.format(kit, plan));
        folder.write(ORDER, OrderCsv.format(kit, plan));
        folder.write(RACK_PULL, RackPullCsv.format(kit, plan));
        folder.write(RACK_AFTER, RackAfterCsv.format(kit, plan));
    }
}
