using System.Collections.Frozen;
using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

/// <summary>
/// P(best) and E[max] references computed with mpmath 1.3.0: mpmath.quad (tanh-sinh) at 25 digits between
/// breakpoints at every arm's mean ± k sd, by reference/make_reference_values.py, section "best"; the
/// printed output is reference/make_reference_values.out.txt. E[max] is omitted for the Student-t cases,
/// whose arms with df ≤ 2 have no finite or no quickly converging mean of the maximum.
/// </summary>
internal static class ReferenceValues
{
    public static readonly FrozenDictionary<string, (IMarginal[] Arms, double[] Probabilities, double? ExpectedMaximum)> Cases =
        new Dictionary<string, (IMarginal[], double[], double?)>
        {
            ["N1"] = ([new NormalMarginal(0, 1), new NormalMarginal(0.5, 0.8), new NormalMarginal(-0.2, 1.5)],
                [0.25401514771845910774, 0.47132634411569822033, 0.27465850816584267192],
                1.0798133313049838671),
            ["N2"] = ([new NormalMarginal(0.3, 1e-4), new NormalMarginal(0.30015, 2e-4), new NormalMarginal(0.2999, 5e-5)],
                [0.23431624241007621786, 0.73891290859063170867, 0.026770848999292073467],
                0.30018474892301753217),
            ["N3"] = ([new NormalMarginal(1, 0.3), new NormalMarginal(1.2, 0.5), new NormalMarginal(0.8, 0.1), new NormalMarginal(1.1, 0.05), new NormalMarginal(0.5, 2)],
                [0.14094760098157295745, 0.36424883647195548839, 0.00052642555693087574738, 0.16515501210697749659, 0.32912212488256318183],
                1.8337645397490103019),
            ["T1"] = ([new StudentTMarginal(1, 0, 1), new StudentTMarginal(1, 1, 2), new StudentTMarginal(1, -0.5, 0.5)],
                [0.3043031887965218651, 0.53010995910114223877, 0.16558685210233589613],
                null),
            ["T2"] = ([new StudentTMarginal(2, 0.5, 0.5), new StudentTMarginal(3, 0, 1), new StudentTMarginal(2, 0.2, 0.1)],
                [0.51125811508591294771, 0.30039490617748719404, 0.18834697873659985825],
                null),
            ["T3"] = ([new StudentTMarginal(3, 0.4, 0.05), new StudentTMarginal(3, 0.41, 0.07), new StudentTMarginal(30, 0.39, 0.02), new StudentTMarginal(1, 0, 1)],
                [0.22576556345239804797, 0.29455662164499903316, 0.11656833492348964928, 0.36310947997911326959],
                null),
            ["G1"] = ([new GammaMarginal(21, 6), new GammaMarginal(15, 4), new GammaMarginal(30, 9)],
                [0.31832996899379108295, 0.4646537840511645507, 0.21701624695504436634],
                4.2379349456428950069),
            ["G2"] = ([new GammaMarginal(0.5, 1), new GammaMarginal(2, 3), new GammaMarginal(1.5, 1.2)],
                [0.15386122994894044235, 0.25102832533952124693, 0.59511044471153831072],
                1.527627193556403971),
            ["G3"] = ([new GammaMarginal(5000, 1000), new GammaMarginal(4900, 980), new GammaMarginal(5050, 1012)],
                [0.35243091140118875582, 0.35368111153061212902, 0.29388797706819911516],
                5.0569053946022212041),
            ["J1"] = ([new BetaMarginal(10.5, 0.5), new BetaMarginal(3.5, 0.5), new BetaMarginal(5.5, 2.5)],
                [0.66319750092352749863, 0.3228872525067355375, 0.013915246569736826774],
                0.97400002024866789275),
            ["M1"] = ([new BetaMarginal(30, 70), new NormalMarginal(0.32, 0.05), new GammaMarginal(40, 130)],
                [0.24845195181624125913, 0.44073874693836655577, 0.3108093012453921851],
                0.35134961892502234449),
        }.ToFrozenDictionary();

    public static double[] J1 => Cases["J1"].Probabilities;
}
