package org.faultbench.digitize.io;

import java.util.List;

/**
 * Which field of a well-tops CSV row holds what, found by name in the header row (any letter case, any order).
 * Indices are 0-based; {@code md} is -1 when the file has no MD column.
 */
record WellTopColumns(int well, int surface, int x, int y, int tvdss, int md) {

    /** What a column holds, with the names accepted for it. */
    private enum Role {
        WELL("well name", true, "Well"),
        SURFACE("surface name", true, "Surface", "Horizon"),
        X("x", true, "X"),
        Y("y", true, "Y"),
        TVDSS("depth", true, "TVDSS", "Z", "Depth"),
        MD("measured depth", false, "MD");

        private final String label;
        private final boolean required;
        private final List<String> names;

        Role(String label, boolean required, String... names) {
            this.label = label;
            this.required = required;
            this.names = List.of(names);
        }

        boolean matches(String headerField) {
            return names.stream().anyMatch(name -> name.equalsIgnoreCase(headerField.trim()));
        }

        String accepted() {
            return names.size() == 1 ? names.get(0)
                    : String.join(", ", names.subList(0, names.size() - 1)) + " or " + names.get(names.size() - 1);
        }
    }

    static WellTopColumns find(TextFile file, int line, List<String> header) throws FormatException {
        Role[] roles = Role.values();
        int[] index = new int[roles.length];
        for (Role role : roles) {
            index[role.ordinal()] = column(file, line, header, role);
        }
        return new WellTopColumns(index[0], index[1], index[2], index[3], index[4], index[5]);
    }

    private static int column(TextFile file, int line, List<String> header, Role role) throws FormatException {
        int found = -1;
        for (int k = 0; k < header.size(); k++) {
            if (!role.matches(header.get(k))) {
                continue;
            }
            if (found >= 0) {
                throw file.error(line, k + 1, "columns '" + header.get(found) + "' and '" + header.get(k)
                        + "' both give the " + role.label + "; keep one");
            }
            found = k;
        }
        if (found < 0 && role.required) {
            throw file.error(line, 0, "no " + role.label + " column: expected a column named " + role.accepted()
                    + "; the header has " + String.join(", ", header));
        }
        return found;
    }
}
