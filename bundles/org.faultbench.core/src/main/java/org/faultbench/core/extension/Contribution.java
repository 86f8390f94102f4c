package org.faultbench.core.extension;

import java.util.Arrays;
import java.util.List;
import java.util.function.Function;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;

/**
 * One element of an extension, as a registry reader sees it: typed access to its attributes whose failures say which
 * attribute of which contribution of which bundle is wrong, so the reader can log the message and skip the element.
 * Every accessor throws {@link IllegalArgumentException} with a message meant for the plug-in author.
 */
public final class Contribution {

    private final IConfigurationElement element;
    private final String kind;

    Contribution(IConfigurationElement element, String kind) {
        this.element = element;
        this.kind = kind;
    }

    public IConfigurationElement element() {
        return element;
    }

    /** The value of the element's {@code id} attribute (null when missing). */
    public String id() {
        return element.getAttribute("id");
    }

    /** The {@code name} attribute, or the id when there is none. */
    public String name() {
        String name = element.getAttribute("name");
        return name == null || name.isBlank() ? id() : name;
    }

    /** Symbolic name of the contributing bundle, "?" when the registry does not say. */
    public String contributor() {
        return element.getContributor() == null ? "?" : element.getContributor().getName();
    }

    /** Prefix of every message about this contribution, e.g. "seal criterion 'x' contributed by com.example: ". */
    public String where() {
        return kind + " '" + id() + "' contributed by " + contributor() + ": ";
    }

    /** @throws IllegalArgumentException when the attribute is missing or blank */
    public String requiredAttribute(String attribute) {
        String value = element.getAttribute(attribute);
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException("attribute '" + attribute + "' is missing");
        }
        return value.trim();
    }

    public String attribute(String attribute, String defaultValue) {
        String value = element.getAttribute(attribute);
        return value == null || value.isBlank() ? defaultValue : value.trim();
    }

    /** @throws IllegalArgumentException when the attribute is missing, no integer, or below {@code minimum} */
    public int integerAttribute(String attribute, int minimum) {
        String text = requiredAttribute(attribute);
        int value;
        try {
            value = Integer.parseInt(text);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("attribute '" + attribute + "' must be an integer, was '" + text + "'");
        }
        if (value < minimum) {
            throw new IllegalArgumentException("attribute '" + attribute + "' must be >= " + minimum + ", was " + value);
        }
        return value;
    }

    /** @throws IllegalArgumentException when the attribute is missing or not a finite number */
    public double numberAttribute(String attribute) {
        String text = requiredAttribute(attribute);
        try {
            double value = Double.parseDouble(text);
            if (Double.isFinite(value)) {
                return value;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException("attribute '" + attribute + "' must be a finite number, was '" + text + "'");
    }

    /** A comma-separated attribute as a list of trimmed, non-empty items; empty list when missing. */
    public List<String> listAttribute(String attribute) {
        String value = element.getAttribute(attribute);
        if (value == null) {
            return List.of();
        }
        return Arrays.stream(value.split(",")).map(String::trim).filter(item -> !item.isEmpty()).toList();
    }

    /** Enum constant named by the attribute, case-insensitive; the message lists the accepted names. */
    public <E extends Enum<E>> E enumAttribute(String attribute, Class<E> type) {
        String text = requiredAttribute(attribute);
        for (E constant : type.getEnumConstants()) {
            if (constant.name().equalsIgnoreCase(text.replace('-', '_'))) {
                return constant;
            }
        }
        throw new IllegalArgumentException("attribute '" + attribute + "' must be one of "
                + Arrays.stream(type.getEnumConstants()).map(e -> e.name().toLowerCase(java.util.Locale.ROOT)).toList()
                + ", was '" + text + "'");
    }

    /**
     * Creates the object named by a class attribute.
     *
     * @throws CoreException when the registry cannot create it (class not found, no public no-argument constructor)
     * @throws IllegalArgumentException when it is not of the expected type
     */
    public <T> T create(String classAttribute, Class<T> type) throws CoreException {
        requiredAttribute(classAttribute);
        Object created = element.createExecutableExtension(classAttribute);
        if (!type.isInstance(created)) {
            throw new IllegalArgumentException("class " + (created == null ? "null" : created.getClass().getName())
                    + " does not implement " + type.getSimpleName());
        }
        return type.cast(created);
    }

    /** Creates the {@code class} attribute's object and checks that it reports the extension's id. */
    public <T> T createWithId(Class<T> type, Function<? super T, String> idOf) throws CoreException {
        T created = create("class", type);
        String reported = idOf.apply(created);
        if (!id().equals(reported)) {
            throw new IllegalArgumentException("the object reports id '" + reported + "', the extension says '" + id()
                    + "'");
        }
        return created;
    }

    /** Child elements with the given name, as contributions of the given kind. */
    public List<Contribution> children(String childName, String childKind) {
        IConfigurationElement[] children = element.getChildren(childName);
        if (children == null) {
            return List.of();
        }
        return Arrays.stream(children).map(child -> new Contribution(child, childKind)).toList();
    }
}
