package kitwright.packing;

/** How many joints of one mark lie in a joint box. */
public record JointCount(String mark, double diameterMm, double unitMassKg, int count) {
    public JointCount {
        if (count <= 0) {
            throw new IllegalArgumentException("joint count must be positive for " + mark);
        }
    }

    public double massKg() {
        return unitMassKg * count;
    }
}
