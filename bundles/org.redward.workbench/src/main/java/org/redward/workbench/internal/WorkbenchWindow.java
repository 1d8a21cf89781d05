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
import org.eclipse.swt.layout.RowData;
import org.eclipse.swt.layout.RowLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
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
 * <p>Everything here runs on the SWT UI thread; reading runs on a reader thread and estimating on
 * an estimator thread, and their results come back through {@link Display#asyncExec}. The charts
 * of spectra read ahead are drawn on those threads too, before they are shown.
 */
final class WorkbenchWindow {

    /** The keyboard, shown in the help strip. */
    static final String KEYS = "→/Space next · ← back · U next undecided · Enter take selected solution · 1-9 pick solution"
            + " · click spectrum, then choose a line and press Set z · X no redshift · S/K/T/0 grade · H full view · Y sky";

    private final Display display;
    private final Backend backend;
    private final Journal journal;
    private final List<String> estimatorIds;
    private final WorkQueue queue = new WorkQueue();
    private final Palette palette;
    private final Shell shell;
    /** Reads spectra and draws charts ahead. */
    private final ExecutorService reader = daemon("workbench-reader");
    /** Runs the estimators (apart from the reader, so that a slow estimator never delays showing a spectrum). */
    private final ExecutorService estimator = daemon("workbench-estimator");
    private final Map<QueueItem, Backend.Loaded> cache = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<QueueItem, Backend.Loaded> e) {
            return size() > 24;
        }
    };
    private final Map<QueueItem, Ready> ready = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<QueueItem, Ready> e) {
            return size() > 6;
        }
    };
    private final List<String> messages = new ArrayList<>();
    private List<RestLine> restLines;
    private boolean showSky = true;
    private Button skyToggle;
    private TabFolder panels;

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
        shell.addListener(SWT.Dispose, e -> {
            reader.shutdownNow();
            estimator.shutdownNow();
        });
        display.addFilter(SWT.KeyDown, keyFilter);
        shell.addListener(SWT.Dispose, e -> display.removeFilter(SWT.KeyDown, keyFilter));
    }

    private static ExecutorService daemon(String name) {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, name);
            t.setDaemon(true);
            t.setPriority(Thread.NORM_PRIORITY - 1);
            return t;
        });
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
        // one row that wraps onto a second when the window is narrow (nothing is cut off)
        RowLayout tl = new RowLayout(SWT.HORIZONTAL);
        tl.wrap = true;
        tl.center = true;
        tl.marginHeight = 3;
        tl.spacing = 6;
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
        disagreementFilter.setLayoutData(new RowData(60, SWT.DEFAULT));
        disagreementFilter.setMessage("km/s");
        disagreementFilter.addListener(SWT.DefaultSelection, e -> applyFilter());
        label(top, "km/s");
        undecidedOnly = new Button(top, SWT.CHECK);
        undecidedOnly.setText("undecided only");
        undecidedOnly.setBackground(palette.panel);
        undecidedOnly.addListener(SWT.Selection, e -> applyFilter());
        skyToggle = new Button(top, SWT.CHECK);
        skyToggle.setText("sky (Y)");
        skyToggle.setToolTipText("draw the sky spectrum under the object, on its own axis, when the file has one");
        skyToggle.setSelection(showSky);
        skyToggle.setBackground(palette.panel);
        skyToggle.addListener(SWT.Selection, e -> showSky(skyToggle.getSelection()));
        counts = label(top, "");

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
        panels = tabs;
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
        // the bundles panel is filled once the window is up (listing services can start them)
        display.asyncExec(() -> {
            if (!shell.isDisposed()) {
                refreshBundles();
            }
        });
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
        shell.layout(new Control[] {counts}); // the top bar may now need one row more or fewer
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

    /**
     * Shows the current item. A spectrum read ahead shows at once (its charts were drawn ahead
     * off the UI thread when the canvas size has not changed); otherwise the reader reads it and
     * it shows as soon as it is read, before any estimator has answered: the score view says
     * "estimating" and fills in when the answers come. Never reads or estimates on the UI thread.
     */
    void showCurrent() {
        QueueItem it = queue.current();
        shown = it;
        spectrumShownAt = 0;
        scoresShownAt = 0;
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
        Ready r = ready.remove(it);
        if (l != null) {
            boolean fresh = r != null && r.sky() == showSky && sameZ(r.z(), it.currentZ());
            drawSpectrum(it, l, fresh ? r.spectrum() : null);
            if (answered(it)) {
                drawScores(it, fresh ? r.score() : null, false);
            } else {
                scoreCanvas.setChart(null, "estimating…");
                estimateInBackground(it);
            }
        } else if (!it.problem().isEmpty()) {
            drawProblem(it);
        } else {
            headline.setText(it.id() + " · reading…");
            spectrumCanvas.setChart(null, "reading " + it.source().getFileName() + " …");
            scoreCanvas.setChart(null, "");
            loadInBackground(it, true);
        }
        prefetch();
    }

    private static boolean sameZ(double a, double b) {
        return Double.compare(a, b) == 0;
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
                if (!ready.containsKey(next) && next.problem().isEmpty()) {
                    loadInBackground(next, false);
                }
            }
        }
    }

    /** Charts drawn ahead for an item read ahead: used once, when it is shown at the same z and sky setting. */
    record Ready(ChartCanvas.Prepared spectrum, ChartCanvas.Prepared score, double z, boolean sky) {
    }

    private final java.util.Set<QueueItem> pending = java.util.concurrent.ConcurrentHashMap.newKeySet();
    private final java.util.Set<QueueItem> estimating = java.util.concurrent.ConcurrentHashMap.newKeySet();

    private List<String> missingAnswers(QueueItem it) {
        List<String> missing = new ArrayList<>();
        for (String id : estimatorIds) {
            if (!it.answers().containsKey(id)) {
                missing.add(id);
            }
        }
        return missing;
    }

    /**
     * Reads an item on the reader thread and draws its spectrum chart there at the canvas size,
     * then hands it over at once (shown if it is the current item, else kept for when it is);
     * missing answers are then estimated on the estimator thread, which draws the score chart
     * (and, for an item read ahead, the spectrum again at the estimated z) and hands them over in
     * turn. A slow estimator never keeps a spectrum from being shown.
     */
    private void loadInBackground(QueueItem it, boolean showWhenDone) {
        if (!pending.add(it)) {
            return;
        }
        Backend.Loaded known = cache.get(it);
        List<String> missing = missingAnswers(it);
        Map<String, MachineAnswer> answersNow = new LinkedHashMap<>(it.answers());
        Decision decision = it.decision();
        List<RestLine> lines = restLines();
        boolean sky = showSky;
        org.eclipse.swt.graphics.Point ss = spectrumCanvas.getSize();
        org.eclipse.swt.graphics.Point cs = scoreCanvas.getSize();
        boolean estimate = !missing.isEmpty() && estimating.add(it);
        reader.submit(() -> {
            Backend.Loaded l = known;
            double z0 = zOf(decision, answersNow);
            Ready r;
            try {
                if (l == null) {
                    l = backend.load(it);
                }
                r = new Ready(prepareSpectrum(l, lines, z0, sky, ss), missing.isEmpty() ? prepareScores(answersNow, z0, cs) : null, z0, sky);
            } catch (IOException | RuntimeException e) {
                String why = e.getMessage() == null ? e.toString() : e.getMessage();
                handOver(() -> loadFailed(it, why));
                return;
            }
            Backend.Loaded loaded = l;
            handOver(() -> arrived(it, loaded, r));
            if (estimate) {
                estimator.submit(() -> estimateAndHandOver(it, loaded, missing, answersNow, decision, !showWhenDone ? lines : null, sky, ss, cs));
            }
        });
    }

    /** Estimates the shown item (already read) on the estimator thread; the score view fills in when done. */
    private void estimateInBackground(QueueItem it) {
        Backend.Loaded l = cache.get(it);
        if (l == null || !estimating.add(it)) {
            return;
        }
        List<String> missing = missingAnswers(it);
        Map<String, MachineAnswer> answersNow = new LinkedHashMap<>(it.answers());
        Decision decision = it.decision();
        org.eclipse.swt.graphics.Point cs = scoreCanvas.getSize();
        estimator.submit(() -> estimateAndHandOver(it, l, missing, answersNow, decision, null, showSky, null, cs));
    }

    /**
     * Runs on the estimator thread: the missing answers, the score chart drawn at the canvas size
     * and, when {@code lines} is given, the spectrum chart again at the estimated z; then hands
     * them over.
     */
    private void estimateAndHandOver(QueueItem it, Backend.Loaded l, List<String> missing, Map<String, MachineAnswer> answersNow,
            Decision decision, List<RestLine> lines, boolean sky, org.eclipse.swt.graphics.Point ss, org.eclipse.swt.graphics.Point cs) {
        Map<String, MachineAnswer> answers = estimate(l, missing);
        Map<String, MachineAnswer> all = new LinkedHashMap<>(answersNow);
        all.putAll(answers);
        double z = zOf(decision, all);
        Ready r = null;
        try {
            r = new Ready(lines == null ? null : prepareSpectrum(l, lines, z, sky, ss), prepareScores(all, z, cs), z, sky);
        } catch (RuntimeException e) {
            // drawn on the UI thread when shown
        }
        Ready drawn = r;
        handOver(() -> estimated(it, answers, drawn));
    }

    /** The answers of an item have come (UI thread). */
    private void estimated(QueueItem it, Map<String, MachineAnswer> answers, Ready drawn) {
        estimating.remove(it);
        it.answers().putAll(answers);
        refreshRow(it);
        if (shown == it) {
            double z = it.currentZ();
            if (!sameZ(z, shownZ)) {
                preview(z);
            }
            drawScores(it, drawn != null && sameZ(drawn.z(), z) ? drawn.score() : null, true);
        } else if (drawn != null && drawn.spectrum() != null) {
            ready.put(it, drawn);
        }
    }

    private Map<String, MachineAnswer> estimate(Backend.Loaded l, List<String> ids) {
        Map<String, MachineAnswer> answers = new LinkedHashMap<>();
        for (String id : ids) {
            try {
                answers.put(id, backend.estimate(id, l.spectrum()));
            } catch (RuntimeException e) {
                answers.put(id, MachineAnswer.failed(id, "estimator '" + id + "' failed: " + e));
            }
        }
        return answers;
    }

    /** The z an item would show with these answers: the decision's, else the first answer's best. */
    private static double zOf(Decision d, Map<String, MachineAnswer> answers) {
        if (d != null) {
            return d.z();
        }
        MachineAnswer a = answers.isEmpty() ? null : answers.values().iterator().next();
        return a != null && a.ok() ? a.z() : Double.NaN;
    }

    /** Runs on the UI thread later, unless the window has gone. */
    private void handOver(Runnable r) {
        if (display.isDisposed()) {
            return;
        }
        display.asyncExec(() -> {
            if (!shell.isDisposed()) {
                r.run();
            }
        });
    }

    private void loadFailed(QueueItem it, String why) {
        pending.remove(it);
        estimating.remove(it);
        it.problem(why);
        message(why);
        refreshRow(it);
        if (shown == it) {
            drawProblem(it);
        }
    }

    /** An item has been read (UI thread): kept, and shown if it is the current one. */
    private void arrived(QueueItem it, Backend.Loaded loaded, Ready ahead) {
        pending.remove(it);
        cache.put(it, loaded);
        if (loaded.spectrum().metadata().objectId().isPresent()) {
            it.id(loaded.spectrum().metadata().objectId().get());
        }
        refreshRow(it);
        if (ahead != null) {
            ready.put(it, ahead);
        }
        if (shown == it) {
            showCurrent();
        }
    }

    private void refreshRow(QueueItem it) {
        int row = queue.view().indexOf(it);
        if (row >= 0) {
            queueTable.clear(row);
        }
    }

    private static ChartCanvas.Prepared prepareSpectrum(Backend.Loaded l, List<RestLine> lines, double z, boolean sky,
            org.eclipse.swt.graphics.Point size) {
        JFreeChart c = spectrumChart(l, lines, z, sky);
        return size.x > 0 && size.y > 0 ? ChartCanvas.prepare(c, size.x, size.y) : new ChartCanvas.Prepared(c, null, null, 0);
    }

    private static ChartCanvas.Prepared prepareScores(Map<String, MachineAnswer> answers, double z, org.eclipse.swt.graphics.Point size) {
        JFreeChart c = scoreChart(answers, z);
        return size.x > 0 && size.y > 0 ? ChartCanvas.prepare(c, size.x, size.y) : new ChartCanvas.Prepared(c, null, null, 0);
    }

    private static JFreeChart spectrumChart(Backend.Loaded l, List<RestLine> lines, double z, boolean sky) {
        Spectrum s = l.spectrum();
        SpectrumChart sc = SpectrumChart.of(s).restLines(lines, z).foundLines(l.found());
        if (sky && l.skyFlux() != null) {
            sc.sky(s.axis().vacuumAngstrom(), l.skyFlux());
        }
        return sc.build();
    }

    private static JFreeChart scoreChart(Map<String, MachineAnswer> answers, double z) {
        ScoreChart score = ScoreChart.create().current(z);
        for (MachineAnswer a : answers.values()) {
            if (a.curve() != null) {
                double[] alts = a.alternatives().stream().mapToDouble(Double::doubleValue).toArray();
                score.curve(a.estimator(), a.curve().z(), a.curve().score(), a.curve().scoreName(), a.curve().lowerIsBetter(), alts);
            }
        }
        return score.build();
    }

    /** The rest-frame lines to draw and name (asked once; again after a bundle is installed). */
    private List<RestLine> restLines() {
        if (restLines == null) {
            restLines = List.copyOf(backend.lines());
        }
        return restLines;
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
        drawSpectrum(it, l, null);
        drawScores(it, null, false);
        return (System.nanoTime() - t0) / 1e6;
    }

    /** Shows the spectrum of a loaded item (drawn ahead, or drawn now) and paints it at once. */
    private void drawSpectrum(QueueItem it, Backend.Loaded l, ChartCanvas.Prepared ahead) {
        shownLoaded = l;
        double z = it.currentZ();
        shownZ = z;
        shownFound = l.found();
        if (ahead != null && ahead.pixels() != null) {
            spectrumCanvas.setChart(ahead);
        } else {
            spectrumCanvas.setChart(ahead != null ? ahead.chart() : spectrumChart(l, restLines(), z, showSky), "");
        }
        headline.setText(headlineText(it, l));
        fillSolutions(it);
        showDecision(it);
        refreshPhysics(z);
        picked.setText("Click a feature in the spectrum.");
        lineChoice.removeAll();
        spectrumCanvas.update();
        spectrumShownAt = System.nanoTime();
    }

    /**
     * Shows the score curves of the item's answers (drawn ahead, or drawn now); with
     * {@code refreshText} also the headline and the solutions (when the answers came after the spectrum).
     */
    private void drawScores(QueueItem it, ChartCanvas.Prepared ahead, boolean refreshText) {
        if (ahead != null && ahead.pixels() != null) {
            scoreCanvas.setChart(ahead);
        } else {
            scoreCanvas.setChart(ahead != null ? ahead.chart() : scoreChart(it.answers(), shownZ), "");
        }
        if (refreshText) {
            if (shownLoaded != null) {
                headline.setText(headlineText(it, shownLoaded));
            }
            fillSolutions(it);
        }
        scoreCanvas.update();
        scoresShownAt = System.nanoTime();
    }

    /**
     * Draws the sky spectrum under the object's (on its own axis, in the lower part of the plot)
     * or hides it; keeps the current zoom.
     */
    void showSky(boolean on) {
        showSky = on;
        if (!skyToggle.isDisposed() && skyToggle.getSelection() != on) {
            skyToggle.setSelection(on);
        }
        ready.clear();
        QueueItem it = shown;
        JFreeChart old = spectrumCanvas.chart();
        if (it == null || shownLoaded == null || old == null) {
            return;
        }
        if (on && shownLoaded.skyFlux() == null) {
            message(it.id() + ": the file has no sky spectrum");
        }
        org.jfree.data.Range x = old.getXYPlot().getDomainAxis().getRange();
        org.jfree.data.Range y = old.getXYPlot().getRangeAxis().getRange();
        boolean zoomed = spectrumCanvas.zoomed();
        JFreeChart c = spectrumChart(shownLoaded, restLines(), shownZ, on);
        spectrumCanvas.setChart(c, "");
        if (zoomed) {
            c.getXYPlot().getDomainAxis().setRange(x);
            c.getXYPlot().getRangeAxis().setRange(y);
        }
        if (Double.isFinite(pickedAngstrom)) {
            markPicked(pickedAngstrom);
        }
        spectrumCanvas.markDirty();
    }

    /** True if the sky spectrum is drawn (when the file has one). */
    boolean skyShown() {
        return showSky;
    }

    /** When the spectrum now shown was painted (System.nanoTime), 0 while it is not. */
    long spectrumShownAt() {
        return spectrumShownAt;
    }

    /** When the score curves now shown were painted (System.nanoTime), 0 while they are not. */
    long scoresShownAt() {
        return scoresShownAt;
    }

    private long spectrumShownAt;
    private long scoresShownAt;

    private String headlineText(QueueItem it, Backend.Loaded l) {
        StringBuilder b = new StringBuilder(it.id());
        b.append("  ·  ").append(it.source().getFileName());
        if (it.index() > 0) {
            b.append(" #").append(it.index());
        }
        MachineAnswer a = it.primary();
        if (a != null && a.ok()) {
            b.append(String.format(Locale.ROOT, "  ·  %s z = %.5f%s, %s%s", a.estimator(), a.z(),
                    Double.isFinite(a.zError()) ? String.format(Locale.ROOT, " ± %.5f", a.zError()) : "", a.objectClass(),
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
        SpectrumChart.placeRestLines(c, restLines(), z);
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
        List<RestLine> lines = new ArrayList<>(restLines());
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
        markPicked(angstrom);
        picked.getParent().layout();
    }

    /** Marks the picked wavelength in the spectrum (one marker; the previous one goes). */
    private void markPicked(double angstrom) {
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
        restLines = null;
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

    /**
     * Installs a bundle jar and shows the Bundles panel with its services; a failure is a message
     * in the window, nothing else changes.
     */
    void install(Path jar) {
        try {
            List<String> before = backend.estimators();
            message(backend.install(jar));
            for (String id : backend.estimators()) {
                if (!before.contains(id)) {
                    message("estimator '" + id + "' is now installed (see Bundles); compare it with --estimators " + id
                            + (estimatorIds.isEmpty() ? "" : "," + estimatorIds.get(0)));
                }
            }
        } catch (IOException | RuntimeException e) {
            message("bundle " + jar.getFileName() + " was not installed: " + e.getMessage());
        }
        refreshBundles();
        if (!panels.isDisposed()) {
            panels.setSelection(1);
        }
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
                case 'y' -> showSky(!showSky);
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
        return shown != null && (pending.contains(shown) || estimating.contains(shown));
    }

    /** True while work is queued or running on the reader or estimator (tests wait for it). */
    boolean busy() {
        return !pending.isEmpty() || !estimating.isEmpty();
    }
}
