using System.Text;
using System.Text.RegularExpressions;

namespace WaveSim.Tests.Fuzz;

/// <summary>One generated input: the family it belongs to, what was done, and the files it consists of.</summary>
internal sealed record Mutant(string Family, int Seed, string What, string Scenario, string? Capture = null, byte[]? Table = null)
{
    /// <summary>The mutant as a failure message shows it: family, seed, what was done and the start of each text.</summary>
    public override string ToString()
    {
        static string Head(string s) => s.Length <= 600 ? s : s[..600] + $"… ({s.Length} chars)";
        var sb = new StringBuilder($"family {Family}, seed {Seed}: {What}\n--- scenario ---\n{Head(Scenario)}");
        if (Capture is not null) sb.Append($"\n--- capture ---\n{Head(Capture)}");
        if (Table is not null) sb.Append($"\n--- table ({Table.Length} bytes) ---");
        return sb.ToString();
    }
}

/// <summary>
/// Mutants of the example scenarios and of a capture, by family (issue 14): wrong types, extreme numbers, unit mistakes,
/// non-ASCII digits, YAML aliases and complex keys, deep nesting, odd names, sizes, waveform tables and captures. Each mutant
/// comes from a seed alone (System.Random), so a failure is replayed from the family and seed it prints.
/// </summary>
internal static partial class InputMutants
{
    /// <summary>The scenario families, then the capture family; <see cref="Make"/> takes any of them.</summary>
    public static readonly string[] ScenarioFamilies = ["types", "extremes", "units", "digits", "aliases", "nesting", "names", "sizes", "tables"];

    /// <summary>The capture family (mutants of a capture compared against <see cref="CaptureScenario"/>).</summary>
    public const string CaptureFamily = "captures";

    /// <summary>A small, fast scenario whose probe "rx" the capture mutants are compared with.</summary>
    public const string CaptureScenario = """
        title: fuzz capture target
        source: { waveform: step, low: 0 V, high: 1 V, rise: 200 ps, resistance: 25 ohm }
        line:
          - segment: { length: 50 mm, z0: 50 ohm, delay: 6 ns/m }
        load: { r: 100 ohm }
        probes: [ { name: rx, at: load } ]
        simulation: { duration: 3 ns, resolution: 10 }

        """;

    static readonly Lazy<string[]> Examples = new(() =>
        Directory.GetFiles(Repository.PathOf("scenarios"), "*.yaml").Order(StringComparer.Ordinal).Select(File.ReadAllText).ToArray());

    // key: value pairs in block or flow style; the value stops at a flow delimiter, a comment or the line end.
    [GeneratedRegex(@"(?<key>\b[a-z_0-9]+):[ ]+(?<val>[^,{}\[\]\n#]*[^,{}\[\]\n# ])")]
    private static partial Regex KeyValue();

    [GeneratedRegex(@"-?[0-9]+(\.[0-9]+)?(e-?[0-9]+)?")]
    private static partial Regex Number();

    [GeneratedRegex(@"(?<=[0-9] ?)(?<unit>[A-Za-zµΩ/]+)")]
    private static partial Regex Unit();

    /// <summary>The mutant of <paramref name="family"/> made from <paramref name="seed"/>.</summary>
    public static Mutant Make(string family, int seed)
    {
        var r = new Random(seed);
        string baseText = Examples.Value[r.Next(Examples.Value.Length)];
        (string what, string text, string? capture, byte[]? table) = family switch
        {
            "types" => Types(r, baseText),
            "extremes" => Extremes(r, baseText),
            "units" => Units(r, baseText),
            "digits" => Digits(r, baseText),
            "aliases" => Aliases(r, baseText),
            "nesting" => Nesting(r, baseText),
            "names" => Names(r, baseText),
            "sizes" => Sizes(r, baseText),
            "tables" => Tables(r),
            CaptureFamily => Captures(r),
            _ => throw new ArgumentException($"unknown family {family}", nameof(family)),
        };
        return new Mutant(family, seed, what, text, capture, table);
    }

    static (string, string, string?, byte[]?) Done(string what, string text) => (what, text, null, null);

    /// <summary>Replaces one random value (<paramref name="pick"/> chooses among them) by <paramref name="with"/>.</summary>
    static (string Key, string Text) ReplaceValue(Random r, string text, Func<string, string> with, Func<Match, bool>? pick = null)
    {
        var matches = KeyValue().Matches(text).Where(m => pick?.Invoke(m) ?? true).ToArray();
        if (matches.Length == 0) return ("(none)", text);
        var m = matches[r.Next(matches.Length)];
        var v = m.Groups["val"];
        return (m.Groups["key"].Value, text[..v.Index] + with(v.Value) + text[(v.Index + v.Length)..]);
    }

    static T Pick<T>(Random r, params T[] choices) => choices[r.Next(choices.Length)];

    static (string, string, string?, byte[]?) Types(Random r, string text)
    {
        string replacement = Pick(r, "[1, 2]", "{ a: 1 }", "true", "~", "\"\"", "[]", "{}", "- x", "!!binary aGVsbG8=", "!!int 3", "? x");
        var (key, t) = ReplaceValue(r, text, _ => replacement);
        return Done($"value of '{key}' replaced by {replacement}", t);
    }

    static (string, string, string?, byte[]?) Extremes(Random r, string text)
    {
        string number = Pick(r, "1e308", "1e-308", "-0", "NaN", "nan", ".nan", "Infinity", "-1e308", "1e400", "4.9e-324", "-1e-320",
            "0", "0x1F", "1_000", "9999999999999999999999", "1e+308", "+.inf", "-.inf", "1.7976931348623157e308");
        var (key, t) = ReplaceValue(r, text, v => Number().Replace(v, number, 1), m => Number().IsMatch(m.Groups["val"].Value));
        return Done($"number in '{key}' replaced by {number}", t);
    }

    static (string, string, string?, byte[]?) Units(Random r, string text)
    {
        string unit = Pick(r, "", "ohm", "V", "ns", "m", "F", "H", "ps/in", "ns/kg", "Ω", "µs", "us", "kV", "mohm", "MOhm", "pF/m",
            "c", "%", "Hz", "GHz", "s/s", "V/V", "meter", "ohms", "nH/mm", "fs", "mil", "in", "ft", "dB");
        var (key, t) = ReplaceValue(r, text, v => Unit().IsMatch(v) ? Unit().Replace(v, unit, 1) : v + " " + unit,
            m => Number().IsMatch(m.Groups["val"].Value));
        return Done($"unit in '{key}' replaced by '{unit}'", t);
    }

    static (string, string, string?, byte[]?) Digits(Random r, string text)
    {
        // Arabic-Indic, extended Arabic-Indic, Devanagari, full-width digits; superscripts; a full-width point and minus.
        int[] zeros = [0x0660, 0x06F0, 0x0966, 0xFF10];
        int zero = zeros[r.Next(zeros.Length)];
        string Swap(string v) => string.Concat(v.Select(ch => ch is >= '0' and <= '9' && r.Next(2) == 0
            ? ((char)(zero + ch - '0')).ToString()
            : ch == '.' && r.Next(4) == 0 ? "．" : ch == '-' && r.Next(2) == 0 ? "−" : ch == '2' && r.Next(5) == 0 ? "²" : ch.ToString()));
        var (key, t) = ReplaceValue(r, text, v => "\"" + Swap(v) + "\"", m => Number().IsMatch(m.Groups["val"].Value));
        return Done($"digits in '{key}' replaced by look-alikes from U+{zero:X4}", t);
    }

    static (string, string, string?, byte[]?) Aliases(Random r, string text)
    {
        int kind = r.Next(8);
        string t = kind switch
        {
            0 => "anchors: &a { c: 1 pF }\n" + text,                                              // an unknown key holding an anchor
            1 => text.Replace("load:", "load: &a", StringComparison.Ordinal) + "\nextra: *a\n",
            2 => "? [a, b]\n: 1\n" + text,                                                        // a complex key
            3 => "? *x\n: 1\n" + text,                                                            // an alias key before its anchor
            4 => text.Replace("line:", "line: &l", StringComparison.Ordinal).Replace("load:", "load: *l", StringComparison.Ordinal),
            5 => text + "\n<<: { title: merged }\n",                                              // a merge key
            6 => "x: &a [ *a ]\n" + text,                                                         // an alias inside its own anchor
            _ => BillionLaughs(r.Next(3, 12)) + text,                                             // aliases of aliases
        };
        return Done($"alias/anchor shape {kind}", t);
    }

    static string BillionLaughs(int levels)
    {
        var sb = new StringBuilder("l0: &l0 [x, x, x, x, x, x, x, x, x, x]\n");
        for (int i = 1; i < levels; i++)
            sb.Append($"l{i}: &l{i} [{string.Join(", ", Enumerable.Repeat($"*l{i - 1}", 10))}]\n");
        return sb.ToString();
    }

    static (string, string, string?, byte[]?) Nesting(Random r, string text)
    {
        int depth = Pick(r, 10, 63, 64, 65, 100, 1000, 100_000);
        int kind = r.Next(3);
        string deep = kind switch
        {
            0 => new string('[', depth) + new string(']', depth),
            1 => string.Concat(Enumerable.Repeat("{a: ", depth)) + "1" + new string('}', depth),
            _ => "\n" + string.Concat(Enumerable.Range(1, Math.Min(depth, 5000)).Select(i => new string(' ', 2 * i) + "- ")) + "x",
        };
        var (key, t) = ReplaceValue(r, text, _ => deep);
        return Done($"value of '{key}' nested {depth} deep (shape {kind})", t);
    }

    static (string, string, string?, byte[]?) Names(Random r, string text)
    {
        string name = Pick(r, "\"rx\\n\"", "\"a\\u001b[31mred\\u001b[0m\"", "\"\\u202eevil\"", "\"tab\\there\"", "\"nul\\0\"",
            "\"" + new string('n', 100_000) + "\"", "\"../../etc/passwd\"", "\"con\"", "\"a/b\"", "\"\\u0007bell\"", "\"é\"", "\"\"",
            "\"\\u009b31m\"", "\"line\\r\\nbreak\"", "'" + new string('x', 5000) + "'");
        int where = r.Next(3);
        string t = where switch
        {
            0 => Regex.Replace(text, @"(?m)^title: .*$", "title: " + name.Replace("$", "$$", StringComparison.Ordinal)),
            1 => ReplaceValue(r, text, _ => name, m => m.Groups["key"].Value == "name").Text,
            _ => ReplaceValue(r, text, _ => name, m => m.Groups["key"].Value is "at" or "waveform" or "pattern").Text,
        };
        return Done($"name/title/text (place {where}) replaced by {Truncate(name)}", t);
    }

    static (string, string, string?, byte[]?) Sizes(Random r, string text)
    {
        int kind = r.Next(5);
        switch (kind)
        {
            case 0:
            case 1:
            {
                // Many line items, up to and just past the loader's limit.
                int items = Pick(r, 10, 500, 1999, 2000, 2001, 5000);
                var sb = new StringBuilder("title: many\nsource: { waveform: step, high: 1 V, rise: 1 ns }\nline:\n");
                for (int i = 0; i < items; i++)
                    sb.Append(i % 2 == 0 ? "  - segment: { length: 1 mm, z0: 50 ohm, delay: 6 ns/m }\n" : "  - shunt: { c: 1 fF }\n");
                sb.Append("load: open\nsimulation: { duration: 1 ns, resolution: 2 }\n");
                return Done($"{items} line items", sb.ToString());
            }
            case 2:
                return Done("a 1 MB title", Regex.Replace(text, @"(?m)^title: .*$", "title: " + new string('t', 1 << 20)));
            case 3:
            {
                string pattern = new(Enumerable.Range(0, Pick(r, 1000, 100_000, 2_000_000)).Select(_ => r.Next(2) == 0 ? '0' : '1').ToArray());
                string t = Regex.Replace(text, @"(?ms)^source:.*?(?=^line:)",
                    $"source: {{ waveform: bits, high: 1 V, rise: 100 ps, bit_time: 1 ns, pattern: \"{pattern}\" }}\n");
                return Done($"a bit pattern of {pattern.Length} bits", t);
            }
            default:
                return Done("a 17 MiB comment (past the scenario size limit)", text + "# " + new string('c', 17 << 20) + "\n");
        }
    }

    static (string, string, string?, byte[]?) Tables(Random r)
    {
        int kind = r.Next(7);
        byte[] table = kind switch
        {
            0 => Encoding.UTF8.GetBytes("time_s,volts_V\n0,0\n1e-9,1\n2e-9,1\n"),
            1 => [0, 0, 0, 0, 0, 0, 0, 0],
            2 => RandomBytes(r, 4096),
            3 => Encoding.UTF8.GetBytes("root:$6$saltsalt$" + new string('h', 86) + ":19000:0:99999:7:::\nbin:*:19000:0:99999:7:::\n"),
            4 => Encoding.UTF8.GetBytes("0," + new string('9', 2 << 20) + "\n"),
            5 => Encoding.UTF8.GetBytes("0,0\n1e-9,\u001b[31m1\n"),
            _ => Encoding.UTF8.GetBytes(string.Concat(Enumerable.Range(0, 200_000).Select(i => $"{i}e-12,{i % 2}\n"))),
        };
        // kind 1 points the table at /dev/zero itself where it exists.
        string file = kind == 1 && File.Exists("/dev/zero") ? "/dev/zero" : "table.csv";
        string scenario = CaptureScenario.Replace("source: { waveform: step, low: 0 V, high: 1 V, rise: 200 ps, resistance: 25 ohm }",
            $"source: {{ waveform: table, high: 1 V, file: {file}, resistance: 25 ohm }}", StringComparison.Ordinal);
        return ($"waveform table kind {kind} ({file})", scenario, null, table);
    }

    static (string, string, string?, byte[]?) Captures(Random r)
    {
        var sb = new StringBuilder();
        int kind = r.Next(12);
        string Rows(int n, char d, double scale = 1) =>
            string.Concat(Enumerable.Range(0, n).Select(i => $"{(i * 10e-12).ToString("R", System.Globalization.CultureInfo.InvariantCulture)}{d}{(i > n / 3 ? scale : 0).ToString("R", System.Globalization.CultureInfo.InvariantCulture)}\n"));
        string capture = kind switch
        {
            0 => "t,v\n" + Rows(3, ',') + Rows(200, ';').Replace("\n0;", "\n9e-9;", StringComparison.Ordinal),   // comma rows, then semicolon ones
            1 => "t;v\n" + Rows(2, ',') + Rows(200, ';'),                                                       // a few comma rows before semicolon ones
            2 => "t,v\n" + Rows(200, ',', 1e308),
            3 => "",
            4 => Encoding.Latin1.GetString(RandomBytes(r, 2000)),
            5 => "t,v\n" + Rows(100, ',') + "1e-6," + new string('1', 3 << 20) + "\n",
            6 => "t\tv\n" + Rows(200, '\t').Replace("\n", "\r\n", StringComparison.Ordinal),
            7 => "\ufefft,v\n" + Rows(200, ','),
            8 => "t,v\n" + Rows(200, ',').Replace("1", "١", StringComparison.Ordinal),
            9 => "\"t\",\"v\"\n" + string.Concat(Rows(200, ',').Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(l => "\"" + l.Replace(",", "\",\"", StringComparison.Ordinal) + "\"\n")),
            10 => string.Join(",", Enumerable.Range(0, 5000).Select(i => $"c{i}\u001b")) + "\n" + Rows(200, ','),
            _ => "t,v\n" + Rows(200, ',').Replace("\n", "\nnan,nan\n", StringComparison.Ordinal),
        };
        return ($"capture kind {kind}", CaptureScenario, capture, null);
    }

    static byte[] RandomBytes(Random r, int n)
    {
        var b = new byte[n];
        r.NextBytes(b);
        return b;
    }

    static string Truncate(string s) => s.Length <= 40 ? s : s[..40] + $"… ({s.Length} chars)";
}
