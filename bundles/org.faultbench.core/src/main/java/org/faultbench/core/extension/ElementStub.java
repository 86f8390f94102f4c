package org.faultbench.core.extension;

import java.lang.reflect.Proxy;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IContributor;
import org.eclipse.core.runtime.Status;

/**
 * A configuration element built in code, as the extension registry would hand it to a reader. Registry readers and
 * plug-in authors use it to test contributions with plain JUnit, without an OSGi runtime. Class attributes resolve to
 * objects given up front ({@link #creates}); a class attribute without one fails as an unknown class would.
 */
public final class ElementStub {

    private final String name;
    private String contributor = "test.bundle";
    private final Map<String, String> attributes = new LinkedHashMap<>();
    private final Map<String, Object> created = new HashMap<>();
    private final Map<String, List<ElementStub>> children = new LinkedHashMap<>();

    private ElementStub(String name) {
        this.name = name;
    }

    /** An element with this name, contributed by "test.bundle" until {@link #by} says otherwise. */
    public static ElementStub element(String name) {
        return new ElementStub(name);
    }

    public ElementStub by(String bundle) {
        this.contributor = bundle;
        return this;
    }

    public ElementStub with(String attribute, String value) {
        attributes.put(attribute, value);
        return this;
    }

    /**
     * The object the registry creates for a class attribute; a {@link Throwable} is thrown instead (a
     * {@link CoreException} as the registry reports an unknown class).
     */
    public ElementStub creates(String classAttribute, Object object) {
        attributes.putIfAbsent(classAttribute, object == null ? "null" : object.getClass().getName());
        created.put(classAttribute, object);
        return this;
    }

    public ElementStub child(ElementStub child) {
        child.contributor = contributor;
        children.computeIfAbsent(child.name, k -> new ArrayList<>()).add(child);
        return this;
    }

    public IConfigurationElement build() {
        IContributor who = (IContributor) Proxy.newProxyInstance(IContributor.class.getClassLoader(),
                new Class<?>[] {IContributor.class}, (p, m, a) -> m.getName().equals("getName") ? contributor : null);
        return (IConfigurationElement) Proxy.newProxyInstance(IConfigurationElement.class.getClassLoader(),
                new Class<?>[] {IConfigurationElement.class}, (p, m, a) -> {
                    switch (m.getName()) {
                    case "getName":
                        return name;
                    case "getAttribute":
                        return attributes.get((String) a[0]);
                    case "getAttributeNames":
                        return attributes.keySet().toArray(new String[0]);
                    case "getContributor":
                        return who;
                    case "getChildren":
                        return childrenNamed(a == null || a.length == 0 ? null : (String) a[0]);
                    case "isValid":
                        return true;
                    case "createExecutableExtension":
                        return create((String) a[0]);
                    case "toString":
                        return "<" + name + " " + attributes + ">";
                    case "hashCode":
                        return System.identityHashCode(p);
                    case "equals":
                        return p == a[0];
                    default:
                        return null;
                    }
                });
    }

    private IConfigurationElement[] childrenNamed(String childName) {
        List<IConfigurationElement> result = new ArrayList<>();
        children.forEach((n, list) -> {
            if (childName == null || n.equals(childName)) {
                list.forEach(child -> result.add(child.build()));
            }
        });
        return result.toArray(new IConfigurationElement[0]);
    }

    private Object create(String attribute) throws Throwable {
        if (!created.containsKey(attribute)) {
            throw new CoreException(Status.error("class '" + attributes.get(attribute) + "' cannot be found"));
        }
        Object object = created.get(attribute);
        if (object instanceof Throwable failure) {
            throw failure;
        }
        return object;
    }

    /** Builds several stubs at once, in order. */
    public static IConfigurationElement[] all(ElementStub... stubs) {
        IConfigurationElement[] elements = new IConfigurationElement[stubs.length];
        for (int i = 0; i < stubs.length; i++) {
            elements[i] = stubs[i].build();
        }
        return elements;
    }
}
