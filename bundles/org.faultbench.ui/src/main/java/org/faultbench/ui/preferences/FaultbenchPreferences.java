package org.faultbench.ui.preferences;

import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.jface.util.IPropertyChangeListener;
import org.eclipse.ui.preferences.ScopedPreferenceStore;
import org.faultbench.core.units.LengthUnit;
import org.faultbench.core.units.PressureUnit;
import org.faultbench.ui.DisplayUnits;

/**
 * The workbench-wide Faultbench preferences, kept in the instance scope (the workspace) under node
 * {@value #NODE}: display units, the default seal criterion and the default number of realisations.
 */
public final class FaultbenchPreferences {
    public static final String NODE = "org.faultbench.ui";
    /** {@link LengthUnit} name: METRE or FOOT. */
    public static final String LENGTH_UNIT = "lengthUnit";
    /** {@link PressureUnit} name: BAR, PSI, KILOPASCAL or MEGAPASCAL. */
    public static final String PRESSURE_UNIT = "pressureUnit";
    /** Seal criterion id from the seal-criteria catalogue. */
    public static final String SEAL_CRITERION = "sealCriterion";
    /** Realisations of a run when the analysis file does not give simulation.realisations. */
    public static final String REALISATIONS = "realisations";

    public static final int DEFAULT_REALISATIONS = 1000;
    public static final String DEFAULT_SEAL_CRITERION = "sgr";

    private static ScopedPreferenceStore store;

    private FaultbenchPreferences() {
    }

    /** The store, with its defaults set on first use. */
    public static synchronized IPreferenceStore store() {
        if (store == null) {
            store = new ScopedPreferenceStore(InstanceScope.INSTANCE, NODE);
            store.setDefault(LENGTH_UNIT, LengthUnit.METRE.name());
            store.setDefault(PRESSURE_UNIT, PressureUnit.BAR.name());
            store.setDefault(SEAL_CRITERION, DEFAULT_SEAL_CRITERION);
            store.setDefault(REALISATIONS, DEFAULT_REALISATIONS);
        }
        return store;
    }

    /** The display units now chosen; an unknown stored name falls back to the default. */
    public static DisplayUnits displayUnits() {
        IPreferenceStore s = store();
        return new DisplayUnits(parse(LengthUnit.class, s.getString(LENGTH_UNIT), LengthUnit.METRE),
                parse(PressureUnit.class, s.getString(PRESSURE_UNIT), PressureUnit.BAR));
    }

    public static int defaultRealisations() {
        int n = store().getInt(REALISATIONS);
        return n >= 1 ? n : DEFAULT_REALISATIONS;
    }

    public static String defaultSealCriterion() {
        return store().getString(SEAL_CRITERION);
    }

    /** Sets and saves the length unit (tests, scripts). */
    public static void setLengthUnit(LengthUnit unit) {
        store().setValue(LENGTH_UNIT, unit.name());
        save();
    }

    /** Writes the store to disk; a failure is logged, never shown as an error (the values still apply). */
    public static void save() {
        try {
            ((ScopedPreferenceStore) store()).save();
        } catch (java.io.IOException e) {
            org.eclipse.core.runtime.ILog.of(FaultbenchPreferences.class)
                    .warn("Could not save the Faultbench preferences: " + e.getMessage(), e);
        }
    }

    public static void addListener(IPropertyChangeListener listener) {
        store().addPropertyChangeListener(listener);
    }

    public static void removeListener(IPropertyChangeListener listener) {
        store().removePropertyChangeListener(listener);
    }

    private static <E extends Enum<E>> E parse(Class<E> type, String name, E fallback) {
        try {
            return Enum.valueOf(type, name);
        } catch (IllegalArgumentException e) {
            return fallback;
        }
    }
}
