package org.faultbench.faults.qc;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.faultbench.faults.Fault;
import org.faultbench.faults.profile.CutOffPair;
import org.faultbench.faults.profile.ThrowProfile;
import org.locationtech.jts.geom.Envelope;

/**
 * Everything a QC rule may look at for one fault: the fault, its cut-off lines and throw profiles per horizon in
 * stratigraphic order, the other faults of the project (which may explain a truncated tip) and the map extent.
 */
public final class FaultQcContext {

    private final Fault fault;
    private final List<CutOffPair> cutOffs;
    private final List<ThrowProfile> profiles;
    private final List<Fault> otherFaults;
    private final Envelope mapExtent;
    private final boolean growthFault;

    /**
     * @param fault the fault to check
     * @param cutOffsTopDown its cut-off pairs, one per horizon, shallowest horizon first (stratigraphic order)
     * @param otherFaults the project's other faults; the checked fault itself is left out if present
     * @param mapExtent extent of the mapped data, null when unknown
     * @param growthFault whether the fault moved while the mapped horizons were deposited
     */
    public FaultQcContext(Fault fault, List<CutOffPair> cutOffsTopDown, List<Fault> otherFaults, Envelope mapExtent,
            boolean growthFault) {
        if (fault == null) {
            throw new IllegalArgumentException("QC context: fault is missing");
        }
        this.fault = fault;
        this.cutOffs = List.copyOf(cutOffsTopDown);
        checkCutOffs();
        this.profiles = cutOffs.stream().map(CutOffPair::throwProfile).toList();
        this.otherFaults = otherFaults.stream().filter(other -> !other.id().equals(fault.id())).toList();
        this.mapExtent = mapExtent == null ? null : new Envelope(mapExtent);
        this.growthFault = growthFault;
    }

    private void checkCutOffs() {
        Set<String> horizons = new HashSet<>();
        for (CutOffPair pair : cutOffs) {
            if (!pair.faultId().equals(fault.id())) {
                throw new IllegalArgumentException("QC context of fault '" + fault.name() + "': cut-offs of horizon '"
                        + pair.horizon() + "' belong to fault '" + pair.faultId() + "'");
            }
            if (!horizons.add(pair.horizon())) {
                throw new IllegalArgumentException("QC context of fault '" + fault.name() + "': horizon '"
                        + pair.horizon() + "' is given twice");
            }
        }
    }

    public Fault fault() {
        return fault;
    }

    /** Cut-off pairs, shallowest horizon first. */
    public List<CutOffPair> cutOffs() {
        return cutOffs;
    }

    /** Throw profiles in the order of {@link #cutOffs()}. */
    public List<ThrowProfile> throwProfiles() {
        return profiles;
    }

    public Optional<ThrowProfile> throwProfile(String horizon) {
        return profiles.stream().filter(profile -> profile.horizon().equals(horizon)).findFirst();
    }

    public List<Fault> otherFaults() {
        return otherFaults;
    }

    /** Extent of the mapped data; empty when unknown. */
    public Optional<Envelope> mapExtent() {
        return Optional.ofNullable(mapExtent).map(Envelope::new);
    }

    public boolean isGrowthFault() {
        return growthFault;
    }
}
