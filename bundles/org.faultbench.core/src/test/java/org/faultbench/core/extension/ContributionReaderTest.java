package org.faultbench.core.extension;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.Status;
import org.junit.jupiter.api.Test;

class ContributionReaderTest {

    private final ContributionReader reader = new ContributionReader("widget", "widget");

    @Test
    void wellFormedElementsReachTheHandlerInOrder() {
        List<String> seen = new ArrayList<>();
        List<String> problems = reader.read(ElementStub.all(element("widget").with("id", "a"),
                element("widget").with("id", "b").with("name", "Bee")), c -> seen.add(c.id() + "/" + c.name()));
        assertEquals(List.of(), problems);
        assertEquals(List.of("a/a", "b/Bee"), seen);
    }

    @Test
    void wrongElementOrMissingIdIsReportedWithTheBundle() {
        List<String> problems = reader.read(ElementStub.all(element("gadget").by("bundle.one").with("id", "x"),
                element("widget").by("bundle.two")), c -> {
                });
        assertEquals(2, problems.size());
        assertEquals("widget 'x' contributed by bundle.one: an element <widget> with an id is expected",
                problems.get(0));
        assertTrue(problems.get(1).startsWith("widget 'null' contributed by bundle.two: "), problems.get(1));
    }

    @Test
    void handlerFailuresSkipOnlyThatContribution() {
        List<String> loaded = new ArrayList<>();
        List<String> problems = reader.read(ElementStub.all(
                element("widget").by("b.bad").with("id", "bad").creates("class", new CoreException(Status.error("no such class"))),
                element("widget").by("b.type").with("id", "type").creates("class", "a string"),
                element("widget").by("b.liar").with("id", "liar").creates("class", new StringBuilder("other")),
                element("widget").by("b.count").with("id", "count").with("min", "two"),
                element("widget").by("b.link").with("id", "link").creates("class", new NoClassDefFoundError("gone")),
                element("widget").by("b.good").with("id", "good").with("min", "3")), c -> {
                    switch (c.id()) {
                    case "bad" -> c.create("class", CharSequence.class);
                    case "type" -> c.create("class", StringBuilder.class);
                    case "liar" -> c.createWithId(CharSequence.class, CharSequence::toString);
                    case "link" -> c.create("class", Object.class);
                    default -> loaded.add(c.id() + c.integerAttribute("min", 1));
                    }
                });
        assertEquals(List.of("good3"), loaded);
        assertEquals(5, problems.size(), problems.toString());
        assertEquals("widget 'bad' contributed by b.bad: skipped: no such class", problems.get(0));
        assertEquals("widget 'type' contributed by b.type: class java.lang.String does not implement StringBuilder",
                problems.get(1));
        assertEquals("widget 'liar' contributed by b.liar: the object reports id 'other', the extension says 'liar'",
                problems.get(2));
        assertEquals("widget 'count' contributed by b.count: attribute 'min' must be an integer, was 'two'",
                problems.get(3));
        assertEquals("widget 'link' contributed by b.link: skipped: gone", problems.get(4));
    }

    @Test
    void typedAttributesExplainWhatIsWrong() {
        List<String> problems = reader.read(ElementStub.all(
                element("widget").with("id", "n").with("value", "NaN"),
                element("widget").with("id", "e").with("value", "sideways"),
                element("widget").with("id", "m").with("value", "0")), c -> {
                    switch (c.id()) {
                    case "n" -> c.numberAttribute("value");
                    case "e" -> c.enumAttribute("value", Thread.State.class);
                    default -> c.integerAttribute("value", 1);
                    }
                });
        assertTrue(problems.get(0).endsWith("attribute 'value' must be a finite number, was 'NaN'"), problems.get(0));
        assertTrue(problems.get(1).contains("must be one of [new, runnable"), problems.get(1));
        assertTrue(problems.get(2).endsWith("attribute 'value' must be >= 1, was 0"), problems.get(2));
    }

    @Test
    void childrenAndListsAreReadFromTheElement() {
        List<String> seen = new ArrayList<>();
        reader.read(ElementStub.all(element("widget").with("id", "p").with("ext", " asc, ,grd ")
                .child(element("part").with("id", "c1")).child(element("part").with("id", "c2"))), c -> {
                    seen.addAll(c.listAttribute("ext"));
                    c.children("part", "part").forEach(child -> seen.add(child.where()));
                });
        assertEquals(List.of("asc", "grd", "part 'c1' contributed by test.bundle: ",
                "part 'c2' contributed by test.bundle: "), seen);
    }

    @Test
    void outsideOsgiThereIsNoRegistryAndNoElements() {
        assertEquals(false, ContributionReader.registryAvailable());
        assertEquals(0, ContributionReader.platformElements("org.faultbench.any").length);
    }
}
