using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>Turns a scenario and its grid plan into a <see cref="Network"/>: segments between junctions, lumped branches on them.</summary>
internal static class NetworkBuilder
{
    public static Network Build(Scenario scenario, GridPlan plan)
    {
        var net = new Network();
        int planIndex = 0;
        int source = AddJunction(net, "source", 0);
        if (scenario.Source.Buffer is { } buffer) AddDriver(net, scenario, buffer, source);
        else
            net.SourceBranch = AddBranch(net, new LumpedBranch
            {
                Role = BranchRole.Source, Label = "driver", A = -1, B = source, R = scenario.Source.Resistance, DrivenA = true,
            });
        BuildLine(net, scenario, plan, ref planIndex, scenario.Line, scenario.Load, source, "", "");
        return net;
    }

    /// <summary>
    /// A buffer driver at the line's start (the pin): at the die pad its switching law (<see cref="DriverLaw"/>) and C_comp to
    /// ground; R_pkg + L_pkg from the pad to the pin (the source branch, whose current the source probe reads) and C_pkg from
    /// the pin to ground, written as a branch from ground into the pin so the probe subtracts it: the pin's current into the line.
    /// </summary>
    static void AddDriver(Network net, Scenario scenario, Model.BufferSpec buffer, int pin)
    {
        int pad = AddJunction(net, "driver pad", 0);
        net.SourceBranch = AddBranch(net, new LumpedBranch
        {
            Role = BranchRole.Source, Label = "driver package", A = pad, B = pin, R = buffer.PackageR, L = buffer.PackageL,
        });
        if (buffer.PackageC > 0)
            net.SourceShunt = AddBranch(net, new LumpedBranch { Role = BranchRole.Source, Label = "driver C_pkg", A = -1, B = pin, C = buffer.PackageC });
        var curves = buffer.Curves;
        if (curves.CComp > 0)
            AddBranch(net, new LumpedBranch { Role = BranchRole.Source, Label = "driver C_comp", A = pad, B = -1, C = curves.CComp });
        var law = new DriverLaw(curves);
        net.Junctions[pad].G += law.Shunt;
        net.Nonlinear.Add(new NonlinearPart
        {
            Role = BranchRole.Source, Label = "driver", A = pad, B = -1, Driver = law,
            Curve = Buffers.IvCurve.Create([(-1, 0), (1, 0)], "driver"),   // unused: the driver's law stands in its place
        });
        net.Driver = new DriverSchedule(scenario.Source, buffer, scenario.Simulation.Duration, law);
    }

    static int AddJunction(Network net, string label, double position)
    {
        net.Junctions.Add(new Junction { Label = label, Position = position });
        return net.Junctions.Count - 1;
    }

    static int AddBranch(Network net, LumpedBranch b)
    {
        net.Branches.Add(b);
        return net.Branches.Count - 1;
    }

    static void BuildLine(Network net, Scenario scenario, GridPlan plan, ref int planIndex, IReadOnlyList<LineElement> line, LoadSpec load,
        int start, string path, string where)
    {
        var nodes = new LineNodes { StartJunction = start };
        net.Lines[path] = nodes;
        int node = start;
        double pos = 0;
        var pendingUp = new List<EdgeRef>();
        if (path.Length == 0) pendingUp.Add(new EdgeRef(-1, -1, net.SourceBranch));
        string prefix = path.Length == 0 ? "line" : path.Replace('/', '.') + ".line";

        for (int i = 0; i < line.Count; i++)
        {
            string at = $"{prefix}[{i}]";
            switch (line[i])
            {
                case Segment s:
                {
                    var sp = plan.Segments[planIndex++];
                    int end = AddJunction(net, at + " end", pos + s.Length);
                    int si = net.Segments.Count;
                    var gs = new GridSegment { Plan = sp, Start = node, End = end, StartPosition = pos, LinePath = path };
                    net.Segments.Add(gs);
                    double dz = gs.Dz;
                    if (s.Loss is not null)
                    {
                        // The end half cells: C∞ on the junction and each shunt term as a lumped R-C branch to ground.
                        var fit = gs.Dispersion = DispersiveKernel.FitFor(s, scenario, plan.Dt);
                        foreach (int j in new[] { node, end })
                        {
                            net.Junctions[j].C += fit.InstantCapacitance * dz / 2; net.Junctions[j].G += fit.G * dz / 2;
                            for (int k = 0; k < fit.ShuntPoles.Length; k++)
                            {
                                double b = fit.ShuntResidues[k] * dz / 2;
                                if (b > 0)
                                    AddBranch(net, new LumpedBranch { Role = BranchRole.Shunt, Label = $"{at} dielectric {k}", A = j, B = -1, R = 1 / b, C = b / fit.ShuntPoles[k] });
                            }
                        }
                    }
                    else
                    {
                        net.Junctions[node].C += s.C * dz / 2; net.Junctions[node].G += s.G * dz / 2;
                        net.Junctions[end].C += s.C * dz / 2; net.Junctions[end].G += s.G * dz / 2;
                    }
                    // The start junction node: its downstream edge is this segment's first half cell.
                    nodes.Nodes.Add((pos, NodeRef.OnJunction(node), pendingUp.ToArray(), [new EdgeRef(si, 0, -1)]));
                    nodes.Nodes.AddInterior(si, sp.Cells, pos, dz);
                    pendingUp = [new EdgeRef(si, sp.Cells - 1, -1)];
                    node = end;
                    pos += s.Length;
                    break;
                }
                case Shunt { Parts.Iv: { } iv }:
                    AddPart(net, BranchRole.Shunt, at + " shunt I-V", node, -1, iv, 0);
                    break;
                case Shunt sh:
                    AddLumped(net, BranchRole.Shunt, at + " shunt", node, -1, sh.Parts);
                    break;
                case Model.Series se:
                {
                    int next = AddJunction(net, at + " after series", pos);
                    var edge = se.Parts.Iv is { } iv
                        ? EdgeRef.OnPart(AddPart(net, BranchRole.Series, at + " series I-V", node, next, iv, 0))
                        : new EdgeRef(-1, -1, AddLumped(net, BranchRole.Series, at + " series", node, next, se.Parts));
                    nodes.Nodes.Add((pos, NodeRef.OnJunction(node), pendingUp.ToArray(), [edge]));
                    pendingUp = [edge];
                    node = next;
                    break;
                }
                case Branch br:
                {
                    string sub = path.Length == 0 ? br.Name : path + "/" + br.Name;
                    BuildLine(net, scenario, plan, ref planIndex, br.Line, br.Load, node, sub, at);
                    break;
                }
            }
        }
        nodes.EndJunction = node;
        nodes.Length = pos;
        AddLoad(net, nodes, load, node, prefix);
        var loadEdges = nodes.LoadBranches.Select(b => new EdgeRef(-1, -1, b)).Concat(nodes.LoadParts.Select(EdgeRef.OnPart)).ToArray();
        nodes.Nodes.Add((pos, NodeRef.OnJunction(node), pendingUp.ToArray(), loadEdges));
    }

    static int AddLumped(Network net, BranchRole role, string label, int a, int b, LumpedParts p) =>
        AddBranch(net, new LumpedBranch { Role = role, Label = label, A = a, B = b, R = p.R ?? 0, L = p.L ?? 0, C = p.C });

    static int AddPart(Network net, BranchRole role, string label, int a, int b, Buffers.IvCurve curve, double offset)
    {
        net.Nonlinear.Add(new NonlinearPart { Role = role, Label = label, A = a, B = b, Curve = curve, Offset = offset });
        return net.Nonlinear.Count - 1;
    }

    static void AddLoad(Network net, LineNodes nodes, LoadSpec load, int node, string prefix)
    {
        string label = prefix.Replace(".line", "").Replace("line", "") is { Length: > 0 } b ? b + " load" : "load";
        void Add(LumpedBranch br) => nodes.LoadBranches.Add(AddBranch(net, br));
        if (load.Short) { Add(new LumpedBranch { Role = BranchRole.Load, Label = label + " short", A = node, B = -1 }); return; }
        if (load.R is { } r) Add(new LumpedBranch { Role = BranchRole.Load, Label = label + " R", A = node, B = -1, R = r, FixedB = load.To });
        if (load.C is { } c) Add(new LumpedBranch { Role = BranchRole.Load, Label = label + " C", A = node, B = -1, C = c });
        if (load.L is { } l) Add(new LumpedBranch { Role = BranchRole.Load, Label = label + " L", A = node, B = -1, L = l });
        if (load.Iv is { } iv) nodes.LoadParts.Add(AddPart(net, BranchRole.Load, label + " I-V", node, -1, iv, load.To));
        if (load.Buffer is { } buffer) AddReceiver(net, nodes, buffer, node, label + " buffer");
    }

    /// <summary>
    /// A buffer receiver at the line's end (the pin): C_pkg from the pin to ground and R_pkg + L_pkg in series from the pin to
    /// the die pad, where C_comp goes to ground and the clamps' summed law conducts. The load probe reads the pin's current:
    /// the package's branches, or, without a package, the pad's own parts.
    /// </summary>
    static void AddReceiver(Network net, LineNodes nodes, Model.BufferSpec buffer, int pin, string label)
    {
        int pad = pin;
        if (buffer.PackageC > 0)
            nodes.LoadBranches.Add(AddBranch(net, new LumpedBranch { Role = BranchRole.Load, Label = label + " C_pkg", A = pin, B = -1, C = buffer.PackageC }));
        bool series = buffer.PackageR > 0 || buffer.PackageL > 0;
        if (series)
        {
            pad = AddJunction(net, label + " pad", nodes.Length);
            nodes.LoadBranches.Add(AddBranch(net, new LumpedBranch
            {
                Role = BranchRole.Load, Label = label + " package", A = pin, B = pad, R = buffer.PackageR, L = buffer.PackageL,
            }));
        }
        double ccomp = buffer.Curves.CComp;
        if (ccomp > 0)
        {
            int b = AddBranch(net, new LumpedBranch { Role = BranchRole.Load, Label = label + " C_comp", A = pad, B = -1, C = ccomp });
            if (!series) nodes.LoadBranches.Add(b);
        }
        if (buffer.ClampLaw() is { } clamps)
        {
            int p = AddPart(net, BranchRole.Load, label + " clamps", pad, -1, clamps, 0);
            if (!series) nodes.LoadParts.Add(p);
        }
    }
}
