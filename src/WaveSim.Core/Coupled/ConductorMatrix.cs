using System.Collections.Immutable;

namespace WaveSim.Core.Coupled;

/// <summary>An immutable square matrix of per-length values (one row and column per conductor), SI, row-major.</summary>
public sealed class ConductorMatrix
{
    readonly ImmutableArray<double> _values;

    /// <summary>Makes a matrix from its rows; every row must have as many entries as there are rows.</summary>
    /// <exception cref="ArgumentException">The rows do not make a square matrix.</exception>
    public ConductorMatrix(double[][] rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        Size = rows.Length;
        if (rows.Any(r => r.Length != Size)) throw new ArgumentException("a conductor matrix is square", nameof(rows));
        _values = rows.SelectMany(r => r).ToImmutableArray();
    }

    /// <summary>Number of conductors.</summary>
    public int Size { get; }

    /// <summary>The entry in row <paramref name="i"/>, column <paramref name="j"/>.</summary>
    public double this[int i, int j] => _values[i * Size + j];

    /// <summary>A diagonal matrix with the given entries.</summary>
    public static ConductorMatrix Diagonal(IReadOnlyList<double> diagonal)
    {
        ArgumentNullException.ThrowIfNull(diagonal);
        int n = diagonal.Count;
        return new ConductorMatrix(Enumerable.Range(0, n).Select(i => Enumerable.Range(0, n).Select(j => i == j ? diagonal[i] : 0).ToArray()).ToArray());
    }

    /// <summary>The n × n zero matrix.</summary>
    public static ConductorMatrix Zero(int n) => Diagonal(new double[n]);

    /// <summary>A copy as a MathNet dense matrix, for the set-up computations.</summary>
    internal MathNet.Numerics.LinearAlgebra.Matrix<double> ToMatrix() =>
        MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.Dense(Size, Size, (i, j) => this[i, j]);

    /// <summary>Whether every entry off the diagonal is zero.</summary>
    public bool IsDiagonal
    {
        get
        {
            for (int i = 0; i < Size; i++)
                for (int j = 0; j < Size; j++)
                    if (i != j && this[i, j] != 0) return false;
            return true;
        }
    }
}
