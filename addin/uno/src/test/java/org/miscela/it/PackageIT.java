package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.jar.JarInputStream;
import java.util.jar.JarEntry;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * The built .oxt holds what the office needs, describes itself (the pom's version, display name, publisher, minimal
 * LibreOffice version, short description, icons) without a licence prompt, and bundles no office jar.
 */
class PackageIT {

    private static byte[] entry(ZipFile z, String name) throws IOException {
        ZipEntry e = z.getEntry(name);
        assertNotNull(e, name + " missing from the .oxt");
        try (InputStream in = z.getInputStream(e)) {
            return in.readAllBytes();
        }
    }

    private static final String D = "http://openoffice.org/extensions/description/2006";
    private static final String LO = "http://libreoffice.org/extensions/description/2011";
    private static final String XLINK = "http://www.w3.org/1999/xlink";

    private static Element description(ZipFile z) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(entry(z, "description.xml")))
                .getDocumentElement();
    }

    private static Element only(Element root, String ns, String name) {
        NodeList l = root.getElementsByTagNameNS(ns, name);
        assertEquals(1, l.getLength(), "one <" + name + "> in description.xml");
        return (Element) l.item(0);
    }

    private static String attribute(Element root, String ns, String name, String attribute) {
        return only(root, ns, name).getAttribute(attribute);
    }

    private static String text(Element root, String ns, String name) {
        return only(root, ns, name).getTextContent().trim();
    }

    /** The xlink:href of the first child {@code child} of the element {@code name}. */
    private static String href(Element root, String name, String child) {
        Element e = (Element) only(root, D, name).getElementsByTagNameNS(D, child).item(0);
        assertNotNull(e, "<" + child + "> in <" + name + ">");
        String h = e.getAttributeNS(XLINK, "href");
        assertFalse(h.isEmpty(), "<" + name + "><" + child + "> names a file");
        return h;
    }

    /** The icons named in description.xml are in the .oxt, unchanged from packaging/, and are 42 × 42 pictures. */
    @Test
    void icons() throws Exception {
        Path packaging = Paths.get(System.getProperty("miscela.repo"), "packaging");
        try (ZipFile z = new ZipFile(Office.builtExtension().toFile())) {
            Element description = description(z);
            for (String variant : new String[] {"default", "high-contrast"}) {
                String path = href(description, "icon", variant);
                byte[] png = entry(z, path);
                assertArrayEquals(Files.readAllBytes(packaging.resolve(path)), png, path + " copied unchanged");
                BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
                assertNotNull(img, path + " is a picture");
                assertEquals(42, img.getWidth(), path + " width");
                assertEquals(42, img.getHeight(), path + " height");
                Set<Integer> opaque = new HashSet<>();
                boolean grey = true;
                for (int y = 0; y < 42; y++) {
                    for (int x = 0; x < 42; x++) {
                        int p = img.getRGB(x, y);
                        if (p >>> 24 == 0xFF) {
                            opaque.add(p);
                            int r = (p >> 16) & 0xFF;
                            int g = (p >> 8) & 0xFF;
                            int b = p & 0xFF;
                            grey &= r == g && g == b;
                        }
                    }
                }
                assertTrue(opaque.size() >= 2 && img.getRGB(21, 21) >>> 24 == 0xFF,
                        path + ": opaque in the middle and more than one colour");
                assertEquals(variant.equals("high-contrast"), grey, path + ": only the high-contrast icon is grey");
                assertEquals(0, img.getRGB(0, 0) >>> 24, path + ": rounded corners are transparent");
            }
        }
    }

    @Test
    void extensionContents() throws Exception {
        try (ZipFile z = new ZipFile(Office.builtExtension().toFile())) {
            String manifest = new String(entry(z, "META-INF/manifest.xml"), StandardCharsets.UTF_8);
            for (String path : new String[] {"miscela.rdb", "miscela.components", "CalcAddIns.xcu"}) {
                assertTrue(manifest.contains("manifest:full-path=\"" + path + "\""), path + " not in the manifest");
                entry(z, path);
            }
            Element description = description(z);
            assertEquals("org.miscela.calc", attribute(description, D, "identifier", "value"));
            assertEquals(System.getProperty("miscela.version"), attribute(description, D, "version", "value"),
                    "description.xml carries the pom's version");
            assertEquals("7.4", attribute(description, LO, "LibreOffice-minimal-version", "value"));
            assertFalse(text(description, D, "display-name").isEmpty(), "display name");
            assertFalse(text(description, D, "publisher").isEmpty(), "publisher");
            String summary = new String(entry(z, href(description, "extension-description", "src")),
                    StandardCharsets.UTF_8);
            assertTrue(summary.contains("Licence: MIT"), "the short description names the licence");
            assertEquals(0, description.getElementsByTagNameNS(D, "registration").getLength(),
                    "a licence dialog would make unopkg prompt");
            entry(z, "LICENSE.txt");
            String components = new String(entry(z, "miscela.components"), StandardCharsets.UTF_8);
            assertTrue(components.contains("uri=\"miscela.jar\""));

            List<String> classes = new ArrayList<>();
            String registration;
            try (JarInputStream jar = new JarInputStream(new ByteArrayInputStream(entry(z, "miscela.jar")))) {
                registration = jar.getManifest().getMainAttributes().getValue("RegistrationClassName");
                for (JarEntry e = jar.getNextJarEntry(); e != null; e = jar.getNextJarEntry()) {
                    classes.add(e.getName());
                }
            }
            assertEquals("org.miscela.calc.Registration", registration);
            assertTrue(classes.contains("org/miscela/calc/XMixtureFunctions.class"), "generated interface bundled");
            assertTrue(classes.stream().anyMatch(c -> c.startsWith("org/apache/commons/math3/")),
                    "Commons Math travels inside the jar");
            assertFalse(classes.stream().anyMatch(c -> c.startsWith("com/sun/star/")), "office classes bundled");
        }
    }
}
