package org.faultbench.digitize.las;

import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

import org.faultbench.core.units.LengthUnit;

/**
 * The content of a LAS 2.0 file: header sections and log curves sampled at common depths.
 *
 * @param wrapped whether the data section was written in wrap mode (WRAP YES)
 * @param well the ~W section in file order (STRT, STOP, STEP, NULL, WELL, ...; values as written)
 * @param parameters the ~P section in file order
 * @param other the free text of the ~O section, lines joined with '\n'; empty when absent
 * @param depthUnit depth unit of the file (index curve, STRT, STOP, STEP)
 * @param depths the index curve converted to metres, one per depth step, copied
 * @param curves the other curves in file order, values in their own units
 */
public record LasLog(boolean wrapped, List<LasItem> well, List<LasItem> parameters, String other,
        LengthUnit depthUnit, double[] depths, List<LasCurve> curves) {

    public LasLog {
        if (well == null || parameters == null || other == null || depthUnit == null || depths == null
                || curves == null) {
            throw new IllegalArgumentException("LAS log incomplete: every section and the depths are needed");
        }
        well = List.copyOf(well);
        parameters = List.copyOf(parameters);
        depths = depths.clone();
        curves = List.copyOf(curves);
        for (LasCurve curve : curves) {
            if (curve.values().length != depths.length) {
                throw new IllegalArgumentException("LAS curve " + curve.mnemonic() + " has " + curve.values().length
                        + " values for " + depths.length + " depths");
            }
        }
    }

    @Override
    public double[] depths() {
        return depths.clone();
    }

    /** The ~W item with {@code mnemonic} (letter case ignored). */
    public Optional<LasItem> wellItem(String mnemonic) {
        return well.stream().filter(item -> item.mnemonic().equalsIgnoreCase(mnemonic)).findFirst();
    }

    /** Well name from the WELL item; empty when the file gives none. */
    public String wellName() {
        return wellItem("WELL").map(LasItem::value).orElse("");
    }

    /** The curve with {@code mnemonic} (letter case ignored). */
    public LasCurve curve(String mnemonic) {
        return curves.stream().filter(c -> c.mnemonic().equalsIgnoreCase(mnemonic)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no curve '" + mnemonic + "' in this log; it has "
                        + curves.stream().map(LasCurve::mnemonic).collect(Collectors.joining(", "))));
    }
}
