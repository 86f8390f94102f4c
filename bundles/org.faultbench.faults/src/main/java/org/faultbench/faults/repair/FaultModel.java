package org.faultbench.faults.repair;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.eclipse.core.commands.operations.IUndoContext;
import org.eclipse.core.commands.operations.ObjectUndoContext;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.CutOffPair;
import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.faults.qc.FaultQcContext;
import org.faultbench.faults.qc.QcFinding;
import org.faultbench.faults.qc.QcRuleCatalog;
import org.locationtech.jts.geom.Envelope;

/**
 * The faults of a project with their cut-off lines per horizon and wall and their growth flags: what QC checks and
 * the repair operations edit. Repairs go through the platform operation history with {@link #undoContext()}, so
 * every one can be undone. Not thread-safe: edit it from one thread.
 */
public final class FaultModel {

    private final List<String> horizons;
    private final List<FaultRecord> records = new ArrayList<>();
    private final IUndoContext undoContext = new ObjectUndoContext(this, "Fault model");

    /** @param horizonsTopDown names of the mapped horizons, shallowest first (stratigraphic order) */
    public FaultModel(List<String> horizonsTopDown) {
        Set<String> seen = new HashSet<>();
        for (String horizon : horizonsTopDown) {
            if (horizon == null || horizon.isBlank()) {
                throw new IllegalArgumentException("fault model: a horizon name is empty");
            }
            if (!seen.add(horizon)) {
                throw new IllegalArgumentException("fault model: horizon '" + horizon + "' is listed twice");
            }
        }
        this.horizons = List.copyOf(horizonsTopDown);
    }

    /** Horizon names, shallowest first. */
    public List<String> horizons() {
        return horizons;
    }

    /** Context of every repair operation on this model. */
    public IUndoContext undoContext() {
        return undoContext;
    }

    /** Adds a fault without cut-offs, not a growth fault. */
    public void addFault(Fault fault) {
        if (indexOf(fault.id()) >= 0) {
            throw new IllegalArgumentException("fault model: fault id '" + fault.id() + "' is already used by fault '"
                    + fault(fault.id()).name() + "'");
        }
        records.add(new FaultRecord(fault, false, List.of()));
    }

    /** Adds or replaces the cut-off line of its fault, horizon and wall. */
    public void putCutOff(CutOffLine line) {
        if (!horizons.contains(line.horizon())) {
            throw new IllegalArgumentException("fault model: cut-off line of fault '" + line.faultId()
                    + "' is of horizon '" + line.horizon() + "', which is not one of the mapped horizons " + horizons);
        }
        int index = existing(line.faultId());
        records.set(index, records.get(index).withCutOff(line));
    }

    /** Marks a fault as moving (or not) while the mapped horizons were deposited. */
    public void setGrowthFault(String faultId, boolean growth) {
        int index = existing(faultId);
        records.set(index, records.get(index).withGrowthFault(growth));
    }

    public List<Fault> faults() {
        return records.stream().map(FaultRecord::fault).toList();
    }

    /** @throws IllegalArgumentException when no fault has this id */
    public Fault fault(String faultId) {
        return record(faultId).fault();
    }

    public boolean isGrowthFault(String faultId) {
        return record(faultId).growthFault();
    }

    public Optional<CutOffLine> cutOff(String faultId, String horizon, Wall wall) {
        return record(faultId).cutOff(horizon, wall);
    }

    /** Cut-off pairs of the horizons mapped on both walls of the fault, shallowest first. */
    public List<CutOffPair> cutOffPairs(String faultId) {
        FaultRecord record = record(faultId);
        List<CutOffPair> pairs = new ArrayList<>();
        for (String horizon : horizons) {
            Optional<CutOffLine> footwall = record.cutOff(horizon, Wall.FOOTWALL);
            Optional<CutOffLine> hangingWall = record.cutOff(horizon, Wall.HANGING_WALL);
            if (footwall.isPresent() && hangingWall.isPresent()) {
                pairs.add(new CutOffPair(footwall.get(), hangingWall.get()));
            }
        }
        return pairs;
    }

    /** Throw profiles of the fault, shallowest horizon first. */
    public List<ThrowProfile> throwProfiles(String faultId) {
        return cutOffPairs(faultId).stream().map(CutOffPair::throwProfile).toList();
    }

    /** Throw profiles of every fault, in model order: the input of the displacement-length plot. */
    public Map<Fault, List<ThrowProfile>> throwProfilesByFault() {
        Map<Fault, List<ThrowProfile>> profiles = new LinkedHashMap<>();
        for (FaultRecord record : records) {
            profiles.put(record.fault(), throwProfiles(record.id()));
        }
        return profiles;
    }

    /** What the QC rules see of one fault; {@code mapExtent} may be null when unknown. */
    public FaultQcContext qcContext(String faultId, Envelope mapExtent) {
        return new FaultQcContext(fault(faultId), cutOffPairs(faultId), faults(), mapExtent,
                isGrowthFault(faultId));
    }

    /** Findings of every rule of {@code catalog} on every fault, fault by fault. */
    public List<QcFinding> check(QcRuleCatalog catalog, Envelope mapExtent) {
        List<QcFinding> findings = new ArrayList<>();
        for (Fault fault : faults()) {
            findings.addAll(catalog.check(qcContext(fault.id(), mapExtent)));
        }
        return findings;
    }

    FaultRecord record(String faultId) {
        return records.get(existing(faultId));
    }

    /** Removes the faults with these ids; returns them with their former positions, first position first. */
    List<Placed> remove(Collection<String> faultIds) {
        List<Placed> removed = new ArrayList<>();
        for (int i = 0; i < records.size(); i++) {
            if (faultIds.contains(records.get(i).id())) {
                removed.add(new Placed(i, records.get(i)));
            }
        }
        records.removeIf(record -> faultIds.contains(record.id()));
        return removed;
    }

    /** Puts records back at their positions (clamped to the list), first position first. */
    void insert(List<Placed> placed) {
        for (Placed p : placed) {
            records.add(Math.min(p.index(), records.size()), p.record());
        }
    }

    /** @throws IllegalArgumentException when a new id is taken by a fault that stays, or repeated */
    void checkIdsFree(List<FaultRecord> incoming, Collection<String> leaving) {
        Set<String> ids = new HashSet<>();
        for (FaultRecord record : incoming) {
            if (!ids.add(record.id()) || (indexOf(record.id()) >= 0 && !leaving.contains(record.id()))) {
                throw new IllegalArgumentException("fault id '" + record.id() + "' is already used; choose another");
            }
        }
    }

    private int existing(String faultId) {
        int index = indexOf(faultId);
        if (index < 0) {
            throw new IllegalArgumentException("fault model: no fault with id '" + faultId + "'");
        }
        return index;
    }

    private int indexOf(String faultId) {
        for (int i = 0; i < records.size(); i++) {
            if (records.get(i).id().equals(faultId)) {
                return i;
            }
        }
        return -1;
    }

    /** A record and its position in the model's list, so undo puts it back where it was. */
    record Placed(int index, FaultRecord record) {
    }
}
