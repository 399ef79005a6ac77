package org.spanlift.cli.plot;

import java.awt.Dimension;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;

import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.w3c.dom.Attr;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

/**
 * Paints a {@link Figure} into Batik's SVG generator and serializes the result deterministically: every
 * id carries the figure's own prefix (so several figures can be inlined in one HTML page without their
 * clip paths colliding), there is no generator comment or time stamp, the declarations inside each
 * {@code style} attribute are sorted, and attributes are written in name order. Text is written as text
 * ({@link SvgCanvas}) in the font stack {@link Palette#SVG_FONT_FAMILY}.
 */
public final class SvgWriter {

    static final String SVG_NS = "http://www.w3.org/2000/svg";
    private static final String XLINK_NS = "http://www.w3.org/1999/xlink";

    private SvgWriter() {
    }

    /** A standalone SVG document (XML declaration included). */
    public static String document(Figure figure) {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + element(figure) + "\n";
    }

    /** The {@code <svg>} element alone, for inlining in HTML. */
    public static String element(Figure figure) {
        Element root = render(figure);
        StringBuilder b = new StringBuilder();
        write(root, b, true);
        return b.toString();
    }

    static Element render(Figure figure) {
        Document doc;
        try {
            DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
            f.setNamespaceAware(true);
            doc = f.newDocumentBuilder().getDOMImplementation().createDocument(SVG_NS, "svg", null);
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("no XML document builder", e);
        }
        SVGGeneratorContext ctx = SVGGeneratorContext.createDefault(doc);
        ctx.setComment(null);
        ctx.setEmbeddedFontsOn(false);
        SVGGraphics2D g = new SvgCanvas(ctx);
        g.setSVGCanvasSize(new Dimension(figure.width(), figure.height()));
        figure.paint(g);
        Element root = g.getRoot();
        g.dispose();
        styleToSortedCss(root);
        // the text's family for every viewer, in place of Batik's default (Java's logical font's name)
        putStyle(root, "font-family", Palette.SVG_FONT_FAMILY);
        escapeControlCharacters(root);
        prefixIds(root, figure.id());
        root.removeAttribute("contentScriptType");
        root.removeAttribute("contentStyleType");
        root.removeAttribute("zoomAndPan");
        root.removeAttribute("preserveAspectRatio");
        root.setAttribute("viewBox", "0 0 " + figure.width() + " " + figure.height());
        root.setAttribute("role", "img");
        root.setAttribute("aria-labelledby", figure.id() + "-title " + figure.id() + "-desc");
        root.setAttribute("class", "spanlift-figure");
        Element title = doc.createElementNS(SVG_NS, "title");
        title.setAttribute("id", figure.id() + "-title");
        title.setTextContent(xmlSafe(figure.title()));
        Element desc = doc.createElementNS(SVG_NS, "desc");
        desc.setAttribute("id", figure.id() + "-desc");
        desc.setTextContent(xmlSafe(figure.description()));
        root.insertBefore(desc, root.getFirstChild());
        root.insertBefore(title, desc);
        return root;
    }

    /** Batik writes presentation attributes; fold them into one sorted style declaration per element. */
    private static void styleToSortedCss(Element e) {
        NamedNodeMap attrs = e.getAttributes();
        Map<String, String> css = new TreeMap<>();
        List<String> remove = new ArrayList<>();
        for (int i = 0; i < attrs.getLength(); i++) {
            Attr a = (Attr) attrs.item(i);
            String name = a.getName();
            if (name.equals("style")) {
                for (String decl : a.getValue().split(";")) {
                    int colon = decl.indexOf(':');
                    if (colon > 0) {
                        css.put(decl.substring(0, colon).trim(), decl.substring(colon + 1).trim());
                    }
                }
                remove.add(name);
            } else if (PRESENTATION.contains(name)) {
                css.put(name, a.getValue());
                remove.add(name);
            }
        }
        remove.forEach(e::removeAttribute);
        tidy(e, css);
        if (!css.isEmpty()) {
            StringBuilder b = new StringBuilder();
            css.forEach((k, v) -> b.append(b.length() == 0 ? "" : "; ").append(k).append(':').append(v));
            e.setAttribute("style", b.toString());
        }
        for (Node c = e.getFirstChild(); c != null; c = c.getNextSibling()) {
            if (c instanceof Element child) {
                styleToSortedCss(child);
            }
        }
    }

    private static final List<String> FONT = List.of("font-family", "font-size", "font-style", "font-weight");

    /**
     * Leaves out what Batik writes but nothing uses: the graphics state's font on the groups and its family
     * on text (Java's logical font; only the root's family and a text's own size, weight and style apply),
     * and the stroke settings of text that is not stroked.
     */
    private static void tidy(Element e, Map<String, String> css) {
        String tag = e.getLocalName() == null ? e.getTagName() : e.getLocalName();
        if (tag.equals("text")) {
            css.remove("font-family");
            if ("none".equals(css.get("stroke"))) {
                css.keySet().removeIf(k -> k.startsWith("stroke-"));
            }
        } else if (!tag.equals("svg")) {
            FONT.forEach(css::remove);
        }
    }

    /** Sets one declaration of an element's style, keeping the declarations sorted. */
    private static void putStyle(Element e, String property, String value) {
        Map<String, String> css = new TreeMap<>();
        for (String decl : e.getAttribute("style").split(";")) {
            int colon = decl.indexOf(':');
            if (colon > 0) {
                css.put(decl.substring(0, colon).trim(), decl.substring(colon + 1).trim());
            }
        }
        css.put(property, value);
        StringBuilder b = new StringBuilder();
        css.forEach((k, v) -> b.append(b.length() == 0 ? "" : "; ").append(k).append(':').append(v));
        e.setAttribute("style", b.toString());
    }

    /**
     * Text as XML 1.0 allows it: control characters other than tab, line feed and carriage return (a wing or
     * control name may hold one) are written as visible escapes such as {@code \u0001}.
     */
    static String xmlSafe(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if ((c < 0x20 && c != '\t' && c != '\n' && c != '\r') || c == 0xFFFE || c == 0xFFFF) {
                b.append(String.format("\\u%04x", (int) c));
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }

    private static void escapeControlCharacters(Node n) {
        if (n.getNodeType() == Node.TEXT_NODE) {
            n.setNodeValue(xmlSafe(n.getNodeValue()));
        }
        for (Node c = n.getFirstChild(); c != null; c = c.getNextSibling()) {
            escapeControlCharacters(c);
        }
    }

    private static final List<String> PRESENTATION = List.of("fill", "fill-opacity", "fill-rule", "stroke",
            "stroke-width", "stroke-opacity", "stroke-dasharray", "stroke-dashoffset", "stroke-linecap",
            "stroke-linejoin", "stroke-miterlimit", "opacity", "clip-path", "color-rendering", "color-interpolation",
            "image-rendering", "shape-rendering", "text-rendering", "font-family", "font-size", "font-style",
            "font-weight", "clip-rule", "mask", "filter", "text-anchor");

    private static void prefixIds(Element root, String prefix) {
        Map<String, String> renamed = new LinkedHashMap<>();
        collectIds(root, prefix, renamed);
        rewriteReferences(root, renamed);
    }

    private static void collectIds(Element e, String prefix, Map<String, String> renamed) {
        String id = e.getAttribute("id");
        if (!id.isEmpty()) {
            String fresh = prefix + "-" + id;
            renamed.put(id, fresh);
            e.setAttribute("id", fresh);
        }
        for (Node c = e.getFirstChild(); c != null; c = c.getNextSibling()) {
            if (c instanceof Element child) {
                collectIds(child, prefix, renamed);
            }
        }
    }

    private static void rewriteReferences(Element e, Map<String, String> renamed) {
        NamedNodeMap attrs = e.getAttributes();
        for (int i = 0; i < attrs.getLength(); i++) {
            Attr a = (Attr) attrs.item(i);
            String v = a.getValue();
            if (!v.contains("#")) {
                continue;
            }
            String out = v;
            for (Map.Entry<String, String> r : renamed.entrySet()) {
                out = out.replace("url(#" + r.getKey() + ")", "url(#" + r.getValue() + ")");
                if (out.equals("#" + r.getKey())) {
                    out = "#" + r.getValue();
                }
            }
            if (!out.equals(v)) {
                a.setValue(out);
            }
        }
        NodeList kids = e.getChildNodes();
        for (int i = 0; i < kids.getLength(); i++) {
            if (kids.item(i) instanceof Element child) {
                rewriteReferences(child, renamed);
            }
        }
    }

    /** A small deterministic XML writer: attributes sorted by name, text escaped, no indentation inside. */
    private static void write(Element e, StringBuilder b, boolean root) {
        String tag = e.getLocalName() == null ? e.getTagName() : e.getLocalName();
        b.append('<').append(tag);
        Map<String, String> attrs = new TreeMap<>();
        if (root) {
            attrs.put("xmlns", SVG_NS);
        }
        NamedNodeMap map = e.getAttributes();
        for (int i = 0; i < map.getLength(); i++) {
            Attr a = (Attr) map.item(i);
            String name = a.getName();
            if (name.equals("xmlns") || name.startsWith("xmlns:")) {
                continue;
            }
            if (XLINK_NS.equals(a.getNamespaceURI())) {
                name = "href"; // SVG 2 and HTML take a plain href
            }
            attrs.put(name, a.getValue());
        }
        attrs.forEach((k, v) -> b.append(' ').append(k).append("=\"").append(escape(v, true)).append('"'));
        Node first = e.getFirstChild();
        if (first == null) {
            b.append("/>");
            return;
        }
        b.append('>');
        for (Node c = first; c != null; c = c.getNextSibling()) {
            if (c instanceof Element child) {
                if (root) {
                    b.append('\n');
                }
                write(child, b, false);
            } else if (c.getNodeType() == Node.TEXT_NODE || c.getNodeType() == Node.CDATA_SECTION_NODE) {
                b.append(escape(c.getNodeValue(), false));
            }
        }
        if (root) {
            b.append('\n');
        }
        b.append("</").append(tag).append('>');
    }

    static String escape(String s, boolean attribute) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append(attribute ? "&quot;" : "\"");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    /** The UTF-8 bytes of {@link #document}. */
    public static byte[] bytes(Figure figure) {
        return document(figure).getBytes(StandardCharsets.UTF_8);
    }
}
