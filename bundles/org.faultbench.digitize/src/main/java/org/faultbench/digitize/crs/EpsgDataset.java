package org.faultbench.digitize.crs;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.Proj4jException;

/**
 * The EPSG definitions shipped in proj4j-epsg (resource proj4/nad/epsg), read through proj4j's own class loader
 * because in OSGi that jar is a fragment of the proj4j bundle. Parsed systems are cached: proj4j scans the whole
 * file for every look-up.
 */
final class EpsgDataset {
    static final String AUTHORITY_PREFIX = "EPSG:";

    /** proj4j's EPSG file: each definition line "&lt;code&gt; +proj=..." follows a comment line "# name". */
    private static final String DEFINITIONS = "/proj4/nad/epsg";

    private static final CRSFactory FACTORY = new CRSFactory();
    private static final Map<Integer, CoordinateReferenceSystem> SYSTEMS = new ConcurrentHashMap<>();
    private static final Map<Integer, String> NAMES = new ConcurrentHashMap<>();

    private EpsgDataset() {
    }

    /** The proj4j system for {@code code}; IllegalArgumentException naming the code if there is none. */
    static CoordinateReferenceSystem crs(int code) {
        return SYSTEMS.computeIfAbsent(code, EpsgDataset::parse);
    }

    /** The EPSG name of {@code code}, or "EPSG:code" if the file gives none. */
    static String name(int code) {
        return NAMES.computeIfAbsent(code, EpsgDataset::readName);
    }

    private static CoordinateReferenceSystem parse(int code) {
        definitions();
        try {
            synchronized (FACTORY) { // proj4j's registry is not documented as thread-safe
                return FACTORY.createFromName(AUTHORITY_PREFIX + code);
            }
        } catch (Proj4jException e) {
            throw new IllegalArgumentException("EPSG code " + code + " is not a coordinate reference system known "
                    + "to proj4j: " + e.getMessage(), e);
        }
    }

    private static String readName(int code) {
        String definitionStart = "<" + code + ">";
        try (InputStream in = definitions().openStream()) {
            BufferedReader lines = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String comment = null;
            for (String line = lines.readLine(); line != null; line = lines.readLine()) {
                if (line.startsWith(definitionStart)) {
                    return comment == null ? AUTHORITY_PREFIX + code : comment;
                }
                comment = line.startsWith("#") ? line.substring(1).strip() : null;
            }
            throw new IllegalArgumentException("EPSG code " + code + " is not in proj4j's EPSG definitions");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read proj4j's EPSG definitions " + DEFINITIONS, e);
        }
    }

    private static URL definitions() {
        URL definitions = CRSFactory.class.getResource(DEFINITIONS);
        if (definitions == null) {
            throw new IllegalStateException("proj4j's EPSG definitions " + DEFINITIONS + " are not on the class "
                    + "path; the proj4j-epsg jar (OSGi fragment org.locationtech.proj4j.epsg) is missing");
        }
        return definitions;
    }
}
