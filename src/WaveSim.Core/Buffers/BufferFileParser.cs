using System.Globalization;
using System.Text.RegularExpressions;

namespace WaveSim.Core.Buffers;

/// <summary>
/// The reader's work: splits the text into keyword sections (keywords case-insensitive, a space and an underscore alike),
/// strips comments, then reads the sections in order with the component and model they belong to.
/// </summary>
internal sealed partial class BufferFileParser(string text, string source)
{
    /// <summary>A keyword, the rest of its line and the non-blank lines up to the next keyword (comments removed).</summary>
    sealed record Section(string Name, string Display, int Line, string Argument, List<(int Line, string Text)> Body);

    /// <summary>The characters the standard allows as a comment character (from memory of its [Comment Char] rule).</summary>
    const string CommentChars = "!\"#$%&'()*,:;<>?@\\^`{|}~";

    static readonly string[] HeaderText = ["file rev", "date", "source", "notes", "disclaimer", "copyright"];
    static readonly string[] ModelKeywords =
    [
        "voltage range", "pullup reference", "pulldown reference", "gnd clamp reference", "power clamp reference",
        "pulldown", "pullup", "gnd clamp", "power clamp", "ramp", "rising waveform", "falling waveform",
    ];

    readonly List<string> _warnings = [];
    readonly List<BufferComponent> _components = [];
    readonly List<BufferModel> _models = [];
    readonly List<string> _selectors = [];
    string? _version;
    string? _fileName;
    ComponentDraft? _component;
    ModelDraft? _model;
    Section? _skipping; // a [Submodel] or similar whose model keywords must not land in the model before it

    public BufferFile Run()
    {
        if (text.Contains('\0', StringComparison.Ordinal)) throw new InputException($"{source}: is not a text file (it holds NUL bytes)");
        List<Section> sections = Split(out int lastLine);
        if (sections.Count == 0 || sections[0].Name != "ibis ver")
            throw Fail(sections.Count == 0 ? lastLine : sections[0].Line, sections.Count == 0 ? "[IBIS Ver]" : sections[0].Display,
                       "the file must start with [IBIS Ver] (is this a buffer model file?)");
        bool ended = false;
        foreach (Section s in sections)
        {
            if (s.Name == "end") { CloseModel(); CloseComponent(); ended = true; break; }
            Read(s);
        }
        if (!ended) throw Fail(lastLine, "[End]", "the file has no [End]; expected it as the last keyword (is the file cut short?)");
        if (_components.Count == 0) throw new InputException($"{source}: no [Component]; a buffer model file needs at least one");
        if (_models.Count == 0) throw new InputException($"{source}: no [Model]; a buffer model file needs at least one");
        CheckPins();
        return new BufferFile(source, _version!, _fileName, _components, _models, _selectors, _warnings);
    }

    // ---- splitting ----

    [GeneratedRegex(@"\A\s*\[\s*comment[\s_]+char\s*\]\s*(\S*)", RegexOptions.IgnoreCase)]
    private static partial Regex CommentCharLine();

    List<Section> Split(out int lastLine)
    {
        var sections = new List<Section>();
        char comment = '|';
        string[] lines = text.Split('\n');
        lastLine = Math.Max(1, lines.Length);
        Section? current = null;
        bool afterEnd = false;
        for (int i = 0; i < lines.Length; i++)
        {
            int no = i + 1;
            string raw = lines[i].TrimEnd('\r');
            Match cc = CommentCharLine().Match(raw);
            if (cc.Success && !afterEnd)
            {
                // Read before comments are stripped: the line names the comment character itself.
                string arg = cc.Groups[1].Value;
                if (arg.Length != 6 || !CommentChars.Contains(arg[0], StringComparison.Ordinal) || !arg.EndsWith("_char", StringComparison.OrdinalIgnoreCase))
                    throw Fail(no, "[Comment Char]", $"expected a character from {CommentChars} followed by _char, e.g. '#_char', got '{arg}'");
                comment = arg[0];
                current = null;
                continue;
            }
            int c = raw.IndexOf(comment, StringComparison.Ordinal);
            string line = (c >= 0 ? raw[..c] : raw).Trim();
            if (line.Length == 0) continue;
            if (afterEnd)
            {
                _warnings.Add($"{source}:{no}: text after [End] is ignored");
                break;
            }
            if (line[0] == '[')
            {
                int close = line.IndexOf(']', StringComparison.Ordinal);
                if (close < 0) throw Fail(no, line, "a keyword opens with '[' but has no closing ']'");
                string display = "[" + line[1..close].Trim() + "]";
                current = new Section(Normalize(line[1..close]), display, no, line[(close + 1)..].Trim(), []);
                sections.Add(current);
                if (current.Name == "end") afterEnd = true;
                continue;
            }
            if (current is null) throw Fail(no, "[IBIS Ver]", $"text '{Clip(line)}' before the first keyword; expected [IBIS Ver]");
            current.Body.Add((no, line));
        }
        return sections;
    }

    static string Normalize(string keyword) =>
        string.Join(' ', keyword.Replace('_', ' ').Split(' ', StringSplitOptions.RemoveEmptyEntries)).ToLowerInvariant();

    // ---- sections ----

    void Read(Section s)
    {
        if (s.Name is "model" or "component" or "model selector" or "submodel" or "end") _skipping = null;
        if (_skipping is not null && ModelKeywords.Contains(s.Name))
        {
            // A [Submodel] holds its own tables; they are not the preceding model's.
            NoteSkipped(s, $"belongs to {_skipping.Display} {_skipping.Argument} (line {_skipping.Line}), which this version does not read");
            return;
        }
        switch (s.Name)
        {
            case "ibis ver":
                if (_version is not null) throw Fail(s.Line, s.Display, "appears twice; expected it once, first in the file");
                if (!double.TryParse(s.Argument, NumberStyles.Float, CultureInfo.InvariantCulture, out _))
                    throw Fail(s.Line, s.Display, $"expected a version number such as 5.0, got '{s.Argument}'");
                _version = s.Argument;
                NoBody(s);
                break;
            case "file name":
                _fileName = s.Argument;
                if (s.Argument.Length > 0 && !string.Equals(s.Argument, Path.GetFileName(source), StringComparison.OrdinalIgnoreCase))
                    _warnings.Add($"{source}:{s.Line}: [File Name]: '{s.Argument}' differs from the file's own name '{Path.GetFileName(source)}'");
                break;
            case var h when HeaderText.Contains(h):
                break; // free text; nothing in it is used
            case "component":
                CloseModel();
                CloseComponent();
                if (s.Argument.Length == 0) throw Fail(s.Line, s.Display, "expected the component's name after the keyword");
                _component = new ComponentDraft(s.Argument, s.Line);
                NoBody(s);
                break;
            case "manufacturer":
                Component(s).Manufacturer = s.Argument;
                break;
            case "package":
                ReadPackage(s, Component(s));
                break;
            case "pin":
                ReadPins(s, Component(s));
                break;
            case "model":
                CloseModel();
                CloseComponent();
                if (s.Argument.Length == 0) throw Fail(s.Line, s.Display, "expected the model's name after the keyword");
                if (_models.Any(m => string.Equals(m.Name, s.Argument, StringComparison.OrdinalIgnoreCase)))
                    throw Fail(s.Line, s.Display, $"model '{s.Argument}' is defined twice (first on line {_models.First(m => string.Equals(m.Name, s.Argument, StringComparison.OrdinalIgnoreCase)).Line})");
                _model = new ModelDraft(s.Argument, s.Line);
                ReadModelBody(s, _model);
                break;
            case "model selector":
                CloseModel();
                CloseComponent();
                if (s.Argument.Length > 0) _selectors.Add(s.Argument);
                NoteSkipped(s, "model selection is not read by this version; a pin naming it is listed without a model");
                break;
            case "submodel":
                CloseModel();
                CloseComponent();
                _skipping = s;
                NoteSkipped(s, "sub-models are not read by this version; its tables are skipped too");
                break;
            case var m when ModelKeywords.Contains(m):
                ReadModelKeyword(s, Model(s));
                break;
            default:
                NoteSkipped(s, "not read by this version");
                break;
        }
    }

    void NoteSkipped(Section s, string why) =>
        _warnings.Add($"{source}:{s.Line}: {s.Display}: skipped up to the next keyword; {why}");

    void NoBody(Section s)
    {
        if (s.Body.Count > 0)
            throw Fail(s.Body[0].Line, s.Display, $"unexpected text '{Clip(s.Body[0].Text)}'; expected the next keyword");
    }

    ComponentDraft Component(Section s)
    {
        if (_model is not null)
            throw Fail(s.Line, s.Display, $"belongs to a [Component], but follows [Model] {_model.Name} (line {_model.Line}); components come before models");
        return _component ?? throw Fail(s.Line, s.Display, "appears outside a [Component]; expected [Component] NAME before it");
    }

    ModelDraft Model(Section s) =>
        _model ?? throw Fail(s.Line, s.Display, "appears outside a [Model]; expected [Model] NAME before it");

    void CloseComponent()
    {
        if (_component is null) return;
        _components.Add(new BufferComponent(_component.Name, _component.Manufacturer, _component.Package, _component.Pins, _component.Line));
        _component = null;
    }

    // ---- component ----

    void ReadPackage(Section s, ComponentDraft c)
    {
        CornerValue? r = null, l = null, cap = null;
        foreach (var (line, body) in s.Body)
        {
            var (name, values) = SubParameter(body);
            switch (name.ToLowerInvariant())
            {
                case "r_pkg": r = Triple(line, s.Display, name, values, nonNegative: true); break;
                case "l_pkg": l = Triple(line, s.Display, name, values, nonNegative: true); break;
                case "c_pkg": cap = Triple(line, s.Display, name, values, nonNegative: true); break;
                default: _warnings.Add($"{source}:{line}: {s.Display}: sub-parameter '{name}' is not read by this version; skipped"); break;
            }
        }
        string? missing = r is null ? "R_pkg" : l is null ? "L_pkg" : cap is null ? "C_pkg" : null;
        if (missing is not null) throw Fail(s.Line, s.Display, $"{missing} is missing; expected R_pkg, L_pkg and C_pkg, each with typ, min and max");
        c.Package = new PackageParasitics(r!.Value, l!.Value, cap!.Value);
    }

    void ReadPins(Section s, ComponentDraft c)
    {
        string[] header = Tokens(s.Argument);
        bool withParasitics = header.Length >= 5;
        int full = withParasitics ? 6 : 3;
        foreach (var (line, body) in s.Body)
        {
            string[] t = Tokens(body);
            if (t.Length != 3 && t.Length != full)
                throw Fail(line, s.Display, withParasitics
                    ? $"a row needs 3 columns (pin, signal, model) or 6 (with R_pin, L_pin, C_pin), got {t.Length}: '{Clip(body)}'"
                    : $"a row needs 3 columns (pin, signal, model), got {t.Length}: '{Clip(body)}'");
            double? R(int k) => t.Length > k ? NumberOrNa(line, s.Display, header.Length > k - 1 ? header[k - 1] : "value", t[k], nonNegative: true) : null;
            if (c.Pins.FirstOrDefault(p => p.Name == t[0]) is { } dup)
                throw Fail(line, s.Display, $"pin '{t[0]}' is listed twice (first on line {dup.Line})");
            c.Pins.Add(new BufferPin(t[0], t[1], t[2], R(3), R(4), R(5), line));
        }
        if (c.Pins.Count == 0) throw Fail(s.Line, s.Display, "has no rows; expected one row per pin: pin, signal, model");
    }

    void CheckPins()
    {
        foreach (BufferComponent c in _components)
            foreach (BufferPin p in c.Pins)
            {
                if (p.IsReserved || _models.Any(m => string.Equals(m.Name, p.Model, StringComparison.OrdinalIgnoreCase))) continue;
                if (_selectors.Any(m => string.Equals(m, p.Model, StringComparison.OrdinalIgnoreCase))) continue;
                throw Fail(p.Line, "[Pin]", $"pin {p.Name}: model '{p.Model}' is not a [Model] of the file; its models are " +
                                            string.Join(", ", _models.Select(m => m.Name)) + " (or POWER, GND, NC)");
            }
    }

    // ---- model ----

    static readonly Dictionary<string, BufferModelType> Types = new(StringComparer.OrdinalIgnoreCase)
    {
        ["Input"] = BufferModelType.Input, ["Output"] = BufferModelType.Output, ["I/O"] = BufferModelType.InputOutput,
        ["3-state"] = BufferModelType.ThreeState, ["Open_drain"] = BufferModelType.OpenDrain,
    };

    void ReadModelBody(Section s, ModelDraft m)
    {
        string display = $"[Model] {m.Name}";
        foreach (var (line, body) in s.Body)
        {
            var (name, values) = SubParameter(body);
            string key = name.ToLowerInvariant();
            switch (key)
            {
                case "model_type":
                    string type = One(line, display, name, values);
                    if (!Types.TryGetValue(type, out var t))
                        throw Fail(line, display, $"Model_type '{type}' is not read by this version; expected {string.Join(", ", Types.Keys)}");
                    m.Type = t;
                    break;
                case "polarity": m.Polarity = One(line, display, name, values); break;
                case "enable": m.Enable = One(line, display, name, values); break;
                case "vinl": m.Vinl = Number(line, display, name, One(line, display, name, values)); break;
                case "vinh": m.Vinh = Number(line, display, name, One(line, display, name, values)); break;
                case "vmeas": m.Vmeas = Number(line, display, name, One(line, display, name, values)); break;
                case "vref": m.Vref = Number(line, display, name, One(line, display, name, values)); break;
                case "cref": m.Cref = NonNegative(line, display, name, Number(line, display, name, One(line, display, name, values))); break;
                case "rref": m.Rref = Positive(line, display, name, Number(line, display, name, One(line, display, name, values))); break;
                case "c_comp":
                    if (m.CComp is not null) throw Fail(line, display, "C_comp is given twice");
                    m.CComp = Triple(line, display, name, values, nonNegative: true);
                    break;
                default:
                    _warnings.Add($"{source}:{line}: {display}: sub-parameter '{name}' is not read by this version; skipped");
                    break;
            }
        }
    }

    void ReadModelKeyword(Section s, ModelDraft m)
    {
        string display = $"[Model] {m.Name}: {s.Display}";
        switch (s.Name)
        {
            case "voltage range": m.VoltageRange = Once(m.VoltageRange, s, display, ArgumentTriple(s, display)); break;
            case "pullup reference": m.PullupReference = Once(m.PullupReference, s, display, ArgumentTriple(s, display)); break;
            case "pulldown reference": m.PulldownReference = Once(m.PulldownReference, s, display, ArgumentTriple(s, display)); break;
            case "gnd clamp reference": m.GndClampReference = Once(m.GndClampReference, s, display, ArgumentTriple(s, display)); break;
            case "power clamp reference": m.PowerClampReference = Once(m.PowerClampReference, s, display, ArgumentTriple(s, display)); break;
            case "pulldown": m.Pulldown = Once(m.Pulldown, s, display, IvTable(s, display)); break;
            case "pullup": m.Pullup = Once(m.Pullup, s, display, IvTable(s, display)); break;
            case "gnd clamp": m.GndClamp = Once(m.GndClamp, s, display, IvTable(s, display)); break;
            case "power clamp": m.PowerClamp = Once(m.PowerClamp, s, display, IvTable(s, display)); break;
            case "ramp": m.Ramp = Once(m.Ramp, s, display, ReadRamp(s, display)); break;
            case "rising waveform": m.Rising.Add(ReadWaveform(s, display, rising: true)); break;
            default: m.Falling.Add(ReadWaveform(s, display, rising: false)); break;
        }
    }

    CornerValue Once(CornerValue? existing, Section s, string display, CornerValue value) =>
        existing is null ? value : throw Fail(s.Line, display, "is given twice in one model");

    T Once<T>(T? existing, Section s, string display, T value) where T : class =>
        existing is null ? value : throw Fail(s.Line, display, "is given twice in one model");

    CornerValue ArgumentTriple(Section s, string display)
    {
        NoBody(s);
        return Triple(s.Line, display, "the value", Tokens(s.Argument), nonNegative: false);
    }

    CornerTable IvTable(Section s, string display)
    {
        if (s.Argument.Length > 0) throw Fail(s.Line, display, $"unexpected '{Clip(s.Argument)}' after the keyword; the rows go on the lines below");
        var rows = new List<TableRow>();
        foreach (var (line, body) in s.Body) rows.Add(Row(line, display, body, "voltage", "I", rows));
        return Table(s, display, rows);
    }

    CornerTable Table(Section s, string display, List<TableRow> rows)
    {
        if (rows.Count < 2) throw Fail(s.Line, display, $"has {rows.Count} row(s); expected at least two");
        return new CornerTable(s.Display, s.Line, rows);
    }

    TableRow Row(int line, string display, string body, string xName, string yName, List<TableRow> previous)
    {
        string[] t = Tokens(body);
        if (t.Length != 4)
            throw Fail(line, display, $"a row needs 4 columns ({xName}, {yName}(typ), {yName}(min), {yName}(max); NA allowed for min and max), got {t.Length}: '{Clip(body)}'");
        double x = Number(line, display, xName, t[0]);
        double typ = Number(line, display, $"{yName}(typ)", t[1]);
        var row = new TableRow(x, new CornerValue(typ, NumberOrNa(line, display, $"{yName}(min)", t[2]), NumberOrNa(line, display, $"{yName}(max)", t[3])), line);
        if (previous.Count > 0 && !(x > previous[^1].X))
            throw Fail(line, display, $"{xName} {t[0]} does not exceed the previous row's ({Format(previous[^1].X)}, line {previous[^1].Line}); rows must be in increasing {xName}");
        return row;
    }

    BufferRamp ReadRamp(Section s, string display)
    {
        RampRate? rise = null, fall = null;
        double rLoad = 50;
        foreach (var (line, body) in s.Body)
        {
            var (name, values) = SubParameter(body);
            switch (name.ToLowerInvariant())
            {
                case "dv/dt_r": rise = Ratio(line, display, name, values); break;
                case "dv/dt_f": fall = Ratio(line, display, name, values); break;
                case "r_load": rLoad = Positive(line, display, name, Number(line, display, name, One(line, display, name, values))); break;
                default: _warnings.Add($"{source}:{line}: {display}: sub-parameter '{name}' is not read by this version; skipped"); break;
            }
        }
        if (rise is null || fall is null)
            throw Fail(s.Line, display, $"{(rise is null ? "dV/dt_r" : "dV/dt_f")} is missing; expected dV/dt_r and dV/dt_f, each as typ, min and max ratios such as 1.2/0.5n");
        return new BufferRamp(rise, fall, rLoad, s.Line);
    }

    RampRate Ratio(int line, string display, string name, string[] values)
    {
        if (values.Length != 3)
            throw Fail(line, display, $"{name} needs 3 ratios (typ, min, max; NA allowed for min and max), got {values.Length}");
        var dv = new double?[3];
        var dt = new double?[3];
        for (int k = 0; k < 3; k++)
        {
            if (k > 0 && BufferNumber.IsNa(values[k])) continue;
            string[] parts = values[k].Split('/');
            if (parts.Length != 2 || !BufferNumber.TryParse(parts[0], out double v) || !BufferNumber.TryParse(parts[1], out double t))
                throw Fail(line, display, $"{name}: '{values[k]}' is not a ratio dV/dt such as 1.2/0.5n (the 20-80 % swing over its time)");
            if (!(v > 0) || !(t > 0))
                throw Fail(line, display, $"{name}: '{values[k]}' needs a positive swing and a positive time");
            (dv[k], dt[k]) = (v, t);
        }
        return new RampRate(new CornerValue(dv[0]!.Value, dv[1], dv[2]), new CornerValue(dt[0]!.Value, dt[1], dt[2]));
    }

    SwitchingWaveform ReadWaveform(Section s, string display, bool rising)
    {
        if (s.Argument.Length > 0) throw Fail(s.Line, display, $"unexpected '{Clip(s.Argument)}' after the keyword; the fixture and rows go on the lines below");
        double? rFix = null, vFix = null, vMin = null, vMax = null;
        double cFix = 0;
        var rows = new List<TableRow>();
        foreach (var (line, body) in s.Body)
        {
            string first = Tokens(body)[0];
            if (char.IsAsciiDigit(first[0]) || first[0] is '-' or '+' or '.')
            {
                rows.Add(Row(line, display, body, "time", "V", rows));
                continue;
            }
            if (rows.Count > 0) throw Fail(line, display, $"'{Clip(body)}' after the rows; the fixture sub-parameters come before the table");
            var (name, values) = SubParameter(body);
            string key = name.ToLowerInvariant();
            switch (key)
            {
                case "r_fixture": rFix = Positive(line, display, name, Number(line, display, name, One(line, display, name, values))); break;
                case "v_fixture": vFix = Number(line, display, name, One(line, display, name, values)); break;
                case "v_fixture_min": vMin = Number(line, display, name, One(line, display, name, values)); break;
                case "v_fixture_max": vMax = Number(line, display, name, One(line, display, name, values)); break;
                case "c_fixture": cFix = NonNegative(line, display, name, Number(line, display, name, One(line, display, name, values))); break;
                case "l_fixture" or "r_dut" or "l_dut" or "c_dut":
                    double extra = Number(line, display, name, One(line, display, name, values));
                    if (extra != 0) _warnings.Add($"{source}:{line}: {display}: {name} = {values[0]} is not used; the fixture is taken as R_fixture to V_fixture with C_fixture");
                    break;
                default: _warnings.Add($"{source}:{line}: {display}: sub-parameter '{name}' is not read by this version; skipped"); break;
            }
        }
        if (rFix is null) throw Fail(s.Line, display, "R_fixture is missing; expected R_fixture = value before the table");
        if (vFix is null) throw Fail(s.Line, display, "V_fixture is missing; expected V_fixture = value before the table");
        return new SwitchingWaveform(rising, rFix.Value, new CornerValue(vFix.Value, vMin, vMax), cFix, Table(s, display, rows), s.Line);
    }

    void CloseModel()
    {
        if (_model is not { } m) return;
        _model = null;
        string display = $"[Model] {m.Name}";
        if (m.Type is not { } type) throw Fail(m.Line, display, $"Model_type is missing; expected one of {string.Join(", ", Types.Keys)}");
        if (m.CComp is not { } cComp) throw Fail(m.Line, display, "C_comp is missing; expected C_comp with typ, min and max");
        bool pushPull = type is BufferModelType.Output or BufferModelType.InputOutput or BufferModelType.ThreeState;
        if (pushPull && m.Pullup is null) throw Fail(m.Line, display, $"a Model_type {Name(type)} needs [Pullup]; none is given");
        if (type != BufferModelType.Input && m.Pulldown is null) throw Fail(m.Line, display, $"a Model_type {Name(type)} needs [Pulldown]; none is given");
        if (type != BufferModelType.Input && m.Ramp is null) throw Fail(m.Line, display, $"a Model_type {Name(type)} needs [Ramp]; none is given");
        if (type == BufferModelType.OpenDrain && m.Pullup is not null)
            _warnings.Add($"{source}:{m.Pullup.Line}: {display}: [Pullup] of an Open_drain model is not used");
        if (type == BufferModelType.Input)
            foreach (var (t, name) in new (object? T, string Name)[] { (m.Pullup, "[Pullup]"), (m.Pulldown, "[Pulldown]"), (m.Ramp, "[Ramp]") })
                if (t is not null) _warnings.Add($"{source}:{m.Line}: {display}: {name} of an Input model is not used");
        if (m.Pullup is not null && m.VoltageRange is null && m.PullupReference is null)
            throw Fail(m.Line, display, "[Pullup] needs [Voltage Range] or [Pullup Reference]; neither is given");
        if (m.PowerClamp is not null && m.VoltageRange is null && m.PowerClampReference is null)
            throw Fail(m.Line, display, "[POWER Clamp] needs [Voltage Range] or [POWER Clamp Reference]; neither is given");
        _models.Add(new BufferModel
        {
            Source = source, Name = m.Name, Type = type, Line = m.Line, CComp = cComp, Polarity = m.Polarity, Enable = m.Enable,
            Vinl = m.Vinl, Vinh = m.Vinh, Vmeas = m.Vmeas, Vref = m.Vref, Cref = m.Cref, Rref = m.Rref,
            VoltageRange = m.VoltageRange, PullupReference = m.PullupReference, PulldownReference = m.PulldownReference,
            GndClampReference = m.GndClampReference, PowerClampReference = m.PowerClampReference,
            Pulldown = m.Pulldown, Pullup = m.Pullup, GndClamp = m.GndClamp, PowerClamp = m.PowerClamp, Ramp = m.Ramp,
            RisingWaveforms = m.Rising, FallingWaveforms = m.Falling,
        });
    }

    static string Name(BufferModelType t) => Types.First(p => p.Value == t).Key;

    // ---- values ----

    static string[] Tokens(string s) => s.Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries);

    /// <summary>"Name = value", "Name value" or "Name v1 v2 v3".</summary>
    static (string Name, string[] Values) SubParameter(string body)
    {
        int eq = body.IndexOf('=', StringComparison.Ordinal);
        if (eq > 0) return (body[..eq].Trim(), Tokens(body[(eq + 1)..]));
        string[] t = Tokens(body);
        return (t[0], t[1..]);
    }

    string One(int line, string display, string name, string[] values)
    {
        if (values.Length != 1) throw Fail(line, display, $"{name} needs one value, got {values.Length}");
        return values[0];
    }

    CornerValue Triple(int line, string display, string name, string[] values, bool nonNegative)
    {
        if (values.Length != 3)
            throw Fail(line, display, $"{name} needs 3 values (typ, min, max; NA allowed for min and max), got {values.Length}");
        double typ = Number(line, display, $"{name} (typ)", values[0]);
        if (nonNegative) NonNegative(line, display, name, typ);
        return new CornerValue(typ, NumberOrNa(line, display, $"{name} (min)", values[1], nonNegative), NumberOrNa(line, display, $"{name} (max)", values[2], nonNegative));
    }

    double Number(int line, string display, string what, string token)
    {
        if (BufferNumber.IsNa(token)) throw Fail(line, display, $"{what} cannot be NA; expected a number");
        if (!BufferNumber.TryParse(token, out double v))
            throw Fail(line, display, $"{what}: '{Clip(token)}' is not a number (a number, an optional scale T G M k m u n p f and unit letters, e.g. 3.3V or 10pF)");
        return v;
    }

    double? NumberOrNa(int line, string display, string what, string token, bool nonNegative = false)
    {
        if (BufferNumber.IsNa(token)) return null;
        double v = Number(line, display, what, token);
        return nonNegative ? NonNegative(line, display, what, v) : v;
    }

    double NonNegative(int line, string display, string what, double v) =>
        v >= 0 ? v : throw Fail(line, display, $"{what} must not be negative, got {Format(v)}");

    double Positive(int line, string display, string what, double v) =>
        v > 0 ? v : throw Fail(line, display, $"{what} must be positive, got {Format(v)}");

    static string Format(double v) => v.ToString("G6", CultureInfo.InvariantCulture);

    static string Clip(string s) => s.Length <= 60 ? s : s[..57] + "...";

    InputException Fail(int line, string keyword, string message) => new($"{source}:{line}: {keyword}: {message}");

    sealed class ComponentDraft(string name, int line)
    {
        public string Name { get; } = name;
        public int Line { get; } = line;
        public string? Manufacturer { get; set; }
        public PackageParasitics? Package { get; set; }
        public List<BufferPin> Pins { get; } = [];
    }

    sealed class ModelDraft(string name, int line)
    {
        public string Name { get; } = name;
        public int Line { get; } = line;
        public BufferModelType? Type { get; set; }
        public CornerValue? CComp { get; set; }
        public string? Polarity { get; set; }
        public string? Enable { get; set; }
        public double? Vinl { get; set; }
        public double? Vinh { get; set; }
        public double? Vmeas { get; set; }
        public double? Vref { get; set; }
        public double? Cref { get; set; }
        public double? Rref { get; set; }
        public CornerValue? VoltageRange { get; set; }
        public CornerValue? PullupReference { get; set; }
        public CornerValue? PulldownReference { get; set; }
        public CornerValue? GndClampReference { get; set; }
        public CornerValue? PowerClampReference { get; set; }
        public CornerTable? Pulldown { get; set; }
        public CornerTable? Pullup { get; set; }
        public CornerTable? GndClamp { get; set; }
        public CornerTable? PowerClamp { get; set; }
        public BufferRamp? Ramp { get; set; }
        public List<SwitchingWaveform> Rising { get; } = [];
        public List<SwitchingWaveform> Falling { get; } = [];
    }
}
