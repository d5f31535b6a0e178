namespace WaveSim.Core.Buffers;

/// <summary>The Model_type values of a [Model] this reader accepts.</summary>
public enum BufferModelType
{
    /// <summary>Input: a receiver, clamps and C_comp only.</summary>
    Input,

    /// <summary>Output: a push-pull driver, always enabled.</summary>
    Output,

    /// <summary>I/O: a push-pull driver that can be disabled and then acts as an input.</summary>
    InputOutput,

    /// <summary>3-state: a push-pull driver that can be disabled.</summary>
    ThreeState,

    /// <summary>Open_drain: a pulldown only; the high level comes from outside.</summary>
    OpenDrain,
}
