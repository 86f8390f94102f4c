package org.faultbench.digitize.las;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.digitize.io.FormatException;

/**
 * One section of a LAS file: the lines after a {@code ~X} line up to the next one, with their line numbers.
 * Splitting follows CWLS LAS 2.0: '~' starts a section and the letter after it names it; lines whose first
 * non-blank character is '#' are comments; ~A, the data, must come last. Blank lines are skipped.
 *
 * @param letter section letter, upper case (V, W, C, P, O, A, or another for sections this reader skips)
 * @param headerLine 1-based line number of the {@code ~} line
 * @param lines the section's lines, without comments and blank lines
 */
record LasSection(char letter, int headerLine, List<NumberedLine> lines) {

    /** A line of the file with its 1-based number. */
    record NumberedLine(int number, String text) {
    }

    /** The sections of {@code lines} by letter, in file order. */
    static Map<Character, LasSection> split(String fileName, List<String> lines) throws FormatException {
        Map<Character, LasSection> sections = new LinkedHashMap<>();
        LasSection current = null;
        for (int n = 1; n <= lines.size(); n++) {
            String text = lines.get(n - 1);
            String trimmed = text.strip();
            if (trimmed.isEmpty() || trimmed.startsWith("#")) {
                continue;
            }
            if (trimmed.startsWith("~")) {
                current = start(fileName, sections, current, trimmed, n);
            } else if (current == null) {
                throw new FormatException(fileName, n, 0, "text before the first section; a LAS file starts with a "
                        + "'~V' line");
            } else {
                current.lines().add(new NumberedLine(n, text));
            }
        }
        return sections;
    }

    private static LasSection start(String fileName, Map<Character, LasSection> sections, LasSection current,
            String trimmed, int n) throws FormatException {
        if (current != null && current.letter() == 'A') {
            throw new FormatException(fileName, n, 0, "a section follows the ~A data section, which must be last");
        }
        if (trimmed.length() < 2 || Character.isWhitespace(trimmed.charAt(1))) {
            throw new FormatException(fileName, n, 0, "section letter missing after '~' (V, W, C, P, O or A)");
        }
        char letter = Character.toUpperCase(trimmed.charAt(1));
        LasSection earlier = sections.get(letter);
        if (earlier != null) {
            throw new FormatException(fileName, n, 0, "section ~" + letter + " appears twice (first on line "
                    + earlier.headerLine() + ")");
        }
        LasSection section = new LasSection(letter, n, new ArrayList<>());
        sections.put(letter, section);
        return section;
    }
}
