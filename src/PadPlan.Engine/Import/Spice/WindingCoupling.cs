using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>A SPICE K line: inductors wound on one core.</summary>
public sealed record WindingCoupling(string Ref, ValueList<string> Inductors, double Coefficient, int Line);
