package org.faultbench.digitize.las;

import java.io.IOException;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.faultbench.core.units.LengthUnit;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.FormatException;

/**
 * Reads well logs in the Log ASCII Standard version 2.0 (Canadian Well Logging Society 1992, updated 2017).
 * <p>
 * Sections: ~V with VERS 2.0 and WRAP YES or NO; ~W with at least STRT, STOP, STEP and NULL; ~C with the curves in
 * data order, the first being the depth index; optional ~P and ~O; ~A, the data, last. Other sections are skipped.
 * Depths (index, STRT, STOP, STEP) must be in metres (M) or feet (F, FT) and are converted to metres; where STRT
 * carries no unit, the depth unit declared on import ({@link FileUnits#z()}) is assumed. Curve values keep their own
 * units; NULL values become NaN. Any departure is reported with its line (and field in the data), and nothing is
 * returned from a file that fails.
 */
public final class LasReader {
    private static final List<String> REQUIRED_WELL_ITEMS = List.of("STRT", "STOP", "STEP", "NULL");

    private final FileUnits units;

    public LasReader(FileUnits units) {
        if (units == null) {
            throw new IllegalArgumentException("file units missing");
        }
        this.units = units;
    }

    /** Reads {@code file}; LAS is ASCII, so bytes are decoded as ISO-8859-1, which accepts any byte. */
    public LasLog read(Path file) throws IOException {
        Path name = file.getFileName();
        return parse(name == null ? file.toString() : name.toString(),
                Files.readAllLines(file, StandardCharsets.ISO_8859_1));
    }

    /** Reads from {@code in}; {@code sourceName} names the source in error messages. */
    public LasLog read(Reader in, String sourceName) throws IOException {
        StringWriter text = new StringWriter();
        in.transferTo(text);
        return parse(sourceName, text.toString().lines().toList());
    }

    private LasLog parse(String fileName, List<String> lines) throws FormatException {
        Map<Character, LasSection> sections = LasSection.split(fileName, lines);
        LasSection version = required(fileName, sections, 'V', "version");
        LasSection wellSection = required(fileName, sections, 'W', "well information");
        LasSection curveSection = required(fileName, sections, 'C', "curve information");
        LasSection data = required(fileName, sections, 'A', "ASCII log data");
        Map<String, Numbered> versionItems = items(fileName, version);
        requireVersion2(fileName, version, versionItems);
        boolean wrapped = wrapMode(fileName, version, versionItems);
        List<Numbered> well = numberedItems(fileName, wellSection);
        Map<String, Numbered> wellItems = byMnemonic(well);
        for (String mnemonic : REQUIRED_WELL_ITEMS) {
            if (!wellItems.containsKey(mnemonic)) {
                throw new FormatException(fileName, wellSection.headerLine(), 0, "the ~W section has no " + mnemonic
                        + " line");
            }
        }
        LengthUnit depthUnit = depthUnit(fileName, wellItems);
        double nullValue = number(fileName, wellItems.get("NULL"));
        List<LasItem> curveItems = curveItems(fileName, curveSection, depthUnit);
        double[][] columns = LasData.read(fileName, data, curveItems, nullValue, wrapped);
        List<LasCurve> curves = new ArrayList<>();
        for (int c = 1; c < curveItems.size(); c++) {
            curves.add(new LasCurve(curveItems.get(c), columns[c]));
        }
        double[] depths = columns[0].clone();
        for (int s = 0; s < depths.length; s++) {
            depths[s] = depthUnit.toMetres(depths[s]);
        }
        return new LasLog(wrapped, well.stream().map(Numbered::item).toList(),
                plainItems(fileName, sections.get('P')), otherText(sections.get('O')), depthUnit, depths, curves);
    }

    /** A header item with the line it came from, for error messages. */
    private record Numbered(int line, LasItem item) {
    }

    private static LasSection required(String fileName, Map<Character, LasSection> sections, char letter,
            String what) throws FormatException {
        LasSection section = sections.get(letter);
        if (section == null) {
            throw new FormatException(fileName, 0, 0, "no ~" + letter + " (" + what + ") section; is this a LAS "
                    + "file?");
        }
        return section;
    }

    private static List<Numbered> numberedItems(String fileName, LasSection section) throws FormatException {
        List<Numbered> items = new ArrayList<>();
        for (LasSection.NumberedLine line : section.lines()) {
            items.add(new Numbered(line.number(), LasHeaderLine.parse(fileName, line)));
        }
        return items;
    }

    private static Map<String, Numbered> items(String fileName, LasSection section) throws FormatException {
        return byMnemonic(numberedItems(fileName, section));
    }

    /** Items by upper-case mnemonic; the first of a repeated mnemonic wins. */
    private static Map<String, Numbered> byMnemonic(List<Numbered> items) {
        Map<String, Numbered> map = new HashMap<>();
        for (Numbered item : items) {
            map.putIfAbsent(item.item().mnemonic().toUpperCase(Locale.ROOT), item);
        }
        return map;
    }

    private static List<LasItem> plainItems(String fileName, LasSection section) throws FormatException {
        return section == null ? List.of() : numberedItems(fileName, section).stream().map(Numbered::item).toList();
    }

    private static String otherText(LasSection section) {
        return section == null ? ""
                : String.join("\n", section.lines().stream().map(line -> line.text().strip()).toList());
    }

    private static void requireVersion2(String fileName, LasSection version, Map<String, Numbered> items)
            throws FormatException {
        Numbered vers = items.get("VERS");
        if (vers == null) {
            throw new FormatException(fileName, version.headerLine(), 0, "the ~V section has no VERS line");
        }
        String value = vers.item().value();
        if (!LasData.isNumber(value) || Double.parseDouble(value) != 2.0) {
            throw new FormatException(fileName, vers.line(), 0, "only LAS version 2.0 is read; this file declares "
                    + "VERS '" + value + "'");
        }
    }

    private static boolean wrapMode(String fileName, LasSection version, Map<String, Numbered> items)
            throws FormatException {
        Numbered wrap = items.get("WRAP");
        if (wrap == null) {
            throw new FormatException(fileName, version.headerLine(), 0, "the ~V section has no WRAP line");
        }
        String value = wrap.item().value().toUpperCase(Locale.ROOT);
        if (!value.equals("YES") && !value.equals("NO")) {
            throw new FormatException(fileName, wrap.line(), 0, "WRAP must be YES or NO, found '"
                    + wrap.item().value() + "'");
        }
        return value.equals("YES");
    }

    /** Unit of STRT, which STOP and STEP must share. */
    private LengthUnit depthUnit(String fileName, Map<String, Numbered> wellItems) throws FormatException {
        Numbered start = wellItems.get("STRT");
        LengthUnit unit = lengthUnit(start.item().unit()).orElse(null);
        if (unit == null && !start.item().unit().isEmpty()) {
            throw new FormatException(fileName, start.line(), 0, "STRT is in '" + start.item().unit() + "', not a "
                    + "depth unit (M, F or FT); only depth-indexed logs are read");
        }
        LengthUnit depthUnit = unit == null ? units.z() : unit;
        for (String mnemonic : List.of("STOP", "STEP")) {
            Numbered item = wellItems.get(mnemonic);
            if (!item.item().unit().isEmpty() && lengthUnit(item.item().unit()).orElse(null) != depthUnit) {
                throw new FormatException(fileName, item.line(), 0, mnemonic + " is in '" + item.item().unit()
                        + "' but the depths are in " + depthUnit.symbol());
            }
        }
        return depthUnit;
    }

    private static Optional<LengthUnit> lengthUnit(String symbol) {
        return switch (symbol.toUpperCase(Locale.ROOT)) {
            case "M", "METRE", "METRES", "METER", "METERS" -> Optional.of(LengthUnit.METRE);
            case "F", "FT", "FEET", "FOOT" -> Optional.of(LengthUnit.FOOT);
            default -> Optional.empty();
        };
    }

    private static double number(String fileName, Numbered item) throws FormatException {
        if (!LasData.isNumber(item.item().value())) {
            throw new FormatException(fileName, item.line(), 0, "expected a number for " + item.item().mnemonic()
                    + ", found '" + item.item().value() + "'");
        }
        return Double.parseDouble(item.item().value());
    }

    /** Curve definitions; the first (index) must be in the depth unit when it names a length unit. */
    private static List<LasItem> curveItems(String fileName, LasSection section, LengthUnit depthUnit)
            throws FormatException {
        List<Numbered> curves = numberedItems(fileName, section);
        if (curves.isEmpty()) {
            throw new FormatException(fileName, section.headerLine(), 0, "the ~C section defines no curve");
        }
        Map<String, Integer> firstLine = new HashMap<>();
        for (Numbered curve : curves) {
            Integer earlier = firstLine.putIfAbsent(curve.item().mnemonic().toUpperCase(Locale.ROOT), curve.line());
            if (earlier != null) {
                throw new FormatException(fileName, curve.line(), 0, "curve " + curve.item().mnemonic()
                        + " is defined twice (first on line " + earlier + ")");
            }
        }
        Numbered index = curves.get(0);
        String indexUnit = index.item().unit();
        if (!indexUnit.isEmpty() && lengthUnit(indexUnit).orElse(null) != depthUnit) {
            throw new FormatException(fileName, index.line(), 0, "the index curve " + index.item().mnemonic()
                    + " is in '" + indexUnit + "' but STRT gives depths in " + depthUnit.symbol());
        }
        return curves.stream().map(Numbered::item).toList();
    }
}
