package org.redward.workbench.internal;

import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Display;

/** The workbench's own window colours (chart colours live in the charts bundle). UI thread only. */
final class Palette {

    final Color paper;
    final Color panel;
    final Color ink;
    final Color muted;
    final Color alarm;
    final Color good;
    final Color decided;
    final Color accent;

    Palette(Display d) {
        paper = new Color(d, new RGB(0xFB, 0xFA, 0xF7));
        panel = new Color(d, new RGB(0xEF, 0xEC, 0xE4));
        ink = new Color(d, new RGB(0x2B, 0x2B, 0x33));
        muted = new Color(d, new RGB(0x7A, 0x76, 0x6C));
        alarm = new Color(d, new RGB(0xB0, 0x2E, 0x1C));
        good = new Color(d, new RGB(0x2E, 0x7D, 0x4F));
        decided = new Color(d, new RGB(0xE3, 0xEE, 0xE0));
        accent = new Color(d, new RGB(0x3A, 0x5B, 0xA0));
    }
}
