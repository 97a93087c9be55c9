namespace PadPlan.Output.Materials;

/// <summary>The usual workshop cautions (DOMAIN §7), printed under the tables they concern.</summary>
public static class Cautions
{
    public const string GlassFibreDust =
        "Caution: cutting, punching or sanding board raises glass-fibre dust. Cut wet or with extraction, wear eye protection and a dust mask, keep it away from food.";

    public const string Glue =
        "Caution: cyanoacrylate glue bonds skin instantly and gives off irritant vapour. Work ventilated; keep a solvent for it at hand.";

    public const string SolderFume =
        "Caution: solder flux fume is a known cause of occupational asthma. Use extraction and do not overheat the iron.";

    public const string HighVoltage =
        "Caution: this circuit has nets above 50 V. Test it unpowered only; discharge filter capacitors through a resistor and measure before touching. Mains wiring follows local codes and licensed practice.";
}
