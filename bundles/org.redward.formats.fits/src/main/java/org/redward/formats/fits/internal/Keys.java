package org.redward.formats.fits.internal;

import java.util.Locale;
import java.util.Optional;

import nom.tam.fits.Header;
import nom.tam.fits.HeaderCard;

/**
 * Keyword look-up in an HDU's header that falls back to the primary header (common practice:
 * extensions inherit the primary header's keywords). Thread-confined.
 */
final class Keys {

    private final Header own;
    private final Header primary;

    Keys(Header own, Header primary) {
        this.own = own;
        this.primary = primary;
    }

    Header own() {
        return own;
    }

    private HeaderCard card(String key) {
        HeaderCard c = own == null ? null : own.findCard(key);
        if ((c == null || c.getValue() == null) && primary != null && primary != own) {
            c = primary.findCard(key);
        }
        return c == null || c.getValue() == null ? null : c;
    }

    boolean has(String key) {
        return card(key) != null;
    }

    /** The keyword's value as text (trimmed), if present. */
    Optional<String> text(String key) {
        HeaderCard c = card(key);
        return c == null ? Optional.empty() : Optional.of(c.getValue().trim());
    }

    /** The keyword's value as a number, if present and numeric; text numbers are parsed too. */
    Optional<Double> number(String key) {
        HeaderCard c = card(key);
        if (c == null) {
            return Optional.empty();
        }
        String v = c.getValue().trim().replace('D', 'E').replace('d', 'e');
        try {
            double d = Double.parseDouble(v);
            return Double.isFinite(d) ? Optional.of(d) : Optional.empty();
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    double number(String key, double dflt) {
        return number(key).orElse(dflt);
    }

    /** A logical keyword ({@code T}/{@code F}), if present. */
    Optional<Boolean> logical(String key) {
        return text(key).map(v -> v.toUpperCase(Locale.ROOT)).filter(v -> v.equals("T") || v.equals("F"))
                .map(v -> v.equals("T"));
    }

    /** The keyword's comment in lower case, or empty. */
    String comment(String key) {
        HeaderCard c = card(key);
        return c == null || c.getComment() == null ? "" : c.getComment().toLowerCase(Locale.ROOT);
    }
}
