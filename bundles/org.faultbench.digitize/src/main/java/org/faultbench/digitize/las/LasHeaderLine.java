package org.faultbench.digitize.las;

import org.faultbench.digitize.io.FormatException;

/**
 * Parses a header line {@code MNEM.UNIT  VALUE : DESCRIPTION}. Delimiters as clarified by the CWLS LAS 2.0 update
 * (2017): the first dot ends the mnemonic, the first blank after it ends the unit, and the last colon starts the
 * description, so values may hold dots, blanks and even colons (times).
 */
final class LasHeaderLine {

    private LasHeaderLine() {
    }

    static LasItem parse(String fileName, LasSection.NumberedLine line) throws FormatException {
        String text = line.text();
        int dot = text.indexOf('.');
        int colon = text.lastIndexOf(':');
        if (dot < 0 || colon < dot) {
            throw new FormatException(fileName, line.number(), 0, "expected a header line 'MNEM.UNIT  VALUE : "
                    + "DESCRIPTION', found '" + text.strip() + "'");
        }
        String mnemonic = text.substring(0, dot).strip();
        if (mnemonic.isEmpty() || mnemonic.chars().anyMatch(Character::isWhitespace)) {
            throw new FormatException(fileName, line.number(), 0, "the mnemonic before the dot must be one word, "
                    + "found '" + mnemonic + "'");
        }
        int unitEnd = dot + 1;
        while (unitEnd < colon && !Character.isWhitespace(text.charAt(unitEnd))) {
            unitEnd++;
        }
        return new LasItem(mnemonic, text.substring(dot + 1, unitEnd), text.substring(unitEnd, colon).strip(),
                text.substring(colon + 1).strip());
    }
}
