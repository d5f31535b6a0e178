using CsCheck;

namespace WaveSim.Tests.Properties;

/// <summary>
/// Random invalid scenarios (typos in keys, wrong units, garbage bytes, huge numbers): every one gets exit code 2 and exactly
/// one line on stderr starting "error: ", or (for garbage that happens to stay valid) a clean success; never a stack trace
/// (common practice, no source). Every run replays fixed seeds, one case per theory row (<see cref="PropertySeeds"/>);
/// WAVESIM_SOAK=N adds N fresh random cases per property.
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

    /// <summary>The cheap properties replay the shared seeds and 100 numbered ones each.</summary>
    public static TheoryData<string> Seeds => PropertySeeds.Rows(PropertySeeds.Numbered(100));

    static readonly Gen<(int Key, char Ch)> TypoGen = Gen.Select(Gen.Int[0, Keys.Length - 1], Gen.Char['a', 'z']);

    static bool Typo((int Key, char Ch) c)
    {
        string key = Keys[c.Key];
        int at = Base.IndexOf(key + ":", StringComparison.Ordinal);
        if (at < 0) return true;
        string text = Base[..at] + key + c.Ch + Base[(at + key.Length)..];
        var r = Check(text);
        return Report(OneLineError(r), text, r);
    }

    static readonly Gen<(int From, int To, int Nth)> UnitGen = Gen.Select(Gen.Int[0, Units.Length - 1], Gen.Int[0, Units.Length - 1], Gen.Int[0, 20]);

    static bool WrongUnit((int From, int To, int Nth) c)
    {
        // A delay may be given per length or for the whole segment, so ns/m ↔ ns or ps stays valid.
        string[] delays = ["ps", "ns", "ns/m"];
        if (Units[c.From] == Units[c.To] || (delays.Contains(Units[c.From]) && delays.Contains(Units[c.To]))) return true;
        string pattern = " " + Units[c.From];
        int at = -1;
        for (int i = 0, start = 0; i <= c.Nth; i++)
        {
            int next = Base.IndexOf(pattern + ",", start, StringComparison.Ordinal);
            if (next < 0) next = Base.IndexOf(pattern + " ", start, StringComparison.Ordinal);
            if (next < 0) break;
            at = next; start = next + 1;
        }
        if (at < 0) return true;
        string text = Base[..at] + " " + Units[c.To] + Base[(at + pattern.Length)..];
        var r = Check(text);
        return Report(OneLineError(r), text, r);
    }

    static readonly Gen<(int Pos, char[] Junk, bool Huge)> GarbageGen = Gen.Select(Gen.Int[0, Base.Length - 1], Gen.Char.Array[1, 8], Gen.Bool);

    static bool Garbage((int Pos, char[] Junk, bool Huge) c)
    {
        string text = c.Huge
            ? Base[..c.Pos] + System.Text.RegularExpressions.Regex.Replace(Base[c.Pos..], @"\d+(\.\d+)?", "1e300", System.Text.RegularExpressions.RegexOptions.None, TimeSpan.FromSeconds(1))
            : Base[..c.Pos] + new string(c.Junk) + Base[c.Pos..];
        var r = Check(text);
        return Report(r.Code == 0 ? r.Err.Length == 0 || r.Err.StartsWith("warning", StringComparison.Ordinal) : OneLineError(r), text, r);
    }

    [Theory]
    [MemberData(nameof(Seeds))]
    public void A_typo_in_any_key_is_a_one_line_error(string seed) => Assert.True(Typo(PropertySeeds.Replay(TypoGen, seed)), seed);

    [Theory]
    [MemberData(nameof(Seeds))]
    public void A_wrong_unit_is_a_one_line_error(string seed) => Assert.True(WrongUnit(PropertySeeds.Replay(UnitGen, seed)), seed);

    [Theory]
    [MemberData(nameof(Seeds))]
    public void Garbage_bytes_or_huge_numbers_never_crash(string seed) => Assert.True(Garbage(PropertySeeds.Replay(GarbageGen, seed)), seed);

    [SkippableFact]
    public void Soak_fresh_typos() => PropertySeeds.Explore(TypoGen, Typo);

    [SkippableFact]
    public void Soak_fresh_wrong_units() => PropertySeeds.Explore(UnitGen, WrongUnit);

    [SkippableFact]
    public void Soak_fresh_garbage() => PropertySeeds.Explore(GarbageGen, Garbage);
}
