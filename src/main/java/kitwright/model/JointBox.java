package kitwright.model;

/** The box joints travel in (kit.json {@code jointBox}); default 600 x 400 x 300 mm, 25 kg. */
public record JointBox(double lengthMm, double widthMm, double heightMm, double maxMassKg) {
    public static final JointBox DEFAULT = new JointBox(600, 400, 300, 25);
}
