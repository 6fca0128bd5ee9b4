package kitwright.nesting;

import java.util.List;

/**
 * Densest known packings of n equal circles in a circle, used as the channel layouts inside a host's bore.
 *
 * <p>For n circles of radius r the smallest container radius is ratio(n) * r (Graham, Lubachevsky, Nurmela and
 * Ostergard 1998, "Dense packings of congruent circles in a circle", Discrete Mathematics 181; tables by E. Specht),
 * with the closed forms: n = 1: 1; 2: 2; 3: 1 + 2/sqrt 3; 4: 1 + sqrt 2; 5: 1 + 1/sin(pi/5) =
 * 1 + sqrt(2 (1 + 1/sqrt 5)); 6 and 7: 3; 8: 1 + 1/sin(pi/7); 19: 1 + sqrt 2 + sqrt 6 (the curved hexagonal
 * packing, proved optimal by Fodor 1999). The centres below realise those radii: rings of equal circles touching
 * their neighbours and the container, with a centre circle for 7, 8 and 19.
 */
public final class EqualCirclePacking {
    /** Channel counts kitwright lays out in a bore (6 is dominated by 7, which fits the same bore). */
    public static final List<Integer> CHANNEL_COUNTS = List.of(1, 2, 3, 4, 5, 7, 8, 19);

    private EqualCirclePacking() {
    }

    /** True when the table knows n. */
    public static boolean known(int n) {
        return (n >= 1 && n <= 8) || n == 19;
    }

    /** Container radius over circle radius for n equal circles (the published optimum). */
    public static double ratio(int n) {
        return switch (n) {
            case 1 -> 1;
            case 2 -> 2;
            case 3 -> 1 + 2 / Math.sqrt(3);
            case 4 -> 1 + Math.sqrt(2);
            case 5 -> 1 + Math.sqrt(2 * (1 + 1 / Math.sqrt(5)));
            case 6, 7 -> 3;
            case 8 -> 1 + 1 / Math.sin(Math.PI / 7);
            case 19 -> 1 + Math.sqrt(2) + Math.sqrt(6);
            default -> throw new IllegalArgumentException("no packing known for " + n + " circles");
        };
    }

    /**
     * Centres of n circles of radius 1 in a container of radius {@link #ratio(int)} centred on the origin, as
     * {x, y} pairs, in a fixed order (centre circle first, then rings counter-clockwise from the positive x axis).
     */
    public static double[][] centres(int n) {
        return switch (n) {
            case 1 -> new double[][] {{0, 0}};
            case 2, 3, 4, 5 -> ring(n, ratio(n) - 1, 0);
            case 6 -> ring(6, 2, 0);
            case 7 -> concat(new double[][] {{0, 0}}, ring(6, 2, 0));
            case 8 -> concat(new double[][] {{0, 0}}, ring(7, ratio(8) - 1, Math.PI / 2));
            case 19 -> concat(concat(new double[][] {{0, 0}}, ring(6, 2, 0)),
                    ring(12, ratio(19) - 1, Math.PI / 12));
            default -> throw new IllegalArgumentException("no packing known for " + n + " circles");
        };
    }

    private static double[][] ring(int count, double radius, double startAngle) {
        double[][] points = new double[count][];
        for (int i = 0; i < count; i++) {
            double angle = startAngle + 2 * Math.PI * i / count;
            points[i] = new double[] {radius * Math.cos(angle), radius * Math.sin(angle)};
        }
        return points;
    }

    private static double[][] concat(double[][] first, double[][] second) {
        double[][] all = new double[first.length + second.length][];
        System.arraycopy(first, 0, all, 0, first.length);
        System.arraycopy(second, 0, all, first.length, second.length);
        return all;
    }
}
