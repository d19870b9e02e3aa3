package org.miscela.core.fit;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One NIST StRD linear least-squares file (test resource nist-strd/NAME.dat, copied verbatim from NIST ITL
 * Statistical Reference Datasets, Linear Least Squares Regression): its data, the model read from its "Model:" line,
 * and its certified values. Nothing here is typed in by hand; everything comes from the file.
 */
public final class NistDataset {
    private static final String NUMBER = "([-+]?\\d*\\.?\\d+(?:[eE][-+]?\\d+)?)";
    private static final Pattern PARAMETER = Pattern.compile("^\\s*B(\\d+)\\s+" + NUMBER + "\\s+" + NUMBER + "\\s*$");
    private static final Pattern RESIDUAL_SD = Pattern.compile("^\\s*Standard Deviation\\s+" + NUMBER + "\\s*$");
    private static final Pattern R_SQUARED = Pattern.compile("^\\s*R-Squared\\s+" + NUMBER + "\\s*$");
    private static final Pattern PREDICTORS = Pattern.compile("(\\d+)\\s+Predictor Variable");
    private static final Pattern OBSERVATIONS = Pattern.compile("^\\s*(\\d+)\\s+Observations\\s*$");
    private static final Pattern PARAMETER_COUNT = Pattern.compile("^\\s*(\\d+)\\s+Parameters?\\s+\\(");
    /** A model term: B3, B1*x, B2*(x**2), B4*x4. */
    private static final Pattern TERM = Pattern.compile("^B(\\d+)(?:\\*\\(?x(\\d*)(?:\\*\\*(\\d+))?\\)?)?$");

    public final String name;
    public final String modelLine;
    public final double[] certifiedCoefficients;
    public final double[] certifiedStandardDeviations;
    public final double certifiedResidualSd;
    public final double certifiedRSquared;
    /** The header's own counts, to check the reading of data and model against. */
    final int declaredObservations;
    final int declaredParameters;
    /** y, then the predictors, per observation. */
    public final double[][] data;
    /** For parameter k: the predictor it multiplies (1-based; 0 for the constant) and the power. */
    private final int[][] terms;

    private NistDataset(String name, String modelLine, double[] b, double[] sd, double residualSd, double rSquared,
            double[][] data, int[][] terms, int declaredObservations, int declaredParameters) {
        this.name = name;
        this.modelLine = modelLine;
        this.certifiedCoefficients = b;
        this.certifiedStandardDeviations = sd;
        this.certifiedResidualSd = residualSd;
        this.certifiedRSquared = rSquared;
        this.data = data;
        this.terms = terms;
        this.declaredObservations = declaredObservations;
        this.declaredParameters = declaredParameters;
    }

    public static NistDataset load(String name) {
        try (InputStream in = NistDataset.class.getResourceAsStream("/nist-strd/" + name + ".dat")) {
            if (in == null) {
                throw new IllegalStateException("test resource nist-strd/" + name + ".dat is missing");
            }
            return parse(name, Arrays.asList(new String(in.readAllBytes(), StandardCharsets.US_ASCII).split("\r?\n")));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static NistDataset parse(String name, List<String> lines) {
        Map<Integer, double[]> parameters = new TreeMap<>();
        double residualSd = Double.NaN;
        double rSquared = Double.NaN;
        int predictors = -1;
        int observations = -1;
        int parameterCount = -1;
        String model = null;
        int dataStart = -1;
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            Matcher m;
            if ((m = PARAMETER.matcher(line)).matches()) {
                parameters.put(Integer.parseInt(m.group(1)),
                        new double[] {Double.parseDouble(m.group(2)), Double.parseDouble(m.group(3))});
            } else if ((m = RESIDUAL_SD.matcher(line)).matches()) {
                residualSd = Double.parseDouble(m.group(1));
            } else if ((m = R_SQUARED.matcher(line)).matches()) {
                rSquared = Double.parseDouble(m.group(1));
            } else if ((m = PREDICTORS.matcher(line)).find() && predictors < 0) {
                predictors = Integer.parseInt(m.group(1));
            } else if ((m = OBSERVATIONS.matcher(line)).matches()) {
                observations = Integer.parseInt(m.group(1));
            } else if ((m = PARAMETER_COUNT.matcher(line)).find()) {
                parameterCount = Integer.parseInt(m.group(1));
            } else if (line.trim().startsWith("y =") && model == null) {
                model = line.trim();
            } else if (line.startsWith("Data:") && line.trim().matches("Data:\\s+y\\s+x.*")) {
                dataStart = i + 1;
            }
        }
        if (parameters.isEmpty() || Double.isNaN(residualSd) || Double.isNaN(rSquared) || predictors < 1
                || model == null || dataStart < 0) {
            throw new IllegalStateException(name + ": certified values, model or data not found");
        }
        int first = parameters.keySet().iterator().next();
        int p = parameters.size();
        double[] b = new double[p];
        double[] sd = new double[p];
        int k = 0;
        for (Map.Entry<Integer, double[]> e : parameters.entrySet()) {
            if (e.getKey() != first + k) {
                throw new IllegalStateException(name + ": parameters are not numbered consecutively");
            }
            b[k] = e.getValue()[0];
            sd[k] = e.getValue()[1];
            k++;
        }
        List<double[]> rows = new ArrayList<>();
        for (int i = dataStart; i < lines.size(); i++) {
            String s = lines.get(i).trim();
            if (s.isEmpty()) {
                continue;
            }
            String[] f = s.split("\\s+");
            if (f.length != predictors + 1) {
                throw new IllegalStateException(name + ": data line " + (i + 1) + " has " + f.length + " fields");
            }
            double[] row = new double[f.length];
            for (int j = 0; j < f.length; j++) {
                row[j] = Double.parseDouble(f[j]);
            }
            rows.add(row);
        }
        return new NistDataset(name, model, b, sd, residualSd, rSquared, rows.toArray(new double[0][]),
                terms(name, model, first, p, predictors), observations, parameterCount);
    }

    /**
     * Reads "y = B0 + B1*x + B2*(x**2) + ... + B10*(x**10) + e" and the like. Terms elided by "..." are filled in
     * only for a single predictor whose written terms are all B_k·x^k, the one pattern the files use it for.
     */
    private static int[][] terms(String name, String model, int first, int count, int predictors) {
        int[][] t = new int[count][];
        boolean ellipsis = false;
        boolean powersFollowIndex = true;
        String rhs = model.substring(model.indexOf('=') + 1).replace(" ", "");
        for (String term : rhs.split("\\+")) {
            if (term.equals("e") || term.isEmpty()) {
                continue;
            }
            if (term.equals("...")) {
                ellipsis = true;
                continue;
            }
            Matcher m = TERM.matcher(term);
            if (!m.matches()) {
                throw new IllegalStateException(name + ": model term '" + term + "' not understood");
            }
            int index = Integer.parseInt(m.group(1));
            int predictor = m.group(2) == null && !term.contains("x") ? 0
                    : m.group(2) == null || m.group(2).isEmpty() ? 1 : Integer.parseInt(m.group(2));
            int power = predictor == 0 ? 0 : m.group(3) == null ? 1 : Integer.parseInt(m.group(3));
            if (index - first < 0 || index - first >= count || predictor > predictors) {
                throw new IllegalStateException(name + ": model term '" + term + "' has no certified parameter");
            }
            powersFollowIndex &= power == index && predictor <= 1;
            t[index - first] = new int[] {predictor, power};
        }
        for (int k = 0; k < count; k++) {
            if (t[k] == null) {
                if (!ellipsis || predictors != 1 || !powersFollowIndex) {
                    throw new IllegalStateException(name + ": parameter B" + (first + k) + " is not in the model");
                }
                int index = first + k;
                t[k] = new int[] {index == 0 ? 0 : 1, index};
            }
        }
        return t;
    }

    /**
     * The design matrix of the model for every observation, powers by {@link Math#pow} of the parsed values. Filip is
     * so ill-conditioned that rounding the design differently (e.g. each power taken exactly from the decimal and
     * rounded once) moves its LREs by a few tenths of a digit either way: that is the limit of double precision for
     * this problem, not of the solver.
     */
    public double[][] design() {
        double[][] x = new double[data.length][terms.length];
        for (int i = 0; i < data.length; i++) {
            for (int k = 0; k < terms.length; k++) {
                x[i][k] = terms[k][0] == 0 ? 1.0 : Math.pow(data[i][terms[k][0]], terms[k][1]);
            }
        }
        return x;
    }

    /** Parameter k's term: {predictor (1-based; 0 for the constant), power}. */
    public int[] term(int k) {
        return terms[k].clone();
    }

    public double[] response() {
        double[] y = new double[data.length];
        for (int i = 0; i < data.length; i++) {
            y[i] = data[i][0];
        }
        return y;
    }

    /** The model terms as read, e.g. "1 x x^2" — printed beside the results so the reading can be checked. */
    String describeTerms() {
        boolean single = data[0].length == 2;
        StringBuilder b = new StringBuilder();
        for (int[] t : terms) {
            b.append(b.length() > 0 ? " " : "");
            b.append(t[0] == 0 ? "1" : single ? "x" : "x" + t[0]).append(t[1] > 1 ? "^" + t[1] : "");
        }
        return b.toString();
    }
}
