package org.faultbench.study;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import com.google.gson.JsonElement;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.fluid.CapillaryScaling;
import org.faultbench.core.fluid.CapillarySystem;
import org.faultbench.core.fluid.Fluid;
import org.faultbench.core.fluid.FluidKind;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.LengthUnit;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.digitize.io.EsriAsciiGridReader;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.ZmapGridReader;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.seal.BretanCapacity;
import org.faultbench.seal.ClaySmearPotentialCriterion;
import org.faultbench.seal.JuxtapositionOnlyCriterion;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.SealCriterionCatalog;
import org.faultbench.seal.SealCriterionContributions;
import org.faultbench.seal.SgrPressureModel;
import org.faultbench.seal.SgrPressurePoint;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.seal.ShaleSmearFactorCriterion;
import org.faultbench.seal.TabulatedSgrPressure;
import org.faultbench.sim.AtticSetup;
import org.faultbench.sim.BoundingFault;
import org.faultbench.sim.ContributedInput;
import org.faultbench.sim.DepthUncertainty;
import org.faultbench.sim.FluidContrast;
import org.faultbench.sim.SampledInput;
import org.faultbench.sim.SampledInputContributions;
import org.faultbench.sim.SealSetup;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.sim.TrapStudy;
import org.faultbench.strat.StratUnit;
import org.faultbench.strat.Stratigraphy;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * Reads an analysis file (format "faultbench-analysis", version {@value #FORMAT_VERSION}; the format is described in
 * DEVELOPERS.md). Grids it refers to are resolved against the file's folder. Every problem is reported as a
 * {@link StudyFormatException} naming the file and the field; nothing is returned half-read.
 */
public final class AnalysisFileReader {
    public static final String FORMAT = "faultbench-analysis";
    public static final int FORMAT_VERSION = 1;
    private static final GeometryFactory GEOMETRY = new GeometryFactory();
    private static final int DEFAULT_COLUMNS = 400;
    private static final double DEFAULT_CUT_OFF_OFFSET = 50;

    /** Criterion id used when a file's seal section names none; null: the file must name one. */
    private final String defaultCriterion;

    /** A reader for files that name their seal criterion. */
    public AnalysisFileReader() {
        this(null);
    }

    /**
     * A reader that uses {@code defaultCriterion} (e.g. the user's preference) for a seal section without a
     * {@code criterion}; the id is then written into the study's document, so results echo it and a save keeps it.
     */
    public AnalysisFileReader(String defaultCriterion) {
        this.defaultCriterion = defaultCriterion;
    }

    public AnalysisFile read(Path file) throws StudyFormatException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new StudyFormatException(file.toString(), "", "file not found", e);
        } catch (IOException e) {
            throw new StudyFormatException(file.toString(), "", "cannot be read: " + e.getMessage(), e);
        }
        return read(file, bytes);
    }

    /**
     * Reads an analysis held in memory as if it were the content of {@code file} (relative paths resolve against
     * the file's folder): an edited, not yet saved study goes through the same checks as one read from disk.
     */
    public AnalysisFile read(Path file, byte[] bytes) throws StudyFormatException {
        String name = file.toString();
        JsonElement root = AnalysisFileMigrations.CHAIN.migrate(StudyJson.parse(bytes, name), name);
        applyDefaultCriterion(root);
        JsonNode doc = new JsonNode(name, "", root);
        int version = checkHeader(doc);
        Path folder = file.toAbsolutePath().getParent();
        TrapStudy study = readStudy(doc, folder);
        JsonNode simulation = doc.optional("simulation").orElse(null);
        int realisations = simulation != null && simulation.has("realisations")
                ? simulation.field("realisations").integer() : 1000;
        long seed = simulation != null && simulation.has("seed") ? simulation.field("seed").longInteger() : 1L;
        double cellHeight = simulation != null && simulation.has("cellHeight")
                ? simulation.field("cellHeight").number() : SimulationSettings.DEFAULT_CELL_HEIGHT;
        if (realisations < 1) {
            throw simulation.field("realisations").error("must be at least 1, was " + realisations);
        }
        return new AnalysisFile(file, sha256(bytes), version, study, realisations, seed, cellHeight,
                root.getAsJsonObject());
    }

    private void applyDefaultCriterion(JsonElement root) {
        if (defaultCriterion != null && root.isJsonObject() && root.getAsJsonObject().has("seal")
                && root.getAsJsonObject().get("seal").isJsonObject()
                && !root.getAsJsonObject().getAsJsonObject("seal").has("criterion")) {
            root.getAsJsonObject().getAsJsonObject("seal").addProperty("criterion", defaultCriterion);
        }
    }

    private static int checkHeader(JsonNode doc) throws StudyFormatException {
        String format = doc.field("format").string();
        if (!FORMAT.equals(format)) {
            throw doc.field("format").error("expected \"" + FORMAT + "\", found \"" + format + "\"");
        }
        int version = doc.field("formatVersion").integer();
        if (version < 1 || version > FORMAT_VERSION) {
            throw doc.field("formatVersion").error("this program reads format versions 1 to " + FORMAT_VERSION
                    + ", the file has " + version + (version > FORMAT_VERSION ? " (written by a newer program)" : ""));
        }
        return version;
    }

    private static TrapStudy readStudy(JsonNode doc, Path folder) throws StudyFormatException {
        String title = doc.optional("name").isPresent() ? doc.field("name").string() : null;
        Stratigraphy layerCake = readStratigraphy(doc.field("stratigraphy"));
        RegularGrid top = readGrid(doc.field("referenceTop"), folder);
        Polygon compartment = readPolygon(doc.field("compartment"));
        Stratigraphy strat = IsochoreFields.read(doc.field("stratigraphy"), layerCake, folder, top, compartment);
        List<BoundingFault> faults = new ArrayList<>();
        for (JsonNode f : doc.field("faults").array()) {
            faults.add(readFault(f, top, strat.referenceUnit().name()));
        }
        FluidContrast fluids = readFluids(doc.field("fluids"));
        SealSetup seal = readSeal(doc.field("seal"), fluids.kind(), doc.field("fluids"), folder);
        DepthUncertainty depth = doc.has("depthUncertainty") ? readDepth(doc.field("depthUncertainty"))
                : DepthUncertainty.NONE;
        Optional<UncertainValue> spill = optionalValue(doc, "spillDepth");
        Optional<UncertainValue> topSeal = doc.has("topSealCapacityBar")
                ? Optional.of(scaled(doc.field("topSealCapacityBar"), 1e5)) : Optional.empty();
        Optional<AtticSetup> attic = Optional.empty();
        if (doc.has("attic")) {
            JsonNode a = doc.field("attic");
            String fault = a.field("drainedFault").string();
            UncertainValue drainage = UncertainValueFormat.read(a.field("drainageDepth"));
            attic = Optional.of(UncertainValueFormat.wrap(a, () -> new AtticSetup(fault, drainage)));
        }
        Optional<AtticSetup> atticSetup = attic;
        List<ContributedInput> contributed = doc.has("sampledInputs") ? readSampledInputs(doc.field("sampledInputs"))
                : List.of();
        return UncertainValueFormat.wrap(doc, () -> new TrapStudy(title, strat, top, compartment, faults, fluids, seal,
                depth, spill, topSeal, atticSetup, contributed));
    }

    private static Optional<UncertainValue> optionalValue(JsonNode node, String field) throws StudyFormatException {
        return node.has(field) ? Optional.of(UncertainValueFormat.read(node.field(field))) : Optional.empty();
    }

    /** A value given in a display unit (e.g. bar) converted to SI by a factor; fixed values only for now. */
    private static UncertainValue scaled(JsonNode node, double factor) throws StudyFormatException {
        if (!node.isNumber()) {
            throw node.error("expected a number (bar)");
        }
        double value = node.number() * factor;
        return UncertainValueFormat.wrap(node, () -> UncertainValue.fixed(value));
    }

    private static Stratigraphy readStratigraphy(JsonNode node) throws StudyFormatException {
        List<StratUnit> units = new ArrayList<>();
        for (JsonNode u : node.field("units").array()) {
            units.add(readUnit(u));
        }
        String reference = node.field("referenceUnit").string();
        int index = -1;
        for (int i = 0; i < units.size(); i++) {
            if (units.get(i).name().equalsIgnoreCase(reference.trim())) {
                index = i;
            }
        }
        if (index < 0) {
            throw node.field("referenceUnit").error("no unit is called '" + reference + "'");
        }
        int ref = index;
        return UncertainValueFormat.wrap(node, () -> new Stratigraphy(units, ref));
    }

    private static StratUnit readUnit(JsonNode u) throws StudyFormatException {
        String name = u.field("name").string();
        LithologyClass lithology = lithology(u.field("lithology"));
        boolean reservoir = u.has("reservoir") ? u.field("reservoir").bool() : lithology == LithologyClass.RESERVOIR;
        UncertainValue thickness = IsochoreFields.isIsochore(u.field("thickness")) ? UncertainValue.fixed(0)
                : UncertainValueFormat.read(u.field("thickness")); // an isochore's thickness comes from its grid
        UncertainValue vcl = UncertainValueFormat.read(u.field("vcl"));
        if (!reservoir) {
            return UncertainValueFormat.wrap(u, () -> StratUnit.nonReservoir(name, lithology, thickness, vcl));
        }
        UncertainValue ntg = UncertainValueFormat.read(u.field("ntg"));
        UncertainValue porosity = UncertainValueFormat.read(u.field("porosity"));
        UncertainValue sw = UncertainValueFormat.read(u.field("sw"));
        UncertainValue bo = UncertainValueFormat.read(u.field("bo"));
        return UncertainValueFormat.wrap(u,
                () -> new StratUnit(name, lithology, true, thickness, vcl, ntg, porosity, sw, bo));
    }

    private static LithologyClass lithology(JsonNode node) throws StudyFormatException {
        String text = node.string().trim().toUpperCase(Locale.ROOT);
        try {
            return LithologyClass.valueOf(text);
        } catch (IllegalArgumentException e) {
            throw node.error("expected one of reservoir, seal, carbonate, evaporite, other; found '" + node.string() + "'");
        }
    }

    static RegularGrid readGrid(JsonNode node, Path folder) throws StudyFormatException {
        return readGrid(node, "grid", folder);
    }

    /** Reads the grid named by field {@code fileField} of {@code node}, with its optional format and unit. */
    static RegularGrid readGrid(JsonNode node, String fileField, Path folder) throws StudyFormatException {
        JsonNode fileNode = node.field(fileField);
        Path gridFile = folder.resolve(fileNode.string());
        String format = node.has("format") ? node.field("format").string() : "esri-ascii";
        LengthUnit unit = node.has("unit") ? lengthUnit(node.field("unit")) : LengthUnit.METRE;
        if (!Files.isRegularFile(gridFile)) {
            throw fileNode.error("grid file not found: " + gridFile);
        }
        if (!"esri-ascii".equals(format) && !"zmap".equals(format)) {
            throw node.field("format").error("expected \"esri-ascii\" or \"zmap\", found \"" + format + "\"");
        }
        try {
            return GridFileCache.SHARED.read(gridFile, format, unit, () -> "zmap".equals(format)
                    ? new ZmapGridReader(FileUnits.of(unit)).read(gridFile)
                    : new EsriAsciiGridReader(FileUnits.of(unit)).read(gridFile));
        } catch (IOException e) {
            throw fileNode.error("grid cannot be read: " + e.getMessage(), e);
        }
    }

    private static LengthUnit lengthUnit(JsonNode node) throws StudyFormatException {
        switch (node.string()) {
        case "m":
            return LengthUnit.METRE;
        case "ft":
            return LengthUnit.FOOT;
        default:
            throw node.error("expected \"m\" or \"ft\", found \"" + node.string() + "\"");
        }
    }

    private static Polygon readPolygon(JsonNode node) throws StudyFormatException {
        List<JsonNode> points = node.array();
        if (points.size() < 3) {
            throw node.error("an outline needs at least 3 points, found " + points.size());
        }
        Coordinate[] ring = new Coordinate[points.size() + 1];
        for (int i = 0; i < points.size(); i++) {
            double[] xy = points.get(i).numbers(2);
            ring[i] = new Coordinate(xy[0], xy[1]);
        }
        ring[points.size()] = new Coordinate(ring[0]);
        Polygon polygon = GEOMETRY.createPolygon(ring);
        if (!polygon.isValid()) {
            throw node.error("the outline crosses itself");
        }
        return polygon;
    }

    private static LineString readLine(JsonNode node) throws StudyFormatException {
        List<JsonNode> points = node.array();
        Coordinate[] coordinates = new Coordinate[points.size()];
        for (int i = 0; i < points.size(); i++) {
            double[] xy = points.get(i).numbers(2);
            coordinates[i] = new Coordinate(xy[0], xy[1]);
        }
        if (coordinates.length < 2) {
            throw node.error("a fault trace needs at least 2 points, found " + coordinates.length);
        }
        return GEOMETRY.createLineString(coordinates);
    }

    private static BoundingFault readFault(JsonNode f, RegularGrid top, String referenceHorizon)
            throws StudyFormatException {
        String id = f.field("id").string();
        String faultName = f.has("name") ? f.field("name").string() : id;
        LineString trace = readLine(f.field("trace"));
        double dip = f.field("dip").number();
        double azimuth = f.field("dipAzimuth").number();
        boolean normal = !f.has("normal") || f.field("normal").bool();
        Fault fault = UncertainValueFormat.wrap(f, () -> new Fault(id, faultName, trace, dip, azimuth, normal));
        int columns = f.has("columns") ? f.field("columns").integer() : DEFAULT_COLUMNS;
        UncertainValue throwScale = f.has("throwScale") ? UncertainValueFormat.read(f.field("throwScale"))
                : UncertainValue.fixed(1);
        CutOffLine footwall;
        CutOffLine hangingWall;
        JsonNode cutOffs = f.has("cutOffs") ? f.field("cutOffs") : null;
        if (cutOffs != null && cutOffs.has("footwall")) {
            footwall = digitizedCutOff(cutOffs.field("footwall"), fault, referenceHorizon, Wall.FOOTWALL);
            hangingWall = digitizedCutOff(cutOffs.field("hangingWall"), fault, referenceHorizon, Wall.HANGING_WALL);
        } else {
            double offset = cutOffs != null && cutOffs.has("gridOffset") ? cutOffs.field("gridOffset").number()
                    : DEFAULT_CUT_OFF_OFFSET;
            int stations = Math.max(2, columns + 1);
            footwall = UncertainValueFormat.wrap(f, () -> CutOffLine.sampled(fault, referenceHorizon, Wall.FOOTWALL,
                    top::interpolate, offset, stations));
            hangingWall = UncertainValueFormat.wrap(f, () -> CutOffLine.sampled(fault, referenceHorizon,
                    Wall.HANGING_WALL, top::interpolate, offset, stations));
        }
        CutOffLine fw = footwall;
        CutOffLine hw = hangingWall;
        return UncertainValueFormat.wrap(f, () -> new BoundingFault(fault, fw, hw, throwScale, columns));
    }

    private static CutOffLine digitizedCutOff(JsonNode node, Fault fault, String horizon, Wall wall)
            throws StudyFormatException {
        List<Coordinate> points = new ArrayList<>();
        for (JsonNode p : node.array()) {
            double[] xyz = p.numbers(3);
            points.add(new Coordinate(xyz[0], xyz[1], xyz[2]));
        }
        return UncertainValueFormat.wrap(node, () -> CutOffLine.fromMapPoints(fault, horizon, wall, points));
    }

    private static FluidContrast readFluids(JsonNode node) throws StudyFormatException {
        FluidKind kind = fluidKind(node.field("trapped"));
        UncertainValue density = UncertainValueFormat.read(node.field("density"));
        UncertainValue brine = UncertainValueFormat.read(node.field("brineDensity"));
        return UncertainValueFormat.wrap(node, () -> new FluidContrast(kind, density, brine));
    }

    private static FluidKind fluidKind(JsonNode node) throws StudyFormatException {
        switch (node.string().toLowerCase(Locale.ROOT)) {
        case "oil":
            return FluidKind.OIL;
        case "gas":
            return FluidKind.GAS;
        case "co2":
            return FluidKind.CO2;
        default:
            throw node.error("expected \"oil\", \"gas\" or \"co2\", found \"" + node.string() + "\"");
        }
    }

    private static SealSetup readSeal(JsonNode node, FluidKind trapped, JsonNode fluids, Path folder)
            throws StudyFormatException {
        SealCriterion criterion = ContributedCriterionParameters.configure(criterion(node), node, folder);
        double burial = node.field("burialDepth").number();
        UncertainValue shift = node.has("calibrationShift") ? UncertainValueFormat.read(node.field("calibrationShift"))
                : UncertainValue.fixed(0);
        double scale = trapped == FluidKind.CO2 ? co2Scaling(fluids) : 1;
        return UncertainValueFormat.wrap(node, () -> new SealSetup(criterion, burial, shift, scale));
    }

    /**
     * Threshold pressures are calibrated on oil–brine systems; for CO2 they are scaled by interfacial tension and
     * contact angle: P_CO2 = P_oil · γ_CO2·cosθ_CO2 / (γ_oil·cosθ_oil) (Purcell 1949; Schowalter 1979).
     */
    private static double co2Scaling(JsonNode fluids) throws StudyFormatException {
        Fluid co2 = Fluid.TYPICAL_CO2;
        if (fluids.has("interfacialTension")) {
            double ift = fluids.field("interfacialTension").number();
            co2 = UncertainValueFormat.wrap(fluids, () -> Fluid.TYPICAL_CO2.withInterfacialTension(ift));
        }
        if (fluids.has("contactAngle")) {
            double angle = fluids.field("contactAngle").number();
            Fluid withIft = co2;
            co2 = UncertainValueFormat.wrap(fluids, () -> withIft.withContactAngle(angle));
        }
        return new CapillaryScaling(CapillarySystem.againstBrine(Fluid.TYPICAL_OIL), CapillarySystem.againstBrine(co2))
                .factor();
    }

    private static SealCriterion criterion(JsonNode node) throws StudyFormatException {
        JsonNode idNode = node.field("criterion");
        String id = idNode.string();
        switch (id) {
        case JuxtapositionOnlyCriterion.ID:
            return new JuxtapositionOnlyCriterion();
        case ShaleGougeRatioCriterion.ID:
            return new ShaleGougeRatioCriterion(pressureModel(node));
        case ShaleSmearFactorCriterion.ID:
            double ssf = node.has("ssfLimit") ? node.field("ssfLimit").number()
                    : ShaleSmearFactorCriterion.DEFAULT_MAXIMUM_SEALING_SSF;
            return UncertainValueFormat.wrap(node, () -> new ShaleSmearFactorCriterion(ssf));
        case ClaySmearPotentialCriterion.ID:
            double csp = node.field("cspThreshold").number();
            return UncertainValueFormat.wrap(node, () -> new ClaySmearPotentialCriterion(csp));
        default:
            SealCriterionCatalog catalog = SealCriterionContributions.platformCatalog();
            return catalog.find(id).orElseThrow(() -> idNode.error("no seal criterion has the id \"" + id
                    + "\"; installed: " + catalog.list().stream().map(SealCriterion::id).toList()));
        }
    }

    private static SgrPressureModel pressureModel(JsonNode node) throws StudyFormatException {
        if (!node.has("pressureModel")) {
            return new BretanCapacity();
        }
        JsonNode model = node.field("pressureModel");
        if (!model.element().isJsonObject()) {
            if ("bretan".equals(model.string())) {
                return new BretanCapacity();
            }
            throw model.error("expected \"bretan\" or {\"table\": [[SGR %, bar], ...]}");
        }
        List<SgrPressurePoint> points = new ArrayList<>();
        for (JsonNode row : model.field("table").array()) {
            double[] pair = row.numbers(2);
            points.add(UncertainValueFormat.wrap(row, () -> new SgrPressurePoint(pair[0], pair[1] * 1e5)));
        }
        return UncertainValueFormat.wrap(model, () -> new TabulatedSgrPressure(points));
    }

    /**
     * Plug-in sampled inputs the study includes, in draw order: {@code [{"id": "...", "distribution": ...}]}, the
     * distribution optional (the contribution's own by default).
     */
    private static List<ContributedInput> readSampledInputs(JsonNode list) throws StudyFormatException {
        Map<String, SampledInput> installed = SampledInputContributions.platformInputs();
        List<ContributedInput> inputs = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (JsonNode entry : list.array()) {
            JsonNode idNode = entry.field("id");
            String id = idNode.string();
            SampledInput input = installed.get(id);
            if (input == null) {
                throw idNode.error("no sampled input has the id \"" + id + "\"; installed: " + installed.keySet());
            }
            if (!seen.add(id)) {
                throw idNode.error("sampled input \"" + id + "\" is listed twice");
            }
            UncertainValue distribution = entry.has("distribution")
                    ? UncertainValueFormat.read(entry.field("distribution")) : null;
            inputs.add(UncertainValueFormat.wrap(entry.has("distribution") ? entry.field("distribution") : entry,
                    () -> new ContributedInput(input, distribution)));
        }
        return inputs;
    }

    private static DepthUncertainty readDepth(JsonNode node) throws StudyFormatException {
        UncertainValue shift = node.has("shift") ? UncertainValueFormat.read(node.field("shift")) : UncertainValue.fixed(0);
        double sd = node.has("residualSd") ? node.field("residualSd").number() : 0;
        double length = node.has("correlationLength") ? node.field("correlationLength").number() : 1000;
        return UncertainValueFormat.wrap(node, () -> new DepthUncertainty(shift, sd, length));
    }

    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }
}
