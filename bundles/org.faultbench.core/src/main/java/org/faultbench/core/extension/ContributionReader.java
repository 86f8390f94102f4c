package org.faultbench.core.extension;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.RegistryFactory;

/**
 * The shared loop of every Faultbench registry reader: check the element name and id, hand each element to a handler
 * that validates and registers it, and turn any failure into one message naming the contribution and its bundle. A
 * bad contribution is skipped; the others still load, so one broken plug-in never takes the workbench or a batch
 * run down.
 */
public final class ContributionReader {

    /** Validates one contribution and registers it; throws to have it skipped. */
    @FunctionalInterface
    public interface Handler {
        void accept(Contribution contribution) throws CoreException;
    }

    private final String kind;
    private final String elementName;

    /**
     * @param kind what a contribution is, for messages, e.g. "seal criterion"
     * @param elementName the element each contribution must be, e.g. "criterion"
     */
    public ContributionReader(String kind, String elementName) {
        this.kind = kind;
        this.elementName = elementName;
    }

    /** Hands every well-formed element to the handler; returns one message per skipped element, in order. */
    public List<String> read(IConfigurationElement[] elements, Handler handler) {
        List<String> problems = new ArrayList<>();
        for (IConfigurationElement element : elements) {
            Contribution contribution = new Contribution(element, kind);
            String id = contribution.id();
            if (!elementName.equals(element.getName()) || id == null || id.isBlank()) {
                problems.add(contribution.where() + "an element <" + elementName + "> with an id is expected");
                continue;
            }
            try {
                handler.accept(contribution);
            } catch (IllegalArgumentException e) {
                problems.add(contribution.where() + e.getMessage());
            } catch (CoreException | RuntimeException | LinkageError e) {
                problems.add(contribution.where() + "skipped: " + e.getMessage());
            }
        }
        return problems;
    }

    /** Whether an extension registry is running (false in plain unit tests and plain Java programs). */
    public static boolean registryAvailable() {
        return RegistryFactory.getRegistry() != null;
    }

    /** The elements contributed to a point; none when no registry is running. */
    public static IConfigurationElement[] platformElements(String point) {
        IExtensionRegistry registry = RegistryFactory.getRegistry();
        return registry == null ? new IConfigurationElement[0] : registry.getConfigurationElementsFor(point);
    }

    /** Writes each problem as a warning to the platform log of the reader's bundle. */
    public static void log(Class<?> reader, List<String> problems) {
        for (String problem : problems) {
            ILog.of(reader).warn(problem);
        }
    }
}
