package kitwright.packing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.nesting.Bundle;

/**
 * The items to crate, grouped into types of interchangeable items (same kind, size and mass), with the refs of
 * each type's members in input order. Types are ordered bundles first (largest diameter, longest, heaviest), then
 * boxes (heaviest first), so that the same input gives the same types.
 */
record ItemTypes(List<ItemType> types, List<List<String>> refs) {

    static ItemTypes of(List<Bundle> bundles, List<JointBoxLoad> boxes) {
        Map<List<Object>, List<String>> members = new LinkedHashMap<>();
        Map<List<Object>, double[]> sizes = new LinkedHashMap<>();
        for (Bundle b : bundles) {
            List<Object> key = List.of(ItemKind.BUNDLE, b.lengthMm(), b.envelopeDiameterMm(), b.massKg());
            members.computeIfAbsent(key, k -> new ArrayList<>()).add(b.id());
            sizes.putIfAbsent(key, new double[] {b.lengthMm(), b.envelopeDiameterMm(), b.envelopeDiameterMm(),
                b.massKg()});
        }
        for (JointBoxLoad x : boxes) {
            List<Object> key = List.of(ItemKind.BOX, x.lengthMm(), x.widthMm(), x.heightMm(), x.massKg());
            members.computeIfAbsent(key, k -> new ArrayList<>()).add(x.id());
            sizes.putIfAbsent(key, new double[] {x.lengthMm(), x.widthMm(), x.heightMm(), x.massKg()});
        }
        List<List<Object>> keys = new ArrayList<>(members.keySet());
        Comparator<List<Object>> order = Comparator
                .<List<Object>>comparingInt(k -> ((ItemKind) k.get(0)).ordinal())
                .thenComparing(k -> -sizes.get(k)[1])
                .thenComparing(k -> -sizes.get(k)[0])
                .thenComparing(k -> -sizes.get(k)[2])
                .thenComparing(k -> -sizes.get(k)[3]);
        keys.sort(order);
        List<ItemType> types = new ArrayList<>();
        List<List<String>> refs = new ArrayList<>();
        for (List<Object> key : keys) {
            double[] s = sizes.get(key);
            List<String> ids = members.get(key);
            types.add(new ItemType(types.size(), (ItemKind) key.get(0), s[0], s[1], s[2], s[3], ids.size()));
            refs.add(List.copyOf(ids));
        }
        return new ItemTypes(List.copyOf(types), List.copyOf(refs));
    }

    int[] demand() {
        return types.stream().mapToInt(ItemType::demand).toArray();
    }

    boolean isEmpty() {
        return types.isEmpty();
    }
}
