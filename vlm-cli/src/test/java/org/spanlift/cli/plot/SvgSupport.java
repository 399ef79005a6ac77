package org.spanlift.cli.plot;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;

import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** Reading SVG and HTML output back with the JDK's XML parser, for tests. */
public final class SvgSupport {

    private SvgSupport() {
    }

    /** Parses the text as XML (namespace aware, no external entities); throws when it is not well-formed. */
    public static Document parse(String text) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        f.setExpandEntityReferences(false);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)));
    }

    /** Every element of a local name under the node, in document order. */
    public static List<Element> all(Document doc, String localName) {
        NodeList list = doc.getElementsByTagNameNS("*", localName);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < list.getLength(); i++) {
            out.add((Element) list.item(i));
        }
        return out;
    }

    /** Every id attribute in the document. */
    public static List<String> ids(Document doc) {
        NodeList list = doc.getElementsByTagName("*");
        List<String> out = new ArrayList<>();
        for (int i = 0; i < list.getLength(); i++) {
            String id = ((Element) list.item(i)).getAttribute("id");
            if (!id.isEmpty()) {
                out.add(id);
            }
        }
        return out;
    }
}
