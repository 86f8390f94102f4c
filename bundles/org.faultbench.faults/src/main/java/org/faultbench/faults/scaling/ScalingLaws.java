package org.faultbench.faults.scaling;

import java.util.List;

/** The published D–L reference lines the workbench offers, with their citations. */
public final class ScalingLaws {

    /** Small rift-related normal faults, 201 measurements: D = 0.03 L. */
    public static final ScalingLaw SCHLISCHE_1996 = new ScalingLaw("Small rift normal faults, D = 0.03 L", 0.03, 1,
            "Schlische et al. 1996, Geology 24 (201 faults)");

    /**
     * Joint regression over about six orders of magnitude of length: exponent 0.946 ± 0.043. The coefficient is not
     * recorded here, so this law gives the slope only and draws no line.
     */
    public static final ScalingLaw CLARK_COX_1996 = new ScalingLaw("Joint regression, n = 0.946 ± 0.043",
            Double.NaN, 0.946, "Clark & Cox 1996, J. Struct. Geol. 18, 147-152 (exponent only; coefficient not"
                    + " recorded)");

    /** Compilation of 4059 normal faults from 66 sources: D = 0.3 L^0.92. */
    public static final ScalingLaw LATHROP_2022 = new ScalingLaw("Normal-fault compilation, D = 0.3 L^0.92", 0.3,
            0.92, "Lathrop, Jackson, Bell & Rotevatn 2022, Front. Earth Sci. 10:907543 (from the paper's abstract;"
                    + " units to verify, metres assumed)");

    private ScalingLaws() {
    }

    /** All reference laws, those without a coefficient included (they carry a slope only). */
    public static List<ScalingLaw> all() {
        return List.of(SCHLISCHE_1996, CLARK_COX_1996, LATHROP_2022, ScalingEnvelope.NORMAL_FAULTS.lower(),
                ScalingEnvelope.NORMAL_FAULTS.upper());
    }
}
