package org.redward.api.templates;

import java.util.Objects;

import org.redward.spectrum.ObjectClass;

/**
 * One rest-frame template spectrum: vacuum wavelengths (Angstrom, strictly increasing) and flux
 * (arbitrary units, F_lambda), with the class and a subclass of the object it stands for.
 * Immutable and thread-safe.
 */
public final class Template {

    private final String id;
    private final ObjectClass objectClass;
    private final String subclass;
    private final double[] restVacuumAngstrom;
    private final double[] flux;

    private Template(String id, ObjectClass objectClass, String subclass, double[] w, double[] f) {
        this.id = id;
        this.objectClass = objectClass;
        this.subclass = subclass;
        this.restVacuumAngstrom = w;
        this.flux = f;
    }

    /**
     * @throws IllegalArgumentException if the arrays differ in length, have fewer than 2 pixels,
     *     contain non-finite values or the wavelengths are not strictly increasing
     */
    public static Template of(String id, ObjectClass objectClass, String subclass, double[] restVacuumAngstrom, double[] flux) {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(objectClass, "objectClass");
        if (restVacuumAngstrom.length != flux.length || flux.length < 2) {
            throw new IllegalArgumentException("template " + id + ": " + restVacuumAngstrom.length
                    + " wavelengths and " + flux.length + " flux values");
        }
        for (int i = 0; i < flux.length; i++) {
            if (!Double.isFinite(restVacuumAngstrom[i]) || !Double.isFinite(flux[i])) {
                throw new IllegalArgumentException("template " + id + ": non-finite value at pixel " + i);
            }
            if (i > 0 && !(restVacuumAngstrom[i] > restVacuumAngstrom[i - 1])) {
                throw new IllegalArgumentException("template " + id + ": wavelengths not increasing at pixel " + i);
            }
        }
        return new Template(id, objectClass, subclass == null ? "" : subclass, restVacuumAngstrom.clone(), flux.clone());
    }

    public String id() { return id; }
    public ObjectClass objectClass() { return objectClass; }
    public String subclass() { return subclass; }
    public int size() { return flux.length; }
    public double[] restVacuumAngstrom() { return restVacuumAngstrom.clone(); }
    public double[] flux() { return flux.clone(); }
    public double minRestVacuumAngstrom() { return restVacuumAngstrom[0]; }
    public double maxRestVacuumAngstrom() { return restVacuumAngstrom[restVacuumAngstrom.length - 1]; }

    @Override
    public String toString() {
        return "Template[" + id + ", " + objectClass.key() + "/" + subclass + ", " + size() + " px]";
    }
}
