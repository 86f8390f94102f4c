package org.faultbench.digitize.georef;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.core.extension.ElementStub;
import org.junit.jupiter.api.Test;

class TransformContributionsTest {

    /** A contributed type: map = (col + x0, −row + y0), one map unit per pixel, only the shift fitted. */
    public static final class ShiftOnly implements TransformEstimator {
        @Override
        public GeoTransform estimate(List<ControlPoint> enabled) {
            // least-squares estimate of a constant offset = arithmetic mean of the offsets (Gauss; common practice)
            double x0 = enabled.stream().mapToDouble(p -> p.x() - p.col()).average().orElseThrow();
            double y0 = enabled.stream().mapToDouble(p -> p.y() + p.row()).average().orElseThrow();
            return new GeoTransform() {
                @Override
                public double[] toMap(double col, double row) {
                    return new double[] { col + x0, -row + y0 };
                }

                @Override
                public double[] toPixel(double x, double y) {
                    return new double[] { x - x0, y0 - y };
                }
            };
        }
    }

    private static ElementStub shiftOnly(String bundle, String id, String minimumPoints) {
        return element("transform").by(bundle).with("id", id).with("name", "shift only")
                .with("minimumPoints", minimumPoints).creates("class", new ShiftOnly());
    }

    @Test
    void contributedTypeJoinsTheBuiltInsAndBadOnesAreSkipped() {
        TransformCatalog catalog = TransformCatalog.withBuiltIns();
        List<String> problems = TransformContributions.readInto(catalog, ElementStub.all(
                shiftOnly("b.good", "shift-only", "1"),
                shiftOnly("b.hijack", "affine", "3"),
                shiftOnly("b.zero", "zero", "0"),
                shiftOnly("b.text", "text", "one"),
                element("transform").by("b.wrongtype").with("id", "w").with("name", "W").with("minimumPoints", "2")
                        .creates("class", "not an estimator"),
                element("transform").by("b.noclass").with("id", "n").with("name", "N").with("minimumPoints", "2")
                        .with("class", "com.example.Missing")));
        assertEquals(List.of("similarity", "affine", "polynomial_2", "projective", "shift-only"), catalog.ids());
        assertEquals(5, problems.size(), problems.toString());
        assertTrue(problems.get(0).startsWith("georeference transform 'affine' contributed by b.hijack: ")
                && problems.get(0).contains("choose another id"), problems.get(0));
        assertTrue(problems.get(1).contains("b.zero") && problems.get(1).contains("must be >= 1"), problems.get(1));
        assertTrue(problems.get(2).contains("b.text") && problems.get(2).contains("must be an integer"));
        assertTrue(problems.get(3).contains("b.wrongtype") && problems.get(3).contains("TransformEstimator"));
        assertTrue(problems.get(4).contains("b.noclass") && problems.get(4).contains("cannot be found"));
    }

    @Test
    void fitterUsesAContributedTypeWithLeaveOneOutResiduals() {
        TransformCatalog catalog = new TransformCatalog();
        assertEquals(List.of(), TransformContributions.readInto(catalog, ElementStub.all(
                shiftOnly("b.good", "shift-only", "1"))));
        TransformType type = catalog.find("shift-only").orElseThrow();
        // offsets x − col of 1000, 1003, 1006 (mean 1003); y + row of 5000 throughout
        List<ControlPoint> points = List.of(ControlPoint.of("A", 10, 20, 1010, 4980),
                ControlPoint.of("B", 200, 50, 1203, 4950), ControlPoint.of("C", 90, 300, 1096, 4700));
        FitReport report = TransformFitter.fit(type, points);
        assertEquals(type, report.type());
        assertEquals(1003, report.transform().toMap(0, 0)[0], 1e-9);
        assertEquals(5000, report.transform().toMap(0, 0)[1], 1e-9);
        // residuals −3, 0, +3 → RMS √(18 / 3) = √6
        assertEquals(Math.sqrt(6), report.rms(), 1e-9);
        // deleted residual of a sample mean = residual · n / (n − 1) (Cook and Weisberg 1982, ch. 2; from memory):
        // point A: 3 · 3/2 = 4.5
        assertEquals(4.5, report.residuals().get(0).leaveOneOut().getAsDouble(), 1e-9);
        assertThrows(UnsupportedOperationException.class, () -> report.transform().kind());
        assertTrue(report.transform().asWorldFile().isEmpty());
    }

    @Test
    void warningsAndErrorsNameTheContributedType() {
        TransformType type = new TransformType("shift-only", "shift only", 2, new ShiftOnly());
        IllegalArgumentException tooFew = assertThrows(IllegalArgumentException.class,
                () -> TransformFitter.fit(type, List.of(ControlPoint.of("A", 10, 20, 1010, 4980))));
        assertEquals("A shift only transform needs at least 2 enabled control points; 1 is enabled",
                tooFew.getMessage());
        FitReport exact = TransformFitter.fit(type, List.of(ControlPoint.of("A", 10, 20, 1010, 4980),
                ControlPoint.of("B", 200, 50, 1200, 4950)));
        assertTrue(exact.warnings(1).get(0).startsWith("2 control points is the minimum for a shift only transform"),
                exact.warnings(1).toString());
    }

    @Test
    void builtInKindsAsTypesKeepTheirIdsAndMinimums() {
        for (TransformKind kind : TransformKind.values()) {
            TransformType type = TransformType.of(kind);
            assertEquals(kind.minimumPoints(), type.minimumPoints());
            assertEquals(kind, type.builtInKind().orElseThrow());
            assertEquals(BuiltInTransforms.estimatorClass(kind), type.estimator().getClass());
        }
        assertEquals(List.of(), TransformContributions.readInto(new TransformCatalog(), ElementStub.all(
                element("transform").with("id", "affine").with("name", "affine").with("minimumPoints", "3")
                        .creates("class", new BuiltInTransforms.Affine()))));
    }

    @Test
    void pluginXmlContributesEveryBuiltInKind() throws Exception {
        String pluginXml = Files.readString(Path.of(System.getProperty("digitize.bundle.dir", "."), "plugin.xml"));
        for (TransformKind kind : TransformKind.values()) {
            String entry = "<transform id=\"" + TransformType.idOf(kind) + "\" name=\"" + kind.label()
                    + "\" minimumPoints=\"" + kind.minimumPoints() + "\"";
            assertTrue(pluginXml.contains(entry), entry);
            assertTrue(pluginXml.contains("class=\"" + BuiltInTransforms.estimatorClass(kind).getName() + "\""),
                    kind.name());
        }
    }

    @Test
    void withoutARegistryTheCatalogHoldsTheBuiltIns() {
        assertEquals(List.of("similarity", "affine", "polynomial_2", "projective"),
                TransformContributions.platformCatalog().ids());
    }
}
