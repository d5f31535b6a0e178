using CsCheck;

namespace WaveSim.Tests.Properties;

/// <summary>
/// Random invalid scenarios (typos in keys, wrong units, garbage bytes, huge numbers): every one gets exit code 2 and exactly
/// one line on stderr starting "error: ", or (for garbage that happens to stay valid) a clean success; never a stack trace
/// (common practice, no source).
/// </summary>
public class InvalidScenarioProperties
{
    const string Base = @"title: base
source: { waveform: pulse, low: 0 V, high: 3.3 V, rise: 200 ps, width: 1 ns, delay: 0.2 ns, resistance: 25 ohm }
line:
  - segment: { length: 50 mm, z0: 50 ohm, delay: 6 ns/m, r: 2 ohm/m }
  - shunt: { c: 1 pF }
  - series: { r: 10 ohm, l: 1 nH }
  - segment: { length: 20 mm, l: 300 nH/m, c: 120 pF/m }
load: { r: 100 ohm, c: 2 pF, receiver: { vih: 2 V, vil: 0.8 V } }
probes: [ { name: a, at: source }, { name: b, at: 30 mm }, { name: c, at: load } ]
simulation: { duration: 5 ns, output_step: 10 ps, resolution: 10 }
";

    static readonly string[] Keys = ["title", "source", "waveform", "low", "high", "rise", "width", "delay", "resistance", "line", "segment",
        "length", "z0", "r", "shunt", "c", "series", "l", "load", "receiver", "vih", "vil", "probes", "name", "at", "simulation", "duration", "output_step", "resolution"];

    static readonly string[] Units = ["V", "ps", "ns", "ohm", "mm", "ns/m", "ohm/m", "pF", "nH", "nH/m", "pF/m"];

    static (int Code, string Err) Check(string yaml)
    {
        using var cli = new CliRunner();
        string dir = cli.Dir;
        var (code, _, err) = CliRunner.Run("check", cli.Write("m.yaml", yaml));
        return (code, err);
    }

    static bool Report(bool ok, string text, (int Code, string Err) r)
    {
        if (!ok) throw new Xunit.Sdk.XunitException($"exit {r.Code}, stderr: {r.Err}\n--- scenario ---\n{text}");
        return true;
    }

    static bool OneLineError((int Code, string Err) r) =>
        r.Code == 2 && r.Err.StartsWith("error: ", StringComparison.Ordinal) && r.Err.TrimEnd('\n', '\r').Split('\n').Length == 1
        && !r.Err.Contains("   at ", StringComparison.Ordinal);

    [Fact]
    public void A_typo_in_any_key_is_a_one_line_error()
    {
        Gen.Select(Gen.Int[0, Keys.Length - 1], Gen.Char['a', 'z']).Sample((k, ch) =>
        {
            string key = Keys[k];
            int at = Base.IndexOf(key + ":", StringComparison.Ordinal);
            if (at < 0) return true;
            string text = Base[..at] + key + ch + Base[(at + key.Length)..];
            var r = Check(text);
            return Report(OneLineError(r), text, r);
        }, iter: RandomScenarioProperties.Iter(300), seed: RandomScenarioProperties.Seed);
    }

    [Fact]
    public void A_wrong_unit_is_a_one_line_error()
    {
        Gen.Select(Gen.Int[0, Units.Length - 1], Gen.Int[0, Units.Length - 1], Gen.Int[0, 20]).Sample((from, to, nth) =>
        {
            // A delay may be given per length or for the whole segment, so ns/m ↔ ns or ps stays valid.
            string[] delays = ["ps", "ns", "ns/m"];
            if (Units[from] == Units[to] || (delays.Contains(Units[from]) && delays.Contains(Units[to]))) return true;
            string pattern = " " + Units[from];
            int at = -1;
            for (int i = 0, start = 0; i <= nth; i++)
            {
                int next = Base.IndexOf(pattern + ",", start, StringComparison.Ordinal);
                if (next < 0) next = Base.IndexOf(pattern + " ", start, StringComparison.Ordinal);
                if (next < 0) break;
                at = next; start = next + 1;
            }
            if (at < 0) return true;
            string text = Base[..at] + " " + Units[to] + Base[(at + pattern.Length)..];
            var r = Check(text);
            return Report(OneLineError(r), text, r);
        }, iter: RandomScenarioProperties.Iter(300), seed: RandomScenarioProperties.Seed);
    }

    [Fact]
    public void Garbage_bytes_or_huge_numbers_never_crash()
    {
        Gen.Select(Gen.Int[0, Base.Length - 1], Gen.Char.Array[1, 8], Gen.Bool).Sample((pos, junk, huge) =>
        {
            string text = huge
                ? Base[..pos] + System.Text.RegularExpressions.Regex.Replace(Base[pos..], @"\d+(\.\d+)?", "1e300", System.Text.RegularExpressions.RegexOptions.None, TimeSpan.FromSeconds(1))
                : Base[..pos] + new string(junk) + Base[pos..];
            var r = Check(text);
            return Report(r.Code == 0 ? r.Err.Length == 0 || r.Err.StartsWith("warning", StringComparison.Ordinal) : OneLineError(r), text, r);
        }, iter: RandomScenarioProperties.Iter(1000), seed: RandomScenarioProperties.Seed);
    }
}
