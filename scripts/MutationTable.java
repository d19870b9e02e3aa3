import java.io.File;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * Prints a table per package from PIT's mutations.xml: mutations, killed (PIT's "detected": killed, timed out,
 * memory or run error), survived, no coverage, the mutation score (killed / mutations) and the test strength
 * (killed / covered mutations). Run by scripts/mutation; needs only a JDK (java 11 or later runs a single file).
 */
public final class MutationTable {
    private MutationTable() {
    }

    /** Counts of one package (or of all): mutations, killed, survived, no coverage, of which timed out. */
    private static final class Tally {
        int mutations;
        int killed;
        int survived;
        int noCoverage;
        int timedOut;

        void add(String status, boolean detected) {
            mutations++;
            if (detected) {
                killed++;
            } else if (status.equals("NO_COVERAGE")) {
                noCoverage++;
            } else {
                survived++;
            }
            if (status.equals("TIMED_OUT")) {
                timedOut++;
            }
        }

        String row(String name) {
            int covered = mutations - noCoverage;
            return String.format(Locale.ROOT, "| %-34s | %9d | %6d | %8d | %11d | %7s | %10s | %9d |", name,
                    mutations, killed, survived, noCoverage, percent(killed, mutations), percent(killed, covered),
                    timedOut);
        }
    }

    private static String percent(int part, int whole) {
        return whole == 0 ? "-" : String.format(Locale.ROOT, "%.1f", 100.0 * part / whole);
    }

    public static void main(String[] args) throws Exception {
        if (args.length != 1) {
            System.err.println("usage: java scripts/MutationTable.java path/to/mutations.xml");
            System.exit(2);
        }
        NodeList list = DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(new File(args[0]))
                .getElementsByTagName("mutation");
        Map<String, Tally> byPackage = new TreeMap<>();
        Tally all = new Tally();
        for (int i = 0; i < list.getLength(); i++) {
            Element m = (Element) list.item(i);
            String type = m.getElementsByTagName("mutatedClass").item(0).getTextContent().trim();
            int dot = type.lastIndexOf('.');
            String pkg = dot < 0 ? "(default)" : type.substring(0, dot);
            String status = m.getAttribute("status");
            boolean detected = Boolean.parseBoolean(m.getAttribute("detected"));
            byPackage.computeIfAbsent(pkg, k -> new Tally()).add(status, detected);
            all.add(status, detected);
        }
        System.out.println(String.format(Locale.ROOT, "| %-34s | %9s | %6s | %8s | %11s | %7s | %10s | %9s |",
                "package", "mutations", "killed", "survived", "no coverage", "score %", "strength %", "timed out"));
        System.out.println("|" + "-".repeat(36) + "|" + "-".repeat(11) + "|" + "-".repeat(8) + "|" + "-".repeat(10)
                + "|" + "-".repeat(13) + "|" + "-".repeat(9) + "|" + "-".repeat(12) + "|" + "-".repeat(11) + "|");
        byPackage.forEach((pkg, t) -> System.out.println(t.row(pkg)));
        System.out.println(all.row("all"));
    }
}
