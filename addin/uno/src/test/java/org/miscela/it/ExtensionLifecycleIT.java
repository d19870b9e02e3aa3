package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.beans.PropertyValue;
import com.sun.star.container.XIndexAccess;
import com.sun.star.uno.UnoRuntime;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The extension installs and uninstalls with unopkg alone, without a question, in a throwaway profile (as the
 * unprivileged user when the tests run as root); an office started on the profile afterwards has none of it.
 */
class ExtensionLifecycleIT {
    private static final String ID = "org.miscela.calc";

    /** unopkg list's block for our identifier, or null when it lists no such extension. */
    private static String block(String listing) {
        Matcher m = Pattern.compile("(?ms)^Identifier: " + Pattern.quote(ID) + "$(.*?)(?=^Identifier: |\\z)")
                .matcher(listing);
        return m.find() ? m.group(1) : null;
    }

    @Test
    void installListRemove() throws Exception {
        Path base = Office.freshDirectory();
        try {
            assertNull(block(Office.unopkg(base, "list")), "a fresh profile has no Miscela");

            Office.unopkg(base, "add", base.resolve("miscela.oxt").toString());
            String listed = Office.unopkg(base, "list");
            String entry = block(listed);
            assertTrue(entry != null, "unopkg list shows " + ID + ":\n" + listed);
            Matcher version = Pattern.compile("(?m)^\\s*Version: (\\S+)\\s*$").matcher(entry);
            assertTrue(version.find(), "a version line:\n" + entry);
            assertEquals(System.getProperty("miscela.version"), version.group(1));
            assertTrue(Pattern.compile("(?m)^\\s*is registered: yes\\s*$").matcher(entry).find(), entry);

            Office.unopkg(base, "remove", ID);
            String after = Office.unopkg(base, "list");
            assertNull(block(after), "still listed after remove:\n" + after);
            assertFalse(after.contains(ID), after);
        } catch (Exception | Error e) {
            Office.delete(base);
            throw e;
        }
        // the office on the same profile: no extension, and none of the functions in the wizard
        Office office = Office.launch(base, base.resolve("profile"));
        try {
            assertNull(InstalledExtensionIT.installed(office, "user"), "the Extension Manager still has it");
            XIndexAccess all = UnoRuntime.queryInterface(XIndexAccess.class,
                    office.service("com.sun.star.sheet.FunctionDescriptions"));
            assertTrue(all.getCount() > 100, "the office's own functions are there");
            for (int i = 0; i < all.getCount(); i++) {
                for (PropertyValue p : (PropertyValue[]) all.getByIndex(i)) {
                    if (p.Name.equals("Name")) {
                        assertFalse(((String) p.Value).startsWith("MIX."), p.Value + " left behind");
                    }
                }
            }
        } finally {
            office.dispose();
        }
    }
}
