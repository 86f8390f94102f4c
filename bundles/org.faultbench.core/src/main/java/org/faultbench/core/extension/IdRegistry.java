package org.faultbench.core.extension;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.Predicate;

/**
 * Entries of one kind by unique id, in registration order: what every catalog behind an extension point keeps
 * (seal criteria, QC rules, painters, importers...). Thread-safe, since the workbench and a background run may read
 * a catalog while a late contribution is registered.
 *
 * @param <T> the entry type
 */
public final class IdRegistry<T> {
    private final String kind;
    private final Function<? super T, String> name;
    private final Map<String, T> entries = new LinkedHashMap<>();

    /**
     * @param kind what the entries are, for messages (e.g. "seal criterion")
     * @param name the name shown to the user, for the message naming who already holds an id
     */
    public IdRegistry(String kind, Function<? super T, String> name) {
        this.kind = kind;
        this.name = name;
    }

    /** @throws IllegalArgumentException when the entry or its id is missing or the id is already taken */
    public synchronized void register(String id, T entry) {
        if (entry == null || id == null || id.isBlank()) {
            throw new IllegalArgumentException(kind + " or its id is missing: " + entry);
        }
        T holder = entries.get(id);
        if (holder != null) {
            throw new IllegalArgumentException(kind + " id '" + id + "' is already registered by "
                    + name.apply(holder));
        }
        entries.put(id, entry);
    }

    public synchronized Optional<T> find(String id) {
        return Optional.ofNullable(entries.get(id));
    }

    public synchronized List<T> list() {
        return List.copyOf(entries.values());
    }

    public synchronized List<String> ids() {
        return List.copyOf(entries.keySet());
    }

    /** The entries that pass {@code test}, in registration order. */
    public synchronized List<T> matching(Predicate<? super T> test) {
        return entries.values().stream().filter(test).toList();
    }
}
