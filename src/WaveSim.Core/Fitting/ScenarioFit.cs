using WaveSim.Core.Analysis;
using WaveSim.Core.Measurements;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Fitting;

/// <summary>
/// Finds the scenario values that make a simulated probe match a capture in least squares (the workflow behind
/// <c>wavesim fit</c>).
/// </summary>
/// <remarks>
/// <para>Residual: the captured value minus the simulated probe, linearly interpolated at each capture sample time t_i + offset
/// (observed − model, the sign of compare's residual and of CaptureResidual in Output; the fit itself does not
/// depend on the sign). Before 0 the simulation holds its first value (nothing has happened yet), after its end its last. The capture
/// samples used are fixed at the start: those that fall inside the simulated record with the starting offset.</para>
/// <para>Alignment: the capture is aligned once, with the starting scenario: by cross-correlation (the default) or the 50 %
/// crossings, then by a least-squares search over offsets within ±10 % of the simulated duration around that
/// (<see cref="OffsetSearch"/>: the offset the fitter starts from is the best the starting scenario allows, not a 50 % crossing
/// that a slowed or reflected edge can pull off by tens of picoseconds). Aligning again at every evaluation would undo a fitted
/// delay: moving the edge would be cancelled by moving the capture. Instead the offset joins the fit as one more parameter,
/// bounded to ±10 % of the simulated duration around its start; so a delay is judged by where the edges and reflections fall
/// relative to each other. With no alignment the capture's time axis is taken as the scenario's (t = 0 at the source's time 0)
/// and nothing is shifted. Either way at least half of the capture's time span must lie inside the simulated record
/// (<see cref="CaptureTimeSpan"/>).</para>
/// <para>Uncertainty: cov = s²·(JᵀJ)⁻¹ with s² = SSR/(n − p) from the Jacobian at the solution (W. H. Press et al., Numerical
/// Recipes, 3rd ed., §15.5-15.6; D. M. Bates and D. G. Watts, Nonlinear Regression Analysis and Its Applications, 1988; from
/// memory), then every standard deviation is widened by √(n/n_eff) for the residual's lag-1 autocorrelation
/// (<see cref="ResidualCorrelation"/>).</para>
/// <para>Method: <see cref="BoundedLeastSquares"/> (Levenberg-Marquardt with bounds by change of variables); every residual
/// evaluation is one simulation of a variant made by key path (<see cref="ScenarioValues.With(Scenario, IEnumerable{KeyChange})"/>). The simulations
/// run one after another: the fitter asks for its Jacobian columns one at a time.</para>
/// </remarks>
public static class ScenarioFit
{
    /// <summary>Fits <paramref name="parameters"/> of <paramref name="scenario"/> so probe <paramref name="probe"/> matches <paramref name="capture"/>.</summary>
    /// <param name="scenario">The starting scenario.</param>
    /// <param name="capture">The measured waveform at the probe.</param>
    /// <param name="probe">The scenario probe the capture was taken at.</param>
    /// <param name="parameters">The free values (at least one, each key once).</param>
    /// <param name="options">Alignment and budget; null for the defaults.</param>
    /// <param name="ct">Cancels between simulations.</param>
    /// <returns>The fitted values with uncertainties, the fitted scenario and the waveforms for a picture.</returns>
    /// <exception cref="InputException">Bad probe, parameters, budget, or a capture that does not overlap the simulation.</exception>
    public static ScenarioFitResult Run(Scenario scenario, Capture capture, string probe, IReadOnlyList<FreeParameter> parameters,
        ScenarioFitOptions? options = null, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(capture);
        ArgumentNullException.ThrowIfNull(parameters);
        options ??= new ScenarioFitOptions();
        CaptureComparison.RequireProbe(scenario, probe);
        if (parameters.Count == 0)
            throw new InputException("give at least one key path to fit, e.g. line[0].segment.z0") { Parameter = "parameters" };
        var dup = parameters.GroupBy(p => p.KeyPath).FirstOrDefault(g => g.Count() > 1);
        if (dup is not null)
            throw new InputException($"'{dup.Key}' is given more than once") { Parameter = "parameters" };

        bool fitOffset = options.Align != AlignMode.None;
        int n = parameters.Count + (fitOffset ? 1 : 0);
        if (options.MaxSimulations < 2 * n + 3)
            throw new InputException($"{options.MaxSimulations} is too few for {n} fitted value(s); give at least {2 * n + 3}") { Parameter = nameof(ScenarioFitOptions.MaxSimulations) };

        int simulations = 0;
        var cache = new Dictionary<string, (double[] T, double[] V)>();
        (double[] T, double[] V) Probe(double[] values)
        {
            string cacheKey = string.Join(",", values.Select(v => v.ToString("R", System.Globalization.CultureInfo.InvariantCulture)));
            if (cache.TryGetValue(cacheKey, out var hit))
                return hit;
            ct.ThrowIfCancellationRequested();
            Scenario variant = Variant(scenario, parameters, values);
            // An evaluation needs only the probe's waveform.
            SimulationResult r = Simulate.Run(variant, new RunOptions { Force = options.Force, Analysis = AnalysisOptions.WaveformsOnly }, ct).Result;
            simulations++;
            options.Progress?.Report(Math.Min(1.0, simulations / (double)options.MaxSimulations));
            var result = (r.Time, r.Probe(probe).Volts);
            if (cache.Count > 8)
                cache.Clear();   // only the latest few are ever asked for again
            cache[cacheKey] = result;
            return result;
        }

        CaptureTimeSpan.RequireFits(capture, scenario.Simulation.Duration);
        double[] start = parameters.Select(p => p.Start).ToArray();
        var (t0, v0) = Probe(start);
        double window = ScenarioFitOptions.OffsetWindowFraction * scenario.Simulation.Duration;
        double offset0 = 0.0;
        if (fitOffset)
        {
            double aligned = WaveformComparison.Compare(t0, v0, capture.Time, capture.Volts, options.Align).OffsetS;
            offset0 = OffsetSearch.Best(t0, v0, capture.Time, capture.Volts, aligned, window);
        }
        CaptureTimeSpan.RequireOverlap(capture, offset0, t0[0], t0[^1]);

        // The capture samples used, fixed for the whole fit so the residual keeps its length.
        var use = Enumerable.Range(0, capture.Time.Length)
            .Where(i => capture.Time[i] + offset0 >= t0[0] && capture.Time[i] + offset0 <= t0[^1])
            .ToArray();
        if (use.Length < n + 2)
            throw new InputException(
                $"only {use.Length} capture sample(s) fall inside the simulated record (0 to {t0[^1]:G4} s) after alignment; lengthen simulation.duration or check the capture's time unit");
        double[] capT = use.Select(i => capture.Time[i]).ToArray();
        double[] capV = use.Select(i => capture.Volts[i]).ToArray();

        double[] lower = parameters.Select(p => p.Lower).ToArray();
        double[] upper = parameters.Select(p => p.Upper).ToArray();
        double[] first = start;
        if (fitOffset)
        {
            lower = [.. lower, offset0 - window];
            upper = [.. upper, offset0 + window];
            first = [.. start, offset0];
        }

        double[] Residuals(double[] x)
        {
            double[] values = fitOffset ? x[..^1] : x;
            double offset = fitOffset ? x[^1] : 0.0;
            var (t, v) = Probe(values);
            return Difference(t, v, capT, capV, offset);
        }

        // The fitter's own count is checked against the budget; the alignment run above is already spent.
        LeastSquaresResult fit = BoundedLeastSquares.Fit(Residuals, first, lower, upper, options.MaxSimulations - 1, ct, options.ReductionTolerance);

        double[] best = fitOffset ? fit.Values[..^1] : fit.Values;
        double offset = fitOffset ? fit.Values[^1] : 0.0;
        var (tf, vf) = Probe(best);
        double[] residual = Difference(tf, vf, capT, capV, offset);
        UncertaintyBasis basis = Basis(residual, n);
        double[] sigma = fit.Uncertainty.Select(u => u * basis.Widening).ToArray();

        var fitted = parameters.Select((p, j) => new FittedParameter(p, best[j], sigma[j])).ToList();
        Scenario fittedScenario = Variant(scenario, parameters, best);

        double[] startSim = Difference(t0, v0, capT, capV, offset0).Select((r, i) => capV[i] - r).ToArray();
        double[] fittedSim = residual.Select((r, i) => capV[i] - r).ToArray();
        double startRms = Rms(startSim.Select((s, i) => s - capV[i]));
        double rms = Rms(residual);
        return new ScenarioFitResult(fitted, offset, fitOffset ? sigma[^1] : double.NaN, fitOffset, rms, startRms,
            simulations, fit.Converged, fittedScenario, capT.Select(t => t + offset).ToArray(), capV, startSim, fittedSim, basis);
    }

    /// <summary>The residual standard error and the widening for correlation, from the residual at the solution.</summary>
    static UncertaintyBasis Basis(double[] residual, int p)
    {
        int m = residual.Length;
        double ssr = residual.Sum(r => r * r);
        double s = m > p ? Math.Sqrt(ssr / (m - p)) : double.NaN;
        double rho = ResidualCorrelation.Lag1(residual);
        return new UncertaintyBasis(m, p, s, rho, ResidualCorrelation.EffectiveSamples(m, rho), ResidualCorrelation.Widening(rho));
    }

    /// <summary>The scenario with the parameters set to <paramref name="values"/> (SI), made by key path.</summary>
    /// <param name="scenario">The scenario.</param>
    /// <param name="parameters">The free parameters.</param>
    /// <param name="values">One SI value per parameter.</param>
    /// <returns>The validated variant.</returns>
    public static Scenario Variant(Scenario scenario, IReadOnlyList<FreeParameter> parameters, double[] values) =>
        ScenarioValues.With(scenario, Changes(parameters, values));

    /// <summary>The parameters at <paramref name="values"/> (SI) as key-path changes, e.g. to splice them into the scenario's text.</summary>
    /// <param name="parameters">The free parameters.</param>
    /// <param name="values">One SI value per parameter.</param>
    public static IEnumerable<KeyChange> Changes(IReadOnlyList<FreeParameter> parameters, IReadOnlyList<double> values) =>
        parameters.Select((p, j) => new KeyChange(p.KeyPath, values[j], p.Dimension));

    /// <summary>Captured minus simulated (interpolated at capT + offset, held constant outside its record).</summary>
    static double[] Difference(double[] simT, double[] simV, double[] capT, double[] capV, double offset)
    {
        var r = new double[capT.Length];
        int k = 0;
        for (int i = 0; i < capT.Length; i++)
        {
            double t = capT[i] + offset;
            double s;
            if (t <= simT[0]) s = simV[0];
            else if (t >= simT[^1]) s = simV[^1];
            else
            {
                while (k + 1 < simT.Length && simT[k + 1] < t) k++;
                while (k > 0 && simT[k] > t) k--;
                double f = (t - simT[k]) / (simT[k + 1] - simT[k]);
                s = simV[k] + f * (simV[k + 1] - simV[k]);
            }
            r[i] = capV[i] - s;
        }
        return r;
    }

    static double Rms(IEnumerable<double> x)
    {
        double sum = 0;
        int n = 0;
        foreach (double v in x) { sum += v * v; n++; }
        return n > 0 ? Math.Sqrt(sum / n) : double.NaN;
    }
}
