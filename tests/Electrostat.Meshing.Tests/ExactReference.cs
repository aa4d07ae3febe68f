using System.Numerics;

namespace Electrostat.Meshing.Tests;

/// <summary>
/// Independent exact reference for the predicates: every double is an integer multiple of 2^-1074, so scaling all
/// coordinates by 2^1074 turns them into big integers and the determinants become exact integer arithmetic.
/// </summary>
internal static class ExactReference
{
    private static BigInteger Big(double v)
    {
        long bits = BitConverter.DoubleToInt64Bits(v);
        bool neg = bits < 0;
        int exp = (int)((bits >> 52) & 0x7FF);
        long man = bits & 0xFFFFFFFFFFFFFL;
        if (exp == 0) exp = 1; else man |= 1L << 52;
        // value = man · 2^(exp − 1075); scaled by 2^1074 gives man · 2^(exp − 1)
        var r = new BigInteger(man) << (exp - 1);
        return neg ? -r : r;
    }

    internal static int Orient(double ax, double ay, double bx, double by, double cx, double cy)
    {
        var det = (Big(ax) - Big(cx)) * (Big(by) - Big(cy)) - (Big(ay) - Big(cy)) * (Big(bx) - Big(cx));
        return det.Sign;
    }

    internal static int InCircle(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        BigInteger adx = Big(ax) - Big(dx), ady = Big(ay) - Big(dy);
        BigInteger bdx = Big(bx) - Big(dx), bdy = Big(by) - Big(dy);
        BigInteger cdx = Big(cx) - Big(dx), cdy = Big(cy) - Big(dy);
        var det = (adx * adx + ady * ady) * (bdx * cdy - cdx * bdy)
                + (bdx * bdx + bdy * bdy) * (cdx * ady - adx * cdy)
                + (cdx * cdx + cdy * cdy) * (adx * bdy - bdx * ady);
        return det.Sign;
    }
}
