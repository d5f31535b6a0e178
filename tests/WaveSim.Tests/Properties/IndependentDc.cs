using MathNet.Numerics.LinearAlgebra;

namespace WaveSim.Tests.Properties;

/// <summary>
/// The DC solution of a random net by plain nodal analysis (Kirchhoff's laws and Ohm's law), written apart from the
/// product: segments are their total series resistance, capacitors are open, inductors and shorts are 1 µΩ.
/// </summary>
internal static class IndependentDc
{
    const double Wire = 1e-6;

    public static (double Source, double Load) Solve(RandomNet net, double vs)
    {
        var g = new List<(int A, int B, double G)>();   // B = -1 is ground
        int nodes = 1, loadNode = -1;
        int Walk(IEnumerable<RandomItem> line, int node, RandomLoad load)
        {
            foreach (var item in line)
            {
                switch (item)
                {
                    case RandomSegment s:
                    {
                        int next = nodes++;
                        g.Add((node, next, 1 / Math.Max(s.R * s.Length, Wire)));
                        node = next;
                        break;
                    }
                    case RandomShunt sh when sh.C is null:
                        g.Add((node, -1, 1 / sh.R!.Value));
                        break;
                    case RandomSeries se:
                    {
                        int next = nodes++;
                        g.Add((node, next, 1 / Math.Max(se.R, Wire)));
                        node = next;
                        break;
                    }
                    case RandomBranch b:
                        Walk(b.Line, node, b.Load);
                        break;
                }
            }
            if (load.Short || load.L is not null) g.Add((node, -1, 1 / Wire));
            if (load.R is { } r) g.Add((node, -1, 1 / r));
            return node;
        }
        loadNode = Walk(net.Line, 0, net.Load);
        var a = Matrix<double>.Build.Dense(nodes, nodes);
        var rhs = Vector<double>.Build.Dense(nodes);
        for (int i = 0; i < nodes; i++) a[i, i] += 1e-12;
        a[0, 0] += 1 / net.Rs;
        rhs[0] += vs / net.Rs;
        foreach (var (x, y, c) in g)
        {
            a[x, x] += c;
            if (y >= 0) { a[y, y] += c; a[x, y] -= c; a[y, x] -= c; }
        }
        var v = a.Solve(rhs);
        return (v[0], v[loadNode]);
    }
}
