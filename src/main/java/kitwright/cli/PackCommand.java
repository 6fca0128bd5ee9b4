package kitwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.function.Function;
import java.util.stream.Collectors;
import kitwright.io.InvalidInputException;
import kitwright.io.KitReader;
import kitwright.io.RunInputs;
import kitwright.io.OutputFolder;
import kitwright.io.Problem;
import kitwright.loading.LoadPlan;
import kitwright.loading.Shipping;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestPlan;
import kitwright.packing.Crate;
import kitwright.packing.CratePlan;
import kitwright.packing.StructureShare;
import kitwright.report.CrateSectionDrawing;
import kitwright.report.DeckPlanDrawing;
import kitwright.report.LogisticsCautions;
import kitwright.report.LogisticsCsv;
import kitwright.report.LogisticsJson;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kitwright pack KIT_DIR [--for STRUCTURE] [--out DIR] [--json FILE]}: bundles into crates, crates onto
 * vehicles. Prints the crates and trips with their bounds; writes the packing lists, manifests and drawings with
 * {@code --out}, the JSON with {@code --json}.
 */
@Command(name = "pack", mixinStandardHelpOptions = true,
        description = {
            "Packs a kit for shipping: joint boxes, crates and vehicle loads.",
            "Joints go into joint boxes, bundles and boxes into crates from the crate",
            "catalog (least total crate price, then fewest crates), crates onto",
            "vehicles from the vehicle catalog (least total trip cost). Prints each",
            "count beside its lower bound and the status.",
            "",
            "With --out DIR: packing-lists.csv (per crate: type, marks and counts,",
            "bundles, boxes, gross mass), manifests.csv (per vehicle: crates, mass,",
            "floor length used, centre of gravity from the front, lateral centre,",
            "axle loads against their limits), load-lists.csv (per crate per vehicle:",
            "loading and unloading steps, outer size, gross mass) and drawings/",
            "(crate cross-sections and deck plans, SVG, to scale). The folder is",
            "written beside DIR and moved into place when complete.",
            "With --json FILE: {\"crates\": ..., \"loads\": ...} as in plan.json.",
            "",
            "Lifting and load securing are not checked (EN 12195-1; local rules",
            "decide). Exit codes: 0 ok, 2 invalid input, 3 when an item fits no",
            "crate (nothing is written), when a crate fits no vehicle (the packing",
            "lists are still written), or when a section cannot be cut or a bar is",
            "heavier than maxBundleMassKg (what can be packed still is)."
        },
        footer = {
            "",
            "Example: kitwright pack sample-kits/cinema-12 --for screen-frame --out out/screen-frame"
        })
public final class PackCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "KIT_DIR",
            description = "The kit folder: kit.json (optional, may set jointBox {lengthMm, widthMm, heightMm,"
                    + " maxMassKg}; default 600 x 400 x 300 mm, 25 kg), bars.csv, optionally structures.csv and"
                    + " joints.csv. The crate and vehicle catalogs are crates.csv and vehicles.csv beside the tube"
                    + " catalog unless kit.json names others (crateCatalog, vehicleCatalog).")
    Path kitDir;

    @Option(names = "--for", paramLabel = "STRUCTURE",
            description = "Pack only what this structure of structures.csv needs: the bundles holding its tubes"
                    + " (whole bundles; tubes of other marks in them ride along and are listed) and the joints"
                    + " (all of them, as structures.csv counts bars only). Default: the whole kit.")
    String structure;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Folder for packing-lists.csv, manifests.csv and drawings/; created, or replaced when"
                    + " kitwright wrote it before. Default: print only.")
    Path out;

    @Option(names = "--json", paramLabel = "FILE",
            description = "Write the crate and load plans as JSON ({\"crates\", \"loads\"}, the plan.json contract)"
                    + " to FILE. Default: none.")
    Path json;

    @Option(names = "--force",
            description = "Let --json replace a file that kitwright did not write (never an input of the run).")
    boolean force;

    @Spec
    CommandSpec spec;

    private final PackUpstream upstream;

    public PackCommand() {
        this(PackUpstream.STAGES);
    }

    /** A pack command taking its bundles from the given stages (tests, and the plan chain). */
    public PackCommand(PackUpstream upstream) {
        this.upstream = upstream;
    }

    @Override
    public Integer call() throws InvalidInputException, IOException {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter stderr = spec.commandLine().getErr();
        Kit kit = KitReader.read(kitDir);
        checkCatalogs(kit);
        checkStructure(kit);
        RunInputs inputs = RunInputs.ofKit(kitDir);
        if (out != null) {
            OutputGuards.checkFolder(out, inputs);
        }
        if (json != null) {
            OutputGuards.checkJson(json, out, inputs, force);
        }
        long start = System.nanoTime();
        stderr.println("pack: cutting and nesting " + kit.bars().stream().mapToInt(b -> b.quantity()).sum()
                + " bars");
        stderr.flush();
        PackUpstream.Bundles upstreamBundles = upstream.bundles(kit);
        List<String> shortfalls = upstreamBundles.shortfalls();
        List<Bundle> bundles = upstreamBundles.plan().bundles();
        List<Joint> joints = kit.joints();
        StructureShare share = null;
        if (structure != null) {
            try {
                share = StructureShare.of(structure, bundles, joints, kit.structures());
            } catch (IllegalArgumentException e) {
                // the structure is known (checked above), so its tubes are missing: some section was not cut
                stderr.println("pack: no plan for " + structure + ": " + e.getMessage());
                shortfalls.forEach(reason -> stderr.println("pack: " + reason));
                stderr.flush();
                return ExitCode.NO_FEASIBLE_PLAN.code();
            }
            bundles = share.bundles();
            joints = share.joints();
        }
        stderr.printf("pack: crating %d bundles and %d joints%n", bundles.size(),
                joints.stream().mapToInt(Joint::quantity).sum());
        stderr.flush();
        Shipping.Shipment shipment = Shipping.plan(kit, bundles, joints);
        CratePlan crates = shipment.crates();
        LoadPlan loads = shipment.loads();
        if (crates.status() == Status.INFEASIBLE) {
            stderr.println("pack: no crate plan: " + crates.reason());
            stderr.flush();
            return ExitCode.NO_FEASIBLE_PLAN.code();
        }
        // With crates but no load plan, the packing lists still stand: write and print them, then exit 3.
        boolean loaded = loads.status() != Status.INFEASIBLE;
        if (loaded) {
            stderr.printf(java.util.Locale.ROOT, "pack: %d crate%s, %d trip%s in %.2f s%n", crates.crates().size(),
                    crates.crates().size() == 1 ? "" : "s", loads.vehicles().size(),
                    loads.vehicles().size() == 1 ? "" : "s", (System.nanoTime() - start) / 1e9);
        } else {
            stderr.println("pack: no load plan: " + loads.reason());
        }
        stderr.flush();
        if (out != null) {
            writeFolder(crates, loads, upstreamBundles.plan().bundles());
        }
        if (json != null) {
            OutputGuards.writeJson(json, LogisticsJson.write(crates, loads), inputs, force);
        }
        stdout.print(PackSummary.text(kit.name(), share, crates, loads, kit.crates()));
        LogisticsCautions.all().forEach(c -> stdout.println("Caution, " + c.heading().toLowerCase(java.util.Locale.ROOT)
                + ": " + c.text()));
        if (out != null) {
            stdout.println("Wrote " + out.resolve(LogisticsCsv.PACKING_LISTS) + ", " + LogisticsCsv.MANIFESTS
                    + ", " + LogisticsCsv.LOAD_LISTS + " and drawings/");
        }
        if (json != null) {
            stdout.println("Wrote " + json);
        }
        stdout.flush();
        shortfalls.forEach(reason -> stderr.println("kitwright: the pack plan is incomplete: " + reason));
        stderr.flush();
        return loaded && shortfalls.isEmpty() ? ExitCode.OK.code() : ExitCode.NO_FEASIBLE_PLAN.code();
    }

    /** An unknown {@code --for} structure is bad input, told before any planning. */
    private void checkStructure(Kit kit) throws InvalidInputException {
        if (structure == null || kit.structures().stream().anyMatch(c -> c.structure().equals(structure))) {
            return;
        }
        try {
            StructureShare.of(structure, List.of(), List.of(), kit.structures());
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException(new Problem(null, 0, "--for", e.getMessage()));
        }
    }

    private void checkCatalogs(Kit kit) throws InvalidInputException {
        Path kitJson = kitDir.resolve(KitReader.KIT_JSON);
        if (kit.crates().isEmpty()) {
            throw new InvalidInputException(Problem.ofFile(kitJson, "no crate catalog for this kit (expected"
                    + " crates.csv beside the tube catalog, or crateCatalog in kit.json)"));
        }
        if (kit.vehicles().isEmpty()) {
            throw new InvalidInputException(Problem.ofFile(kitJson, "no vehicle catalog for this kit (expected"
                    + " vehicles.csv beside the tube catalog, or vehicleCatalog in kit.json)"));
        }
    }

    private void writeFolder(CratePlan crates, LoadPlan loads, List<Bundle> bundles)
            throws InvalidInputException, IOException {
        Map<String, Crate> byId = crates.crates().stream().collect(Collectors.toMap(Crate::id, Function.identity()));
        try (OutputFolder folder = OutputFolder.create(out)) {
            folder.write(LogisticsCsv.PACKING_LISTS, LogisticsCsv.packingLists(crates, bundles));
            folder.write(LogisticsCsv.MANIFESTS, LogisticsCsv.manifests(loads));
            folder.write(LogisticsCsv.LOAD_LISTS, LogisticsCsv.loadLists(loads, crates));
            for (Crate c : crates.crates()) {
                folder.write("drawings/crate-" + c.id() + ".svg", CrateSectionDrawing.draw("crate-" + c.id(), c)
                        + "\n");
            }
            for (var v : loads.vehicles()) {
                folder.write("drawings/deck-" + v.id() + ".svg", DeckPlanDrawing.draw("deck-" + v.id(), v, byId)
                        + "\n");
            }
            folder.commit();
        }
    }
}
