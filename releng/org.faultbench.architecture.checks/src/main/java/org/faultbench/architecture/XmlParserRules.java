package org.faultbench.architecture;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * XML parsers are created in one place only, {@code org.faultbench.core.io.SafeXml}, which configures them against
 * external entities (XXE), DTDs and XInclude; a parser factory created anywhere else would have the unsafe JDK
 * defaults.
 */
public final class XmlParserRules {
    /** The one source file allowed to create parser factories. */
    static final String SAFE_XML = "org/faultbench/core/io/SafeXml.java";

    private static final Pattern FACTORY_CALL = Pattern.compile(
            "\\b(DocumentBuilderFactory|SAXParserFactory|XMLInputFactory|TransformerFactory|SchemaFactory)"
                    + "\\s*\\.\\s*(newInstance|newDefaultInstance|newFactory|newDefaultFactory)\\s*\\(");
    private static final Pattern COMMENT = Pattern.compile("//[^\\n]*|/\\*.*?\\*/", Pattern.DOTALL);

    private XmlParserRules() {
    }

    /** Calls creating an XML parser factory in {@code source}, unless it is {@code SafeXml} itself. */
    public static List<String> violations(String fileName, String source) {
        List<String> problems = new ArrayList<>();
        if (fileName.replace('\\', '/').endsWith(SAFE_XML)) {
            return problems;
        }
        Matcher m = FACTORY_CALL.matcher(COMMENT.matcher(source).replaceAll(" "));
        while (m.find()) {
            problems.add(fileName + " calls " + m.group(1) + "." + m.group(2)
                    + "(); create XML parsers with org.faultbench.core.io.SafeXml");
        }
        return problems;
    }
}
