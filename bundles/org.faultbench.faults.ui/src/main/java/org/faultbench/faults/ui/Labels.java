package org.faultbench.faults.ui;

/** Text for SWT labels, where a single '&' marks a mnemonic and would vanish from "Walsh & Watterson". */
final class Labels {
    private Labels() {
    }

    static String escape(String text) {
        return text.replace("&", "&&");
    }
}
