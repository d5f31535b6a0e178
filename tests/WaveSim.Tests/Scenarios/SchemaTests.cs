using System.Text.Json;
using System.Text.Json.Nodes;
using Json.Schema;
using WaveSim.Core.Lines;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Tests.Scenarios;

/// <summary>
/// The JSON Schema (draft 2020-12, json-schema.org) for editors, checked with JsonSchema.Net: every example scenario
/// validates, and the schema and the loader accept exactly the same keys.
/// </summary>
public class SchemaTests
{
    static readonly string Root = Repository.Root;

    static JsonNode SchemaNode() => JsonNode.Parse(File.ReadAllText(Path.Combine(Root, "scenarios", "scenario.schema.json")))!;

    static readonly Lazy<JsonSchema> Loaded = new(() => JsonSchema.FromText(File.ReadAllText(Path.Combine(Root, "scenarios", "scenario.schema.json"))));

    static JsonSchema Schema() => Loaded.Value;

    /// <summary>YAML to JSON as a YAML-aware editor sees it: plain scalars that read as numbers become numbers.</summary>
    static JsonNode? ToJson(YamlNode node) => node switch
    {
        YamlMappingNode m => new JsonObject(m.Children.Select(kv => KeyValuePair.Create(((YamlScalarNode)kv.Key).Value!, ToJson(kv.Value)))),
        YamlSequenceNode s => new JsonArray(s.Children.Select(ToJson).ToArray()),
        YamlScalarNode sc when sc.Style == YamlDotNet.Core.ScalarStyle.Plain && double.TryParse(sc.Value, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out double d) => JsonValue.Create(d),
        YamlScalarNode sc => JsonValue.Create(sc.Value),
        _ => null,
    };

    static JsonElement Element(JsonNode node) => JsonDocument.Parse(node.ToJsonString()).RootElement;

    static JsonNode YamlFile(string path)
    {
        var y = new YamlStream();
        y.Load(new StringReader(File.ReadAllText(path)));
        return ToJson(y.Documents[0].RootNode)!;
    }

    public static IEnumerable<object[]> Examples() =>
        Directory.GetFiles(Repository.PathOf("scenarios"), "*.yaml").Select(f => new object[] { Path.GetFileName(f) });

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_example_scenario_validates_against_the_schema_and_loads(string name)
    {
        string path = Path.Combine(Root, "scenarios", name);
        var result = Schema().Evaluate(Element(YamlFile(path)), new EvaluationOptions { OutputFormat = OutputFormat.List });
        Assert.True(result.IsValid, string.Join("; ", (result.Details ?? []).Where(d => d.Errors is not null).SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}"))));
        Assert.StartsWith("# yaml-language-server: $schema=scenario.schema.json", File.ReadAllText(path));
        ScenarioLoader.Load(path);
    }

    public static IEnumerable<object[]> CoupledExamples() =>
        Directory.GetFiles(Repository.PathOf("scenarios", "coupled"), "*.yaml").Select(f => new object[] { Path.GetFileName(f) });

    [Theory]
    [MemberData(nameof(CoupledExamples))]
    public void Every_coupled_example_validates_against_the_schema_and_loads(string name)
    {
        string path = Path.Combine(Root, "scenarios", "coupled", name);
        var result = Schema().Evaluate(Element(YamlFile(path)), new EvaluationOptions { OutputFormat = OutputFormat.List });
        Assert.True(result.IsValid, string.Join("; ", (result.Details ?? []).Where(d => d.Errors is not null).SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}"))));
        Assert.StartsWith("# yaml-language-server: $schema=../scenario.schema.json", File.ReadAllText(path));
        CoupledLoader.Load(path);
    }

    [Fact]
    public void The_schema_keeps_the_two_forms_apart_and_catches_coupled_mistakes()
    {
        string pair = Path.Combine(Root, "scenarios", "coupled", "crosstalk-pair.yaml");
        var mixed = YamlFile(pair);
        mixed["line"] = new JsonArray();
        Assert.False(Schema().Evaluate(Element(mixed)).IsValid);
        var typo = YamlFile(pair);
        typo["coupled"]![0]!["section"]!["lenght"] = "1 in";
        Assert.False(Schema().Evaluate(Element(typo)).IsValid);
        var unit = YamlFile(pair);
        unit["coupled"]![0]!["section"]!["l"]![0]![1] = "1.5 pF/in";
        Assert.False(Schema().Evaluate(Element(unit)).IsValid);
        var both = YamlFile(pair);
        both["near"]![0]!["r"] = "10 ohm";   // a source item has only 'at' and 'source'
        Assert.False(Schema().Evaluate(Element(both)).IsValid);
        var noMatrices = YamlFile(pair);
        noMatrices["coupled"]![0]!["section"]!.AsObject().Remove("c");
        Assert.False(Schema().Evaluate(Element(noMatrices)).IsValid);
    }

    [Fact]
    public void Schema_and_coupled_loader_accept_the_same_keys()
    {
        var defs = SchemaNode()["$defs"]!;
        var form = defs["coupledForm"]!;
        Assert.Equal(CoupledLoader.TopKeys.Order(), Keys(form));
        Assert.Equal(CoupledLoader.SectionKeys.Order(), Keys(defs["coupledSection"]));
        Assert.Equal(CoupledLoader.BranchKeys.Order(), Keys(defs["coupledBranch"]));
        Assert.Equal(CoupledLoader.ProbeKeys.Order(), Keys(form["properties"]!["probes"]!["items"]));
        Assert.Equal(ScenarioLoader.SourceKeys.Append("invert").Order(), Keys(defs["coupledSource"]));
    }

    [Fact]
    public void A_typo_in_a_key_fails_the_schema()
    {
        var doc = YamlFile(Path.Combine(Root, "scenarios", "clock-on-board.yaml"));
        doc["simulation"]!["duraton"] = "3 ns";
        Assert.False(Schema().Evaluate(Element(doc)).IsValid);
        var doc2 = YamlFile(Path.Combine(Root, "scenarios", "clock-on-board.yaml"));
        doc2["source"]!["rise"] = "500 pF";
        Assert.False(Schema().Evaluate(Element(doc2)).IsValid);
    }

    static string[] Keys(JsonNode? obj) => obj!["properties"]!.AsObject().Select(kv => kv.Key).Order().ToArray();

    [Fact]
    public void Schema_and_loader_accept_the_same_keys_everywhere()
    {
        var defs = SchemaNode()["$defs"]!;
        var s = defs["singleLine"]!;
        var item = defs["line"]!["items"]!["properties"]!;
        Assert.Equal(ScenarioLoader.TopKeys.Order(), Keys(s));
        Assert.Equal(ScenarioLoader.SourceKeys.Order(), Keys(s["properties"]!["source"]));
        Assert.Equal(ScenarioLoader.SegmentKeys.Order(), Keys(item["segment"]));
        Assert.Equal(ScenarioLoader.LumpedKeys.Order(), Keys(item["shunt"]));
        Assert.Equal(ScenarioLoader.LumpedKeys.Order(), Keys(item["series"]));
        Assert.Equal(ScenarioLoader.BranchKeys.Order(), Keys(item["branch"]));
        Assert.Equal(new[] { "branch", "segment", "series", "shunt" }, item.AsObject().Select(kv => kv.Key).Order());
        Assert.Equal(ScenarioLoader.LoadKeys.Order(), Keys(defs["load"]!["anyOf"]![1]));
        Assert.Equal(ScenarioLoader.ReceiverKeys.Order(), Keys(defs["load"]!["anyOf"]![1]!["properties"]!["receiver"]));
        Assert.Equal(ScenarioLoader.ProbeKeys.Order(), Keys(s["properties"]!["probes"]!["items"]));
        Assert.Equal(ScenarioLoader.SimulationKeys.Order(), Keys(s["properties"]!["simulation"]));
        Assert.Equal(SegmentLoss.Keys.Order(), Keys(item["segment"]!["properties"]!["loss"]!["anyOf"]![1]));
        var geometry = item["segment"]!["properties"]!["geometry"]!;
        Assert.Equal(CrossSectionCatalog.AllKeys.Select(k => k.Name).Append("kind").Order(), Keys(geometry));
        Assert.Equal(CrossSectionCatalog.Kinds.Select(k => k.Name).Order(), geometry["properties"]!["kind"]!["enum"]!.AsArray().Select(x => x!.GetValue<string>()).Order());
        Assert.Equal(Enum.GetNames<WaveformKind>().Select(n => n.ToLowerInvariant()).Order(),
            s["properties"]!["source"]!["properties"]!["waveform"]!["enum"]!.AsArray().Select(x => x!.GetValue<string>()).Order());
    }
}
