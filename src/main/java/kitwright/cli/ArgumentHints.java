package kitwright.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/**
 * What a mistyped command line gets told: an unknown command or option named as unknown, with the nearest known
 * names ("did you mean"). picocli reports a missing required option before an unknown one ({@code plan KIT --outt
 * DIR} says "--out is missing"), so the arguments are searched for unknown options first.
 *
 * <p>Nearness: the Damerau-Levenshtein distance (insertions, deletions, substitutions and swaps of neighbours) of at
 * most 2, or at most a third of the longer name, over the names without their leading dashes; or one name
 * starting with the other (at least 3 characters).
 */
final class ArgumentHints {
    private ArgumentHints() {
    }

    /** The lines to print for a parameter error, the first one being the error itself. */
    static List<String> explain(CommandLine.ParameterException ex, String[] args) {
        CommandLine cl = ex.getCommandLine();
        CommandSpec spec = cl.getCommandSpec();
        List<String> lines = new ArrayList<>();
        if (ex instanceof CommandLine.UnmatchedArgumentException u && !u.getUnmatched().isEmpty()) {
            String first = u.getUnmatched().get(0);
            boolean option = first.startsWith("-");
            if (!option && !spec.subcommands().isEmpty()) {
                lines.add("Unknown command: '" + first + "'" + hint(first, new ArrayList<>(spec.subcommands()
                        .keySet())));
            } else if (option) {
                lines.add("Unknown option: '" + name(first) + "'" + hint(name(first), optionNames(spec)));
            } else {
                lines.add(ex.getMessage());
            }
            return lines;
        }
        if (ex instanceof CommandLine.MissingParameterException) {
            for (String arg : commandArgs(spec, args)) {
                if (isOptionLike(arg) && !spec.optionsMap().containsKey(name(arg))) {
                    lines.add("Unknown option: '" + name(arg) + "'" + hint(name(arg), optionNames(spec)));
                    return lines;
                }
            }
        }
        lines.add(ex.getMessage());
        return lines;
    }

    /** " (did you mean --out?)", or "" when no known name is near. */
    static String hint(String typed, List<String> known) {
        List<String> near = near(typed, known);
        return near.isEmpty() ? "" : " (did you mean " + String.join(" or ", near) + "?)";
    }

    /** The known names near the typed one, nearest first, at most three. */
    static List<String> near(String typed, List<String> known) {
        String t = bare(typed);
        record Scored(String name, int distance) {
        }
        List<Scored> scored = new ArrayList<>();
        for (String k : known) {
            String b = bare(k);
            int d = distance(t, b);
            boolean prefix = Math.min(t.length(), b.length()) >= 3 && (b.startsWith(t) || t.startsWith(b));
            if (d <= Math.max(2, Math.max(t.length(), b.length()) / 3) || prefix) {
                scored.add(new Scored(k, prefix ? Math.min(d, 1) : d));
            }
        }
        scored.sort(java.util.Comparator.comparingInt(Scored::distance).thenComparing(Scored::name));
        return scored.stream().limit(3).map(Scored::name).toList();
    }

    /** Optimal string alignment distance (Damerau-Levenshtein, each substring edited once). */
    static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }

    private static List<String> optionNames(CommandSpec spec) {
        return spec.optionsMap().keySet().stream().filter(n -> n.startsWith("--")).sorted().toList();
    }

    /** The arguments after the (sub)command's own name. */
    private static List<String> commandArgs(CommandSpec spec, String[] args) {
        List<String> all = List.of(args);
        int at = all.indexOf(spec.name());
        return at < 0 ? all : all.subList(at + 1, all.size());
    }

    /** "--name" or "-x", not a negative number. */
    private static boolean isOptionLike(String arg) {
        return arg.startsWith("-") && arg.length() > 1 && !Character.isDigit(arg.charAt(1)) && arg.charAt(1) != '.';
    }

    /** An option without its attached value: "--out=DIR" is "--out". */
    private static String name(String arg) {
        int eq = arg.indexOf('=');
        return eq > 0 ? arg.substring(0, eq) : arg;
    }

    private static String bare(String name) {
        return name.replaceFirst("^-+", "").toLowerCase(Locale.ROOT);
    }
}
