package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.junit.jupiter.api.Test;

class MigrationChainTest {
    private static FormatMigration renaming(int from, String oldName, String newName) {
        return new FormatMigration(from, doc -> {
            doc.add(newName, doc.remove(oldName));
            doc.addProperty("v", from + 1);
            return doc;
        });
    }

    private final MigrationChain chain = new MigrationChain("v", 3,
            List.of(renaming(2, "b", "c"), renaming(1, "a", "b")));

    @Test
    void stepsRunInVersionOrderWhateverTheirListOrder() throws StudyFormatException {
        JsonElement migrated = chain.migrate(JsonParser.parseString("{\"v\":1,\"a\":7}"), "f.json");
        assertEquals("{\"v\":3,\"c\":7}", migrated.toString());
    }

    @Test
    void theCallersDocumentIsNotChanged() throws StudyFormatException {
        JsonObject original = JsonParser.parseString("{\"v\":1,\"a\":7}").getAsJsonObject();
        chain.migrate(original, "f.json");
        assertEquals("{\"v\":1,\"a\":7}", original.toString());
    }

    @Test
    void currentAndUnversionedDocumentsPassThrough() throws StudyFormatException {
        JsonElement current = JsonParser.parseString("{\"v\":3}");
        assertSame(current, chain.migrate(current, "f.json"));
        JsonElement array = JsonParser.parseString("[1]");
        assertSame(array, chain.migrate(array, "f.json"));
    }

    @Test
    void aStepThatForgetsTheVersionIsReported() {
        MigrationChain broken = new MigrationChain("v", 2, List.of(new FormatMigration(1, doc -> doc)));
        StudyFormatException e = assertThrows(StudyFormatException.class,
                () -> broken.migrate(JsonParser.parseString("{\"v\":1}"), "f.json"));
        assertEquals("v", e.field());
    }

    @Test
    void aMissingStepIsReported() {
        MigrationChain gap = new MigrationChain("v", 3, List.of(renaming(2, "b", "c")));
        assertThrows(StudyFormatException.class, () -> gap.migrate(JsonParser.parseString("{\"v\":1}"), "f.json"));
    }
}
