package org.faultbench.core.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;

import org.w3c.dom.Document;
import org.xml.sax.ErrorHandler;
import org.xml.sax.SAXException;
import org.xml.sax.SAXParseException;

/**
 * The only place where Faultbench creates an XML parser, configured against external-entity (XXE) and
 * entity-expansion attacks: a file from a colleague or the internet must not make the program read local files,
 * reach the network or exhaust memory. DOCTYPE declarations are refused outright (no Faultbench format needs one),
 * external entities and DTDs are off, XInclude is off and the JDK's secure-processing limits apply. The
 * architecture checks fail the build when any other source creates a parser factory.
 */
public final class SafeXml {
    private SafeXml() {
    }

    /** A namespace-aware document builder with the protections above. */
    public static DocumentBuilder documentBuilder() {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        try {
            factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            factory.setFeature("http://xml.org/sax/features/external-general-entities", false);
            factory.setFeature("http://xml.org/sax/features/external-parameter-entities", false);
            factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
            factory.setAttribute(XMLConstants.ACCESS_EXTERNAL_DTD, "");
            factory.setAttribute(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
            factory.setXIncludeAware(false);
            factory.setExpandEntityReferences(false);
            factory.setNamespaceAware(true);
            DocumentBuilder builder = factory.newDocumentBuilder();
            builder.setEntityResolver((publicId, systemId) -> {
                throw new SAXException("external entity " + systemId + " refused");
            });
            builder.setErrorHandler(new ErrorHandler() { // silent: the caller reports the exception
                @Override
                public void warning(SAXParseException e) {
                }

                @Override
                public void error(SAXParseException e) throws SAXException {
                    throw e;
                }

                @Override
                public void fatalError(SAXParseException e) throws SAXException {
                    throw e;
                }
            });
            return builder;
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("the JDK's XML parser does not support the safety features", e);
        }
    }

    /** Parses {@code file}; a malformed or unsafe document is reported with the file name and line. */
    public static Document parse(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return documentBuilder().parse(in, file.toUri().toString());
        } catch (SAXParseException e) {
            throw new IOException(file.getFileName() + ", line " + e.getLineNumber() + ": not accepted as XML: "
                    + e.getMessage(), e);
        } catch (SAXException e) {
            throw new IOException(file.getFileName() + ": not accepted as XML: " + e.getMessage(), e);
        }
    }
}
