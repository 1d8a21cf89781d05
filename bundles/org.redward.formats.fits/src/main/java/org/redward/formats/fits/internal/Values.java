package org.redward.formats.fits.internal;

import java.lang.reflect.Array;

/** Conversion of the primitive arrays nom-tam-fits returns to doubles. Stateless. */
final class Values {

    private Values() {
    }

    /**
     * The values of a primitive array (any of byte, short, int, long, float, double, boolean,
     * possibly nested) as doubles, flattened, with {@code physical = zero + scale * stored}; an
     * integer equal to {@code blank} (if not null) becomes NaN. Booleans are 1 or 0.
     *
     * @throws IllegalArgumentException if the array holds text or objects
     */
    static double[] toDoubles(Object raw, double scale, double zero, Long blank) {
        if (raw instanceof double[] d && scale == 1 && zero == 0) {
            return d.clone();
        }
        if (raw instanceof float[] f && scale == 1 && zero == 0) {
            double[] out = new double[f.length];
            for (int i = 0; i < f.length; i++) {
                out[i] = f[i];
            }
            return out;
        }
        if (raw == null || !raw.getClass().isArray()) {
            throw new IllegalArgumentException("not an array");
        }
        Class<?> c = raw.getClass().getComponentType();
        if (c.isArray()) {
            int n = Array.getLength(raw);
            double[][] parts = new double[n][];
            int total = 0;
            for (int i = 0; i < n; i++) {
                parts[i] = toDoubles(Array.get(raw, i), scale, zero, blank);
                total += parts[i].length;
            }
            double[] out = new double[total];
            int k = 0;
            for (double[] p : parts) {
                System.arraycopy(p, 0, out, k, p.length);
                k += p.length;
            }
            return out;
        }
        int n = Array.getLength(raw);
        double[] out = new double[n];
        boolean integer = c == byte.class || c == short.class || c == int.class || c == long.class;
        if (!integer && c != float.class && c != double.class && c != boolean.class) {
            throw new IllegalArgumentException("holds " + c.getSimpleName() + " values, not numbers");
        }
        for (int i = 0; i < n; i++) {
            double v;
            if (c == boolean.class) {
                v = ((boolean[]) raw)[i] ? 1 : 0;
            } else if (integer) {
                long l = c == byte.class ? (((byte[]) raw)[i] & 0xff) : Array.getLong(raw, i);
                if (blank != null && l == blank) {
                    out[i] = Double.NaN;
                    continue;
                }
                v = l;
            } else {
                v = Array.getDouble(raw, i);
            }
            out[i] = zero + scale * v;
        }
        return out;
    }
}
