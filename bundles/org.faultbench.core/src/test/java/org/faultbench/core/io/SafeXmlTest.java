package org.faultbench.core.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

class SafeXmlTest {
    private static final String SECRET = "local-secret-4711";

    @TempDir
    Path dir;

    @Test
    void plainDocumentIsRead() throws IOException {
        Path file = dir.resolve("ok.xml");
        Files.writeString(file, "<?xml version=\"1.0\"?>\n<sheet name=\"a\"><point x=\"1\"/></sheet>\n");
        Document doc = SafeXml.parse(file);
        assertEquals("sheet", doc.getDocumentElement().getTagName());
    }

    @Test
    void externalEntityToALocalFileIsRefused() throws IOException {
        // classic XXE payload (OWASP XML External Entity Prevention Cheat Sheet): an entity naming a local file
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, SECRET);
        Path file = dir.resolve("xxe.xml");
        Files.writeString(file, "<?xml version=\"1.0\"?>\n<!DOCTYPE sheet [<!ENTITY xxe SYSTEM \""
                + secret.toUri() + "\">]>\n<sheet>&xxe;</sheet>\n");
        IOException e = assertThrows(IOException.class, () -> SafeXml.parse(file));
        assertTrue(e.getMessage().startsWith("xxe.xml, line 2"), e.getMessage());
        assertFalse(e.getMessage().contains(SECRET), "the secret must not leak into the message");
    }

    @Test
    void entityExpansionBombIsRefused() throws IOException {
        // "billion laughs": nested internal entities; refused already at the DOCTYPE
        Path file = dir.resolve("laughs.xml");
        Files.writeString(file, "<?xml version=\"1.0\"?>\n<!DOCTYPE l [<!ENTITY a \"aaaaaaaaaa\">"
                + "<!ENTITY b \"&a;&a;&a;&a;&a;&a;&a;&a;&a;&a;\"><!ENTITY c \"&b;&b;&b;&b;&b;&b;&b;&b;&b;&b;\">]>\n"
                + "<l>&c;</l>\n");
        assertThrows(IOException.class, () -> SafeXml.parse(file));
    }

    @Test
    void xIncludeIsNotProcessed() throws IOException {
        Path secret = dir.resolve("secret.xml");
        Files.writeString(secret, "<s>" + SECRET + "</s>");
        Path file = dir.resolve("include.xml");
        Files.writeString(file, "<?xml version=\"1.0\"?>\n<sheet xmlns:xi=\"http://www.w3.org/2001/XInclude\">"
                + "<xi:include href=\"" + secret.toUri() + "\"/></sheet>\n");
        Document doc = SafeXml.parse(file);
        assertFalse(doc.getDocumentElement().getTextContent().contains(SECRET));
    }
}
