package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.awt.Size;
import com.sun.star.beans.Ambiguous;
import com.sun.star.beans.Optional;
import com.sun.star.beans.StringPair;
import com.sun.star.beans.XPropertySet;
import com.sun.star.deployment.XExtensionManager;
import com.sun.star.deployment.XPackage;
import com.sun.star.graphic.XGraphic;
import com.sun.star.uno.UnoRuntime;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.w3c.dom.Element;

/**
 * What the running office's Extension Manager knows of the installed extension equals packaging/: identifier,
 * version, display name, publisher, short description and both icons, with no licence text to accept.
 */
@ExtendWith(OfficeParameterResolver.class)
class InstalledExtensionIT {
    private static final String D = "http://openoffice.org/extensions/description/2006";
    private static final String XLINK = "http://www.w3.org/1999/xlink";

    static XPackage installed(Office office, String repository) throws Exception {
        XExtensionManager manager = UnoRuntime.queryInterface(XExtensionManager.class,
                office.context().getValueByName("/singletons/com.sun.star.deployment.ExtensionManager"));
        XPackage found = null;
        for (XPackage p : manager.getDeployedExtensions(repository, null, null)) {
            Optional<String> id = p.getIdentifier();
            if (id.IsPresent && "org.miscela.calc".equals(id.Value)) {
                assertEquals(null, found, "installed once");
                found = p;
            }
        }
        return found;
    }

    private static Size pixels(XGraphic g) throws Exception {
        return (Size) UnoRuntime.queryInterface(XPropertySet.class, g).getPropertyValue("SizePixel");
    }

    @Test
    void extensionManagerShowsTheDescription(Office office) throws Exception {
        Path packaging = Paths.get(System.getProperty("miscela.repo"), "packaging");
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Element description = f.newDocumentBuilder().parse(packaging.resolve("description.xml").toFile())
                .getDocumentElement();
        Element publisher = (Element) description.getElementsByTagNameNS(D, "publisher").item(0);
        Element publisherName = (Element) publisher.getElementsByTagNameNS(D, "name").item(0);
        String displayName = description.getElementsByTagNameNS(D, "display-name").item(0).getTextContent().trim();

        XPackage p = installed(office, "user");
        assertNotNull(p, "org.miscela.calc among the user's extensions");
        assertEquals(System.getProperty("miscela.version"), p.getVersion());
        assertEquals(displayName, p.getDisplayName());
        StringPair pub = p.getPublisherInfo();
        assertEquals(publisherName.getTextContent().trim(), pub.First, "publisher name");
        assertEquals(publisherName.getAttributeNS(XLINK, "href"), pub.Second, "publisher link");
        String summary = new String(Files.readAllBytes(packaging.resolve("description-en.txt")),
                StandardCharsets.UTF_8);
        assertEquals(summary.trim(), p.getDescription().trim(), "short description");
        assertEquals("", p.getLicenseText(), "no licence to accept at install");
        Optional<Ambiguous<Boolean>> registered = p.isRegistered(null, null);
        assertTrue(registered.IsPresent && !registered.Value.IsAmbiguous && registered.Value.Value,
                "registered");

        for (boolean highContrast : new boolean[] {false, true}) {
            XGraphic icon = p.getIcon(highContrast);
            assertNotNull(icon, (highContrast ? "high-contrast" : "default") + " icon loaded by the office");
            Size size = pixels(icon);
            assertEquals(42, size.Width, "icon width");
            assertEquals(42, size.Height, "icon height");
        }
        assertFalse(displayName.isEmpty());
        Figures.note(InstalledExtensionIT.class,
                "extension manager: %s %s by %s, icons 42 x 42", p.getDisplayName(), p.getVersion(),
                pub.First);
    }
}
