package org.faultbench.ui.preferences;

import java.util.List;

import org.eclipse.jface.preference.ComboFieldEditor;
import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.IntegerFieldEditor;
import org.eclipse.jface.preference.RadioGroupFieldEditor;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPreferencePage;
import org.faultbench.core.units.LengthUnit;
import org.faultbench.core.units.PressureUnit;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.SealCriterionContributions;

/**
 * Window &gt; Preferences &gt; Faultbench: display units, the default seal criterion and the default number of
 * realisations. Views listen to the store and redraw when a value changes.
 */
public class FaultbenchPreferencePage extends FieldEditorPreferencePage implements IWorkbenchPreferencePage {
    public static final String ID = "org.faultbench.ui.preferences.faultbench";
    /** Pressure units offered; pascals are too small to read. */
    static final List<PressureUnit> PRESSURES = List.of(PressureUnit.BAR, PressureUnit.PSI, PressureUnit.KILOPASCAL,
            PressureUnit.MEGAPASCAL);

    public FaultbenchPreferencePage() {
        super(GRID);
        setDescription("Units in which results are shown (the model always computes in metres and pascals), and "
                + "defaults for new runs.");
    }

    @Override
    public void init(IWorkbench workbench) {
        setPreferenceStore(FaultbenchPreferences.store());
    }

    @Override
    protected void createFieldEditors() {
        addField(new RadioGroupFieldEditor(FaultbenchPreferences.LENGTH_UNIT, "&Length unit (depths, columns):", 2,
                new String[][] { { "metres (m)", LengthUnit.METRE.name() }, { "feet (ft)", LengthUnit.FOOT.name() } },
                getFieldEditorParent(), true));
        String[][] pressures = PRESSURES.stream().map(p -> new String[] { p.symbol(), p.name() })
                .toArray(String[][]::new);
        addField(new ComboFieldEditor(FaultbenchPreferences.PRESSURE_UNIT, "&Pressure unit:", pressures,
                getFieldEditorParent()));
        List<SealCriterion> criteria = SealCriterionContributions.platformCatalog().list();
        String[][] criterionEntries = criteria.stream().map(c -> new String[] { c.name() + " (" + c.id() + ")", c.id() })
                .toArray(String[][]::new);
        addField(new ComboFieldEditor(FaultbenchPreferences.SEAL_CRITERION, "Default &seal criterion:",
                criterionEntries, getFieldEditorParent()));
        note("Used for a study whose analysis file names no seal criterion (the id is then written into the file on"
                + " save); a criterion named in the file always wins.");
        IntegerFieldEditor realisations = new IntegerFieldEditor(FaultbenchPreferences.REALISATIONS,
                "Default &realisations:", getFieldEditorParent());
        realisations.setValidRange(1, 10_000_000);
        addField(realisations);
        note("Used by the Run action of the results view when the analysis file does not give "
                + "simulation.realisations; a number in the file always wins.");
    }

    private void note(String text) {
        Label label = new Label(getFieldEditorParent(), SWT.WRAP);
        label.setText(text);
        GridData data = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        data.widthHint = 380;
        label.setLayoutData(data);
    }

    @Override
    public boolean performOk() {
        boolean ok = super.performOk();
        FaultbenchPreferences.save();
        return ok;
    }
}
