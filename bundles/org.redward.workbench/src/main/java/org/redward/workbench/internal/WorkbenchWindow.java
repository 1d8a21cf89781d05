package org.redward.workbench.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.FontData;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TabFolder;
import org.eclipse.swt.widgets.TabItem;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.ui.Layer;
import org.redward.charts.ChartStyle;
import org.redward.charts.RestLine;
import org.redward.charts.ScoreChart;
import org.redward.charts.SpectrumChart;
import org.redward.spectrum.Spectrum;

/**
 * The workbench window: the queue on the left, the spectrum over the score-against-z view in the
 * middle, the decision panel and the velocity/distance and bundle panels on the right, a
 * message strip at the bottom. Keyboard first (see {@link #KEYS}); every decision goes to the
 * journal before the screen moves on.
 *
 * <p>Everything here runs on the SWT UI thread; reading and estimating run on one worker thread
 * and come back through {@link Display#asyncExec}.
 */
final class WorkbenchWindow {

    /** The keyboard, shown in the help strip. */
    static final String KEYS = "→/Space next · ← back · U next undecided · Enter take selected solution · 1-9 pick solution"
            + " · click spectrum, then choose a line and press Set z · X no redshift · S/K/T/0 grade · H full view";

    private final Display display;
    private final Backend backend;
    private final Journal journal;
    private final List<String> estimatorIds;
    private final WorkQueue queue = new WorkQueue();
    private final Palette palette;
    private final Shell shell;
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "workbench-worker");
        t.setDaemon(true);
        return t;
    });
    private final Map<QueueItem, Backend.Loaded> cache = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<QueueItem, Backend.Loaded> e) {
            return size() > 24;
        }
    };
    private final List<String> messages = new ArrayList<>();

    private Table queueTable;
    private Combo classFilter;
    private Combo gradeFilter;
    private Text disagreementFilter;
    private Button undecidedOnly;
    private Label counts;
    private ChartCanvas spectrumCanvas;
    private ChartCanvas scoreCanvas;
    private Label headline;
    private Table solutions;
    private Label comparison;
    private Label picked;
    private Combo lineChoice;
    private Button[] gradeButtons;
    private Text note;
    private Label verdictLabel;
    private Table physics;
    private Label physicsNote;
    private Table bundleTable;
    private Label messageBar;

    private double pickedAngstrom = Double.NaN;
    private List<org.redward.charts.FoundLine> shownFound = List.of();
    private double shownZ = Double.NaN;
    private QueueItem shown;
    private Backend.Loaded shownLoaded;
    private Font bold;
    private final org.eclipse.swt.widgets.Listener keyFilter = this::key;

    WorkbenchWindow(Display display, Backend backend, Journal journal, List<String> estimatorIds) {
        this.display = display;
        this.backend = backend;
        this.journal = journal;
        this.estimatorIds = List.copyOf(estimatorIds);
        this.palette = new Palette(display);
        this.shell = new Shell(display, SWT.SHELL_TRIM);
        shell.setText("Redward workbench");
        build();
        shell.addListener(SWT.Dispose, e -> worker.shutdownNow());
        display.addFilter(SWT.KeyDown, keyFilter);
        shell.addListener(SWT.Dispose, e -> display.removeFilter(SWT.KeyDown, keyFilter));
    }

    Shell shell() { return shell; }
    WorkQueue queue() { return queue; }
    ChartCanvas spectrumCanvas() { return spectrumCanvas; }
    ChartCanvas scoreCanvas() { return scoreCanvas; }
    List<String> messages() { return messages; }
    double shownZ() { return shownZ; }
    Table physicsTable() { return physics; }
    Table bundleTable() { return bundleTable; }

    // ------------------------------------------------------------------ layout

    private void build() {
        shell.setBackground(palette.paper);
        GridLayout gl = new GridLayout(1, false);
        gl.marginWidth = 4;
        gl.marginHeight = 4;
        gl.verticalSpacing = 3;
        shell.setLayout(gl);
        FontData fd = shell.getFont().getFontData()[0];
        bold = new Font(display, fd.getName(), fd.getHeight() + 1, SWT.BOLD);
        shell.addListener(SWT.Dispose, e -> bold.dispose());

        Composite top = new Composite(shell, SWT.NONE);
        top.setBackground(palette.panel);
        top.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        GridLayout tl = new GridLayout(12, false);
        tl.marginHeight = 3;
        top.setLayout(tl);
        Button open = button(top, "Add spectra…", e -> chooseAndAdd());
        open.setToolTipText("add files or a catalogue to the queue");
        button(top, "Export catalogue…", e -> chooseAndExport());
        label(top, "  show class");
        classFilter = new Combo(top, SWT.READ_ONLY);
        classFilter.setItems("any", "galaxy", "quasar", "star", "unknown");
        classFilter.select(0);
        classFilter.addListener(SWT.Selection, e -> applyFilter());
        label(top, "machine grade");
        gradeFilter = new Combo(top, SWT.DROP_DOWN);
        gradeFilter.setItems("any");
        gradeFilter.select(0);
        gradeFilter.addListener(SWT.Selection, e -> applyFilter());
        gradeFilter.addListener(SWT.DefaultSelection, e -> applyFilter());
        label(top, "estimators differ by ≥");
        disagreementFilter = new Text(top, SWT.BORDER);
        disagreementFilter.setLayoutData(new GridData(60, SWT.DEFAULT));
        disagreementFilter.setMessage("km/s");
        disagreementFilter.addListener(SWT.DefaultSelection, e -> applyFilter());
        label(top, "km/s");
        undecidedOnly = new Button(top, SWT.CHECK);
        undecidedOnly.setText("undecided only");
        undecidedOnly.setBackground(palette.panel);
        undecidedOnly.addListener(SWT.Selection, e -> applyFilter());
        counts = label(top, "");
        counts.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));

        SashForm body = new SashForm(shell, SWT.HORIZONTAL);
        body.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        body.setBackground(palette.panel);

        queueTable = new Table(body, SWT.VIRTUAL | SWT.SINGLE | SWT.FULL_SELECTION | SWT.BORDER);
        queueTable.setHeaderVisible(true);
        for (String[] c : new String[][] {{"#", "42"}, {"object", "130"}, {"z", "72"}, {"class", "58"}, {"grade", "48"}, {"verdict", "70"}}) {
            TableColumn col = new TableColumn(queueTable, SWT.LEFT);
            col.setText(c[0]);
            col.setWidth(Integer.parseInt(c[1]));
        }
        queueTable.addListener(SWT.SetData, this::fillQueueRow);
        queueTable.addListener(SWT.Selection, e -> {
            int i = queueTable.getSelectionIndex();
            if (i >= 0 && i != queue.cursor()) {
                queue.moveTo(i);
                showCurrent();
            }
        });

        SashForm middle = new SashForm(body, SWT.VERTICAL);
        Composite specBox = new Composite(middle, SWT.NONE);
        GridLayout sl = new GridLayout(1, false);
        sl.marginWidth = 0;
        sl.marginHeight = 0;
        sl.verticalSpacing = 0;
        specBox.setLayout(sl);
        specBox.setBackground(palette.paper);
        headline = new Label(specBox, SWT.NONE);
        headline.setFont(bold);
        headline.setBackground(palette.paper);
        headline.setForeground(palette.ink);
        headline.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        spectrumCanvas = new ChartCanvas(specBox);
        spectrumCanvas.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        spectrumCanvas.onClick(this::pick);
        scoreCanvas = new ChartCanvas(middle);
        middle.setWeights(68, 32);

        Composite right = new Composite(body, SWT.NONE);
        right.setBackground(palette.panel);
        GridLayout rl = new GridLayout(1, false);
        right.setLayout(rl);
        section(right, "Solutions (select to preview the lines)");
        solutions = new Table(right, SWT.SINGLE | SWT.FULL_SELECTION | SWT.BORDER);
        solutions.setHeaderVisible(true);
        for (String[] c : new String[][] {{"key", "30"}, {"estimator", "90"}, {"z", "80"}, {"rank", "50"}}) {
            TableColumn col = new TableColumn(solutions, SWT.LEFT);
            col.setText(c[0]);
            col.setWidth(Integer.parseInt(c[1]));
        }
        GridData sg = new GridData(SWT.FILL, SWT.FILL, true, false);
        sg.heightHint = 120;
        solutions.setLayoutData(sg);
        solutions.addListener(SWT.Selection, e -> previewSelectedSolution());
        solutions.addListener(SWT.DefaultSelection, e -> takeSelectedSolution());
        comparison = wrapLabel(right, "");
        Composite takeRow = row(right, 2);
        button(takeRow, "Take selected (Enter)", e -> takeSelectedSolution());
        button(takeRow, "No redshift (X)", e -> decide(Verdict.NO_REDSHIFT, Double.NaN, "", ""));

        section(right, "Name a feature");
        picked = wrapLabel(right, "Click a feature in the spectrum.");
        lineChoice = new Combo(right, SWT.READ_ONLY);
        lineChoice.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        lineChoice.addListener(SWT.Selection, e -> previewNamedLine());
        button(right, "Set z from this line", e -> setZFromLine());

        section(right, "Your grade and note");
        Composite grades = row(right, 4);
        PersonGrade[] gs = PersonGrade.values();
        gradeButtons = new Button[gs.length];
        for (int i = 0; i < gs.length; i++) {
            PersonGrade g = gs[i];
            gradeButtons[i] = new Button(grades, SWT.RADIO);
            gradeButtons[i].setText(g.key());
            gradeButtons[i].setBackground(palette.panel);
            gradeButtons[i].addListener(SWT.Selection, e -> {
                if (((Button) e.widget).getSelection()) {
                    regrade(g);
                }
            });
        }
        note = new Text(right, SWT.BORDER | SWT.SINGLE);
        note.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        note.setMessage("note (Enter saves)");
        note.addListener(SWT.DefaultSelection, e -> saveNote());
        verdictLabel = wrapLabel(right, "");

        TabFolder tabs = new TabFolder(right, SWT.TOP);
        tabs.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        TabItem t1 = new TabItem(tabs, SWT.NONE);
        t1.setText("Velocity & distance");
        Composite pbox = new Composite(tabs, SWT.NONE);
        pbox.setLayout(new GridLayout(1, false));
        physics = new Table(pbox, SWT.FULL_SELECTION);
        physics.setHeaderVisible(true);
        physics.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        for (String[] c : new String[][] {{"quantity", "150"}, {"value", "120"}}) {
            TableColumn col = new TableColumn(physics, SWT.LEFT);
            col.setText(c[0]);
            col.setWidth(Integer.parseInt(c[1]));
        }
        physicsNote = wrapLabel(pbox, "");
        physicsNote.setForeground(palette.alarm);
        t1.setControl(pbox);
        TabItem t2 = new TabItem(tabs, SWT.NONE);
        t2.setText("Bundles");
        Composite bbox = new Composite(tabs, SWT.NONE);
        bbox.setLayout(new GridLayout(1, false));
        button(bbox, "Install bundle jar…", e -> chooseAndInstall());
        bundleTable = new Table(bbox, SWT.FULL_SELECTION | SWT.BORDER);
        bundleTable.setHeaderVisible(true);
        bundleTable.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        for (String[] c : new String[][] {{"kind", "60"}, {"id / name", "200"}, {"version / bundle", "160"}, {"state", "60"}}) {
            TableColumn col = new TableColumn(bundleTable, SWT.LEFT);
            col.setText(c[0]);
            col.setWidth(Integer.parseInt(c[1]));
        }
        t2.setControl(bbox);

        body.setWeights(22, 55, 23);

        Label keys = new Label(shell, SWT.NONE);
        keys.setText(KEYS);
        keys.setForeground(palette.muted);
        keys.setBackground(palette.paper);
        keys.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        messageBar = new Label(shell, SWT.NONE);
        messageBar.setBackground(palette.paper);
        messageBar.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        refreshBundles();
    }

    private Label label(Composite parent, String text) {
        Label l = new Label(parent, SWT.NONE);
        l.setText(text);
        l.setBackground(parent.getBackground());
        l.setForeground(palette.ink);
        return l;
    }

    private Label wrapLabel(Composite parent, String text) {
        Label l = new Label(parent, SWT.WRAP);
        l.setText(text);
        l.setBackground(parent.getBackground());
        l.setForeground(palette.ink);
        GridData g = new GridData(SWT.FILL, SWT.CENTER, true, false);
        g.widthHint = 200;
        l.setLayoutData(g);
        return l;
    }

    private void section(Composite parent, String text) {
        Label l = label(parent, text);
        l.setFont(bold);
        l.setForeground(palette.accent);
    }

    private Composite row(Composite parent, int columns) {
        Composite c = new Composite(parent, SWT.NONE);
        c.setBackground(parent.getBackground());
        GridLayout g = new GridLayout(columns, false);
        g.marginWidth = 0;
        g.marginHeight = 0;
        c.setLayout(g);
        return c;
    }

    private Button button(Composite parent, String text, org.eclipse.swt.widgets.Listener l) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.addListener(SWT.Selection, e -> {
            l.handleEvent(e);
            // hand the keyboard back to the queue so that the keys keep working after a click
            if (!queueTable.isDisposed()) {
                queueTable.setFocus();
            }
        });
        return b;
    }

    // ------------------------------------------------------------------ queue

    /** Adds files, folders or catalogues to the queue; problems go to the message strip. */
    void add(List<Path> paths) {
        List<QueueItem> items = new ArrayList<>();
        for (Path p : paths) {
            if (Catalogue.isCatalogue(p)) {
                try {
                    Catalogue.Read r = Catalogue.read(p);
                    items.addAll(r.items());
                    r.problems().forEach(this::message);
                } catch (IOException e) {
                    message(e.getMessage());
                }
            } else {
                for (QueueItem it : backend.list(p)) {
                    items.add(it);
                    if (!it.problem().isEmpty()) {
                        message(it.problem());
                    }
                }
            }
        }
        for (QueueItem it : items) {
            Decision d = journal.decisions().get(it.key());
            if (d != null) {
                it.decision(d);
            }
        }
        queue.addAll(items);
        refreshGradeChoices();
        refreshQueue();
        if (shown == null) {
            showCurrent();
        }
    }

    private void refreshGradeChoices() {
        java.util.TreeSet<String> g = new java.util.TreeSet<>();
        for (QueueItem it : queue.all()) {
            if (!it.machineGrade().isEmpty()) {
                g.add(it.machineGrade());
            }
        }
        String sel = gradeFilter.getText();
        List<String> items = new ArrayList<>();
        items.add("any");
        items.addAll(g);
        gradeFilter.setItems(items.toArray(new String[0]));
        gradeFilter.setText(sel.isEmpty() ? "any" : sel);
    }

    private void applyFilter() {
        String cls = classFilter.getText();
        String grade = gradeFilter.getText().trim();
        double dv = Double.NaN;
        String t = disagreementFilter.getText().trim();
        if (!t.isEmpty()) {
            try {
                dv = Double.parseDouble(t);
            } catch (NumberFormatException e) {
                message("filter: '" + t + "' is not a velocity in km/s");
            }
        }
        queue.filter(new WorkQueue.Filter(cls.equals("any") ? "" : cls, grade.equals("any") ? "" : grade, dv,
                undecidedOnly.getSelection()));
        refreshQueue();
        showCurrent();
    }

    private void refreshQueue() {
        queueTable.setItemCount(queue.view().size());
        queueTable.clearAll();
        if (queue.cursor() >= 0) {
            queueTable.setSelection(queue.cursor());
        }
        counts.setText(String.format(Locale.ROOT, "%d shown of %d · %d decided · journal %s", queue.view().size(),
                queue.all().size(), queue.decidedCount(), journal.file().getFileName()));
        counts.getParent().layout();
    }

    private void fillQueueRow(Event e) {
        TableItem ti = (TableItem) e.item;
        int i = queueTable.indexOf(ti);
        if (i < 0 || i >= queue.view().size()) {
            return;
        }
        QueueItem it = queue.view().get(i);
        double z = it.currentZ();
        Decision d = it.decision();
        ti.setText(new String[] {Integer.toString(i + 1), it.id(), Double.isFinite(z) ? String.format(Locale.ROOT, "%.5f", z) : "–",
            it.objectClass(), it.machineGrade(), d == null ? "" : d.verdict().key()});
        ti.setBackground(d != null ? palette.decided : null);
        ti.setForeground(!it.problem().isEmpty() ? palette.alarm : palette.ink);
    }

    /** Moves by {@code step} in the filtered queue and shows the spectrum there. */
    void move(int step) {
        if (queue.move(step)) {
            queueTable.setSelection(queue.cursor());
            showCurrent();
        }
    }

    void nextUndecided() {
        if (queue.nextUndecided()) {
            queueTable.setSelection(queue.cursor());
            showCurrent();
        } else {
            message("no undecided spectrum after this one");
        }
    }

    // ------------------------------------------------------------------ showing one spectrum

    /** Shows the current item: at once if it is loaded, else after the worker has read it. */
    void showCurrent() {
        QueueItem it = queue.current();
        shown = it;
        pickedAngstrom = Double.NaN;
        if (queue.cursor() >= 0 && queueTable.getSelectionIndex() != queue.cursor()) {
            queueTable.setSelection(queue.cursor());
        }
        if (it == null) {
            headline.setText("Nothing in the queue" + (queue.all().isEmpty() ? "" : " passes the filter"));
            spectrumCanvas.setChart(null, "Add spectra with the button above or name files on the command line.");
            scoreCanvas.setChart(null, "");
            return;
        }
        Backend.Loaded l = cache.get(it);
        if (l != null && answered(it)) {
            draw(it, l);
        } else if (!it.problem().isEmpty() && l == null) {
            drawProblem(it);
        } else {
            headline.setText(it.id() + " · reading…");
            spectrumCanvas.setChart(null, "reading " + it.source().getFileName() + " …");
            scoreCanvas.setChart(null, "");
            loadInBackground(it, true);
        }
        prefetch();
    }

    private boolean answered(QueueItem it) {
        for (String id : estimatorIds) {
            if (!it.answers().containsKey(id)) {
                return false;
            }
        }
        return true;
    }

    private void prefetch() {
        int c = queue.cursor();
        for (int k = 1; k <= 2; k++) {
            if (c + k < queue.view().size()) {
                QueueItem next = queue.view().get(c + k);
                if (!cache.containsKey(next) && next.problem().isEmpty()) {
                    loadInBackground(next, false);
                }
            }
        }
    }

    private final java.util.Set<QueueItem> pending = java.util.concurrent.ConcurrentHashMap.newKeySet();

    private void loadInBackground(QueueItem it, boolean showWhenDone) {
        if (!pending.add(it)) {
            return;
        }
        List<String> missing = new ArrayList<>();
        for (String id : estimatorIds) {
            if (!it.answers().containsKey(id)) {
                missing.add(id);
            }
        }
        worker.submit(() -> {
            Backend.Loaded l = null;
            String problem = "";
            Map<String, MachineAnswer> answers = new LinkedHashMap<>();
            try {
                l = backend.load(it);
                for (String id : missing) {
                    answers.put(id, backend.estimate(id, l.spectrum()));
                }
            } catch (IOException | RuntimeException e) {
                problem = e.getMessage() == null ? e.toString() : e.getMessage();
            }
            Backend.Loaded loaded = l;
            String why = problem;
            if (display.isDisposed()) {
                return;
            }
            display.asyncExec(() -> {
                pending.remove(it);
                if (shell.isDisposed()) {
                    return;
                }
                it.answers().putAll(answers);
                if (loaded != null) {
                    cache.put(it, loaded);
                    if (loaded.spectrum().metadata().objectId().isPresent()) {
                        it.id(loaded.spectrum().metadata().objectId().get());
                    }
                } else {
                    it.problem(why);
                    message(why);
                }
                int row = queue.view().indexOf(it);
                if (row >= 0) {
                    queueTable.clear(row);
                }
                if (shown == it) {
                    if (loaded != null) {
                        draw(it, loaded);
                    } else {
                        drawProblem(it);
                    }
                }
            });
        });
    }

    private void drawProblem(QueueItem it) {
        headline.setText(it.id() + " · cannot be shown");
        spectrumCanvas.setChart(null, it.problem());
        scoreCanvas.setChart(null, "");
        solutions.removeAll();
        comparison.setText("");
        refreshPhysics(Double.NaN);
        showDecision(it);
    }

    /** Builds both charts for a loaded item and paints them now; returns the milliseconds spent. */
    double draw(QueueItem it, Backend.Loaded l) {
        long t0 = System.nanoTime();
        shownLoaded = l;
        Spectrum s = l.spectrum();
        double z = it.currentZ();
        shownZ = z;
        shownFound = l.found();
        SpectrumChart sc = SpectrumChart.of(s).restLines(backend.lines(), z).foundLines(shownFound);
        if (l.skyFlux() != null) {
            sc.sky(s.axis().vacuumAngstrom(), l.skyFlux());
        }
        spectrumCanvas.setChart(sc.build(), "");
        ScoreChart score = ScoreChart.create().current(z);
        for (MachineAnswer a : it.answers().values()) {
            if (a.curve() != null) {
                double[] alts = a.alternatives().stream().mapToDouble(Double::doubleValue).toArray();
                score.curve(a.estimator(), a.curve().z(), a.curve().score(), a.curve().scoreName(), a.curve().lowerIsBetter(), alts);
            }
        }
        scoreCanvas.setChart(score.build(), "");
        headline.setText(headlineText(it, l));
        fillSolutions(it);
        showDecision(it);
        refreshPhysics(z);
        picked.setText("Click a feature in the spectrum.");
        lineChoice.removeAll();
        spectrumCanvas.drawNow();
        scoreCanvas.drawNow();
        return (System.nanoTime() - t0) / 1e6;
    }

    private String headlineText(QueueItem it, Backend.Loaded l) {
        StringBuilder b = new StringBuilder(it.id());
        b.append("  ·  ").append(it.source().getFileName());
        if (it.index() > 0) {
            b.append(" #").append(it.index());
        }
        MachineAnswer a = it.primary();
        if (a != null && a.ok()) {
            b.append(String.format(Locale.ROOT, "  ·  %s z = %.5f ± %.5f, %s%s", a.estimator(), a.z(), a.zError(), a.objectClass(),
                    a.grade().isEmpty() ? "" : ", grade " + a.grade()));
        } else if (a != null) {
            b.append("  ·  ").append(a.estimator()).append(" failed: ").append(a.error());
        }
        return b.toString();
    }

    private void fillSolutions(QueueItem it) {
        solutions.removeAll();
        int key = 1;
        for (MachineAnswer a : it.answers().values()) {
            if (!a.ok()) {
                TableItem ti = new TableItem(solutions, SWT.NONE);
                ti.setText(new String[] {"", a.estimator(), "failed", ""});
                ti.setForeground(palette.alarm);
                continue;
            }
            List<Double> alts = a.alternatives().isEmpty() ? List.of(a.z()) : a.alternatives();
            for (int r = 0; r < alts.size(); r++) {
                TableItem ti = new TableItem(solutions, SWT.NONE);
                ti.setText(new String[] {key <= 9 ? Integer.toString(key) : "", a.estimator(),
                    String.format(Locale.ROOT, "%.5f", alts.get(r)), r == 0 ? "best" : "#" + (r + 1)});
                ti.setData(new Object[] {a, alts.get(r), r});
                key++;
            }
        }
        if (solutions.getItemCount() > 0) {
            solutions.setSelection(0);
        }
        StringBuilder cmp = new StringBuilder();
        List<MachineAnswer> ok = it.answers().values().stream().filter(MachineAnswer::ok).toList();
        if (ok.size() >= 2) {
            MachineAnswer a = ok.get(0);
            MachineAnswer b = ok.get(1);
            double dv = Kinematics.velocityDifferenceKmPerS(a.z(), b.z());
            cmp.append(String.format(Locale.ROOT, "%s − %s: Δz = %.5f, Δv = %.0f km/s", b.estimator(), a.estimator(), b.z() - a.z(), dv));
        }
        for (MachineAnswer a : it.answers().values()) {
            for (String w : a.warnings()) {
                cmp.append(cmp.length() == 0 ? "" : "\n").append("⚠ ").append(a.estimator()).append(": ").append(w);
            }
        }
        comparison.setText(cmp.toString());
        comparison.getParent().layout();
    }

    /** Moves the rest-line markers (and the score marker) to z without a decision. */
    void preview(double z) {
        JFreeChart c = spectrumCanvas.chart();
        if (c == null || !Double.isFinite(z)) {
            return;
        }
        shownZ = z;
        SpectrumChart.placeRestLines(c, backend.lines(), z);
        if (scoreCanvas.chart() != null) {
            ScoreChart.markCurrent(scoreCanvas.chart(), z);
        }
        refreshPhysics(z);
        spectrumCanvas.markDirty();
        scoreCanvas.markDirty();
    }

    private void previewSelectedSolution() {
        int i = solutions.getSelectionIndex();
        if (i >= 0 && solutions.getItem(i).getData() instanceof Object[] d) {
            preview((Double) d[1]);
        }
    }

    /** Selects the solution with this 1-based key and previews it. */
    void selectSolution(int key) {
        for (int i = 0; i < solutions.getItemCount(); i++) {
            if (solutions.getItem(i).getText(0).equals(Integer.toString(key))) {
                solutions.setSelection(i);
                previewSelectedSolution();
                return;
            }
        }
    }

    // ------------------------------------------------------------------ naming a line

    /** A click in the spectrum: remembers the wavelength and lists the lines it could be. */
    void pick(double clickedAngstrom) {
        // a click near a line the finder measured takes that line's fitted centre, so that the z
        // from naming it is the z the lines command gives for the same identification
        org.redward.charts.FoundLine snapped = null;
        double tolerance = snapToleranceAngstrom(clickedAngstrom);
        for (org.redward.charts.FoundLine f : shownFound) {
            double d = Math.abs(f.observedVacuumAngstrom() - clickedAngstrom);
            if (d <= tolerance && (snapped == null || d < Math.abs(snapped.observedVacuumAngstrom() - clickedAngstrom))) {
                snapped = f;
            }
        }
        final double angstrom = snapped != null ? snapped.observedVacuumAngstrom() : clickedAngstrom;
        pickedAngstrom = angstrom;
        List<RestLine> lines = new ArrayList<>(backend.lines());
        lines.removeIf(l -> Kinematics.redshiftFromLine(angstrom, l.restVacuumAngstrom()) < -0.01);
        // most likely first: the line that would put the object nearest the z shown now
        double now = Double.isFinite(shownZ) ? shownZ : 0;
        lines.sort((a, b) -> Double.compare(Math.abs(Kinematics.redshiftFromLine(angstrom, a.restVacuumAngstrom()) - now),
                Math.abs(Kinematics.redshiftFromLine(angstrom, b.restVacuumAngstrom()) - now)));
        lineChoice.removeAll();
        for (RestLine l : lines) {
            lineChoice.add(String.format(Locale.ROOT, "%s %.2f Å → z = %.5f", l.name(), l.restVacuumAngstrom(),
                    Kinematics.redshiftFromLine(angstrom, l.restVacuumAngstrom())));
            lineChoice.setData(Integer.toString(lineChoice.getItemCount() - 1), l);
        }
        if (lineChoice.getItemCount() > 0) {
            lineChoice.select(0);
        }
        picked.setText(snapped != null
                ? String.format(Locale.ROOT, "Line found at %.2f Å (vacuum, fitted centre; S/N %.1f). Which line is it?", angstrom, snapped.snr())
                : String.format(Locale.ROOT, "Feature at %.2f Å (vacuum, as clicked). Which line is it?", angstrom));
        JFreeChart c = spectrumCanvas.chart();
        if (c != null) {
            var ms = c.getXYPlot().getDomainMarkers(Layer.FOREGROUND);
            if (ms != null) {
                for (Object m : new ArrayList<>(ms)) {
                    if (m instanceof ValueMarker vm && "picked".equals(vm.getLabel())) {
                        c.getXYPlot().removeDomainMarker(0, vm, Layer.FOREGROUND, false);
                    }
                }
            }
            ValueMarker vm = new ValueMarker(angstrom, ChartStyle.DETECTED, new java.awt.BasicStroke(2f));
            vm.setLabel("picked");
            vm.setLabelFont(ChartStyle.SMALL);
            c.getXYPlot().addDomainMarker(0, vm, Layer.FOREGROUND, true);
            spectrumCanvas.markDirty();
        }
        picked.getParent().layout();
    }

    /** Four pixels of the spectrum at this wavelength, or 3 Å when no spectrum is shown. */
    private double snapToleranceAngstrom(double angstrom) {
        if (shownLoaded == null) {
            return 3.0;
        }
        double[] wl = shownLoaded.spectrum().axis().vacuumAngstrom();
        int i = java.util.Arrays.binarySearch(wl, angstrom);
        i = Math.max(1, Math.min(wl.length - 1, i < 0 ? -i - 1 : i));
        return 4 * Math.abs(wl[i] - wl[i - 1]);
    }

    /** The wavelength the next naming will use (the clicked one, or the fitted centre it snapped to). */
    double pickedAngstrom() {
        return pickedAngstrom;
    }

    private RestLine chosenLine() {
        int i = lineChoice.getSelectionIndex();
        return i < 0 ? null : (RestLine) lineChoice.getData(Integer.toString(i));
    }

    private void previewNamedLine() {
        RestLine l = chosenLine();
        if (l != null && Double.isFinite(pickedAngstrom)) {
            preview(Kinematics.redshiftFromLine(pickedAngstrom, l.restVacuumAngstrom()));
        }
    }

    /** Names the picked feature as the chosen line and decides z from it. */
    void setZFromLine() {
        RestLine l = chosenLine();
        if (l == null || !Double.isFinite(pickedAngstrom)) {
            message("click a feature in the spectrum first, then choose its line");
            return;
        }
        double z = Kinematics.redshiftFromLine(pickedAngstrom, l.restVacuumAngstrom());
        decide(Verdict.LINE, z, "", l.name() + String.format(Locale.ROOT, " %.3f @ %.3f Å", l.restVacuumAngstrom(), pickedAngstrom));
        message(String.format(Locale.ROOT, "z = %.5f from %s alone: check that the other lines fall in place before trusting it", z, l.name()));
    }

    /** For tests and scripts: choose the line by name (first match) after {@link #pick}. */
    boolean chooseLine(String name) {
        for (int i = 0; i < lineChoice.getItemCount(); i++) {
            RestLine l = (RestLine) lineChoice.getData(Integer.toString(i));
            if (l.name().equals(name)) {
                lineChoice.select(i);
                previewNamedLine();
                return true;
            }
        }
        return false;
    }

    // ------------------------------------------------------------------ deciding

    void takeSelectedSolution() {
        int i = solutions.getSelectionIndex();
        if (i < 0 || !(solutions.getItem(i).getData() instanceof Object[] d)) {
            message("no solution to take for this spectrum");
            return;
        }
        MachineAnswer a = (MachineAnswer) d[0];
        int rank = (Integer) d[2];
        decide(rank == 0 ? Verdict.ACCEPTED : Verdict.ALTERNATIVE, (Double) d[1], a.estimator(), "");
    }

    private PersonGrade selectedGrade(Verdict v) {
        for (int i = 0; i < gradeButtons.length; i++) {
            if (gradeButtons[i].getSelection()) {
                return PersonGrade.values()[i];
            }
        }
        return v == Verdict.NO_REDSHIFT ? PersonGrade.NONE : PersonGrade.LIKELY;
    }

    /** Records a decision for the current item: journal first, then the screen. */
    void decide(Verdict v, double z, String estimator, String line) {
        QueueItem it = shown;
        if (it == null) {
            return;
        }
        Decision old = it.decision();
        PersonGrade g = old != null ? old.grade() : selectedGrade(v);
        if (v == Verdict.NO_REDSHIFT) {
            g = PersonGrade.NONE;
        }
        Decision d = new Decision(it.key(), v, z, estimator, line, g, note.getText(), backend.user(), Instant.now());
        record(it, d);
        if (Double.isFinite(z)) {
            preview(z);
        }
    }

    void regrade(PersonGrade g) {
        QueueItem it = shown;
        if (it == null) {
            return;
        }
        if (it.decision() == null) {
            // a grade alone settles on the z shown now
            double z = Double.isFinite(shownZ) ? shownZ : it.currentZ();
            MachineAnswer a = it.primary();
            Verdict v = a != null && a.ok() && z == a.z() ? Verdict.ACCEPTED : Verdict.TYPED;
            record(it, new Decision(it.key(), g == PersonGrade.NONE ? Verdict.NO_REDSHIFT : v,
                    g == PersonGrade.NONE ? Double.NaN : z, v == Verdict.ACCEPTED ? a.estimator() : "", "", g, note.getText(),
                    backend.user(), Instant.now()));
        } else {
            record(it, it.decision().withGrade(g));
        }
    }

    private void saveNote() {
        QueueItem it = shown;
        if (it == null) {
            return;
        }
        if (it.decision() == null) {
            message("decide first (take a solution or name a line), then add a note");
            return;
        }
        record(it, it.decision().withNote(note.getText()));
    }

    private void record(QueueItem it, Decision d) {
        try {
            journal.append(d, it);
        } catch (IOException e) {
            message("could not write the journal " + journal.file() + ": " + e.getMessage() + " (decision NOT saved)");
            return;
        }
        it.decision(d);
        int row = queue.view().indexOf(it);
        if (row >= 0) {
            queueTable.clear(row);
        }
        showDecision(it);
        refreshQueue();
    }

    private void showDecision(QueueItem it) {
        Decision d = it.decision();
        for (int i = 0; i < gradeButtons.length; i++) {
            gradeButtons[i].setSelection(d != null && d.grade() == PersonGrade.values()[i]);
        }
        note.setText(d == null ? "" : d.note());
        if (d == null) {
            verdictLabel.setText("Not decided yet.");
            verdictLabel.setForeground(palette.muted);
        } else {
            verdictLabel.setText(String.format(Locale.ROOT, "Decided: %s%s, %s, by %s at %s%s", d.verdict().key(),
                    Double.isFinite(d.z()) ? String.format(Locale.ROOT, " z = %.5f", d.z()) : "", d.grade().key(), d.who(),
                    d.when().toString().substring(0, 19).replace('T', ' '), d.line().isEmpty() ? "" : "\nline: " + d.line()
                    + (d.verdict() == Verdict.LINE ? " (one line only: check that other lines agree)" : "")));
            verdictLabel.setForeground(palette.good);
        }
        verdictLabel.getParent().layout();
    }

    // ------------------------------------------------------------------ panels

    private void refreshPhysics(double z) {
        physics.removeAll();
        if (!Double.isFinite(z)) {
            TableItem ti = new TableItem(physics, SWT.NONE);
            ti.setText(new String[] {"no redshift", ""});
            physicsNote.setText("");
            return;
        }
        java.util.LinkedHashSet<String> cautions = new java.util.LinkedHashSet<>();
        for (String[] r : backend.velocitiesAndDistances(z)) {
            TableItem ti = new TableItem(physics, SWT.NONE);
            boolean warn = r.length > 2 && !r[2].isEmpty();
            ti.setText(new String[] {r[0] + (warn ? " ⚠" : ""), r[1]});
            if (warn) {
                ti.setForeground(palette.alarm);
                cautions.add("⚠ " + r[2]);
            }
        }
        physicsNote.setText(String.join("\n", cautions));
        physicsNote.getParent().layout();
    }

    void refreshBundles() {
        bundleTable.removeAll();
        for (String[] s : backend.services()) {
            TableItem ti = new TableItem(bundleTable, SWT.NONE);
            ti.setText(new String[] {s[0], s[1], s[2], ""});
            ti.setForeground(palette.accent);
        }
        for (String[] b : backend.bundles()) {
            TableItem ti = new TableItem(bundleTable, SWT.NONE);
            ti.setText(new String[] {"bundle", b[1], b[2], b[3]});
        }
    }

    /** Installs a bundle jar; a failure is a message in the window, nothing else changes. */
    void install(Path jar) {
        try {
            message(backend.install(jar));
        } catch (IOException | RuntimeException e) {
            message("bundle " + jar.getFileName() + " was not installed: " + e.getMessage());
        }
        refreshBundles();
    }

    // ------------------------------------------------------------------ files

    private void chooseAndAdd() {
        FileDialog fd = new FileDialog(shell, SWT.OPEN | SWT.MULTI);
        fd.setText("Add spectra or a catalogue to the queue");
        if (fd.open() != null) {
            List<Path> ps = new ArrayList<>();
            for (String n : fd.getFileNames()) {
                ps.add(Path.of(fd.getFilterPath(), n));
            }
            add(ps);
        }
    }

    private void chooseAndExport() {
        FileDialog fd = new FileDialog(shell, SWT.SAVE);
        fd.setText("Export the queue as a catalogue (.csv or .jsonl)");
        fd.setFileName("verdicts.csv");
        fd.setOverwrite(true);
        String f = fd.open();
        if (f != null) {
            export(Path.of(f));
        }
    }

    void export(Path out) {
        try {
            Catalogue.write(queue.all(), out);
            message("exported " + queue.all().size() + " rows to " + out);
        } catch (IOException e) {
            message("could not export to " + out + ": " + e.getMessage());
        }
    }

    private void chooseAndInstall() {
        FileDialog fd = new FileDialog(shell, SWT.OPEN);
        fd.setText("Install a bundle jar");
        fd.setFilterExtensions(new String[] {"*.jar"});
        String f = fd.open();
        if (f != null) {
            install(Path.of(f));
        }
    }

    /** Shows a one-line message in the strip at the bottom (problems in red). */
    void message(String text) {
        messages.add(text);
        messageBar.setText(text);
        boolean problem = text.contains("not") || text.contains("cannot") || text.contains("fail") || text.contains("could");
        messageBar.setForeground(problem ? palette.alarm : palette.good);
        messageBar.getParent().layout();
    }

    // ------------------------------------------------------------------ keyboard

    private void key(Event e) {
        if (shell.isDisposed() || display.getActiveShell() != shell && display.getActiveShell() != null) {
            return;
        }
        if (e.widget instanceof Text || e.widget instanceof Button
                || (e.widget instanceof Combo c && (c.getStyle() & SWT.READ_ONLY) == 0)) {
            return;
        }
        boolean handled = true;
        switch (e.keyCode) {
            case SWT.ARROW_RIGHT, SWT.PAGE_DOWN, ' ' -> move(1);
            case SWT.ARROW_LEFT, SWT.PAGE_UP -> move(-1);
            case SWT.CR, SWT.KEYPAD_CR -> {
                if (e.widget == lineChoice) {
                    setZFromLine();
                } else {
                    takeSelectedSolution();
                }
            }
            default -> handled = false;
        }
        if (!handled) {
            handled = true;
            switch (Character.toLowerCase(e.character)) {
                case 'u' -> nextUndecided();
                case 'x' -> decide(Verdict.NO_REDSHIFT, Double.NaN, "", "");
                case 's' -> regrade(PersonGrade.SECURE);
                case 'k' -> regrade(PersonGrade.LIKELY);
                case 't' -> regrade(PersonGrade.TENTATIVE);
                case '0' -> regrade(PersonGrade.NONE);
                case 'h' -> {
                    spectrumCanvas.home();
                    scoreCanvas.home();
                }
                default -> {
                    if (e.character >= '1' && e.character <= '9') {
                        selectSolution(e.character - '0');
                    } else {
                        handled = false;
                    }
                }
            }
        }
        if (handled) {
            e.doit = false;
            e.type = SWT.None;
        }
    }

    // ------------------------------------------------------------------ snapshot

    /** Saves what the window shows now as a PNG (the window's own pixels, via GC.copyArea). */
    void snapshot(Path png) throws IOException {
        shell.layout(true, true);
        while (display.readAndDispatch()) {
            // let pending paints happen
        }
        spectrumCanvas.update();
        scoreCanvas.update();
        org.eclipse.swt.graphics.Point size = shell.getSize();
        Image img = new Image(display, size.x, size.y);
        GC gc = new GC(shell);
        try {
            gc.copyArea(img, 0, 0);
        } finally {
            gc.dispose();
        }
        try {
            ImageData data = img.getImageData();
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] {data};
            Path parent = png.toAbsolutePath().getParent();
            if (parent != null) {
                java.nio.file.Files.createDirectories(parent);
            }
            loader.save(png.toString(), SWT.IMAGE_PNG);
        } finally {
            img.dispose();
        }
    }

    /** Opens the window at a size and shows the first spectrum. */
    void open(int width, int height) {
        shell.setSize(width, height);
        shell.open();
        queueTable.setFocus();
        showCurrent();
    }

    /** The item whose spectrum is on screen (or being read). */
    QueueItem shownItem() {
        return shown;
    }

    /** True while the item on screen is still being read or estimated. */
    boolean drawPending() {
        return shown != null && pending.contains(shown);
    }

    /** True while work is queued or running on the worker (tests wait for it). */
    boolean busy() {
        return !pending.isEmpty();
    }
}
