namespace WaveSim.Core.Reports;

/// <summary>Sizes of the pictures embedded in the report, in pixels.</summary>
public static class ReportImages
{
    /// <summary>Waveform plot width.</summary>
    public const int WaveformWidth = 1100;
    /// <summary>Waveform plot height.</summary>
    public const int WaveformHeight = 550;
    /// <summary>Space-time map width.</summary>
    public const int SpaceTimeWidth = 1000;
    /// <summary>Space-time map height.</summary>
    public const int SpaceTimeHeight = 700;
    /// <summary>Eye diagram width.</summary>
    public const int EyeWidth = 900;
    /// <summary>Eye diagram height.</summary>
    public const int EyeHeight = 600;
    /// <summary>Termination overlay width.</summary>
    public const int TerminationsWidth = 1100;
    /// <summary>Termination overlay height.</summary>
    public const int TerminationsHeight = 600;

    /// <summary>A PNG as a data URI ("data:image/png;base64,...") so the page needs no other file.</summary>
    public static string DataUri(byte[] png) => "data:image/png;base64," + Convert.ToBase64String(png);
}
