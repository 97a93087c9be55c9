namespace PadPlan.Planning;

/// <summary>A small seeded generator (xoshiro256**, seeded by SplitMix64) so that the same seed gives the same moves on every runtime.</summary>
internal sealed class PlacerRandom
{
    private ulong _s0, _s1, _s2, _s3;

    public PlacerRandom(long seed)
    {
        var x = (ulong)seed;
        _s0 = SplitMix(ref x);
        _s1 = SplitMix(ref x);
        _s2 = SplitMix(ref x);
        _s3 = SplitMix(ref x);
    }

    public ulong NextULong()
    {
        var result = RotateLeft(_s1 * 5, 7) * 9;
        var t = _s1 << 17;
        _s2 ^= _s0;
        _s3 ^= _s1;
        _s1 ^= _s2;
        _s0 ^= _s3;
        _s2 ^= t;
        _s3 = RotateLeft(_s3, 45);
        return result;
    }

    /// <summary>Uniform in [0, 1).</summary>
    public double NextDouble() => (NextULong() >> 11) * (1.0 / (1UL << 53));

    /// <summary>Uniform in [0, count).</summary>
    public int Next(int count) => (int)((NextULong() >> 33) % (ulong)count);

    public double Between(double low, double high) => low + (high - low) * NextDouble();

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));

    private static ulong SplitMix(ref ulong x)
    {
        var z = x += 0x9E3779B97F4A7C15UL;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }
}
