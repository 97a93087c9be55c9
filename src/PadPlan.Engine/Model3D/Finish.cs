namespace PadPlan.Model3D;

/// <summary>What a surface of the model is made of; decides its colour in the glTF file, the editor's view and the printed picture.</summary>
public enum Finish
{
    /// <summary>Glass-epoxy board material: the sides of the board and of every pad.</summary>
    Laminate,
    /// <summary>The plane's copper face (drawn a shade darker than the pads, which are freshly cut).</summary>
    Plane,
    /// <summary>Bare copper: every pad's top.</summary>
    Copper,
    /// <summary>Tinned lead wire.</summary>
    Lead,
    /// <summary>Solder at a ground landing.</summary>
    Solder,
    /// <summary>Moulded black plastic: transistors, ICs, small diodes.</summary>
    BlackPlastic,
    /// <summary>Resistor lacquer.</summary>
    ResistorBody,
    /// <summary>Electrolytic sleeve.</summary>
    CanSleeve,
    /// <summary>Ceramic disc and trimmer-capacitor glaze.</summary>
    Ceramic,
    /// <summary>Film-capacitor box.</summary>
    FilmBox,
    /// <summary>Metal can: crystals, metal tabs.</summary>
    Metal,
    /// <summary>Enamelled winding wire: toroids and chokes.</summary>
    Winding,
    /// <summary>Trimmer housing.</summary>
    TrimmerBody,
    /// <summary>LED epoxy.</summary>
    LedEpoxy,
}

/// <summary>The colour of each finish, linear RGB 0-1 (glTF base colours are linear).</summary>
public static class Finishes
{
    public static (double R, double G, double B) Colour(Finish finish) => finish switch
    {
        Finish.Laminate => (0.55, 0.50, 0.16),
        Finish.Plane => (0.56, 0.25, 0.13),
        Finish.Copper => (0.85, 0.42, 0.22),
        Finish.Lead => (0.75, 0.75, 0.78),
        Finish.Solder => (0.62, 0.63, 0.66),
        Finish.BlackPlastic => (0.06, 0.06, 0.07),
        Finish.ResistorBody => (0.72, 0.56, 0.36),
        Finish.CanSleeve => (0.08, 0.18, 0.50),
        Finish.Ceramic => (0.75, 0.38, 0.08),
        Finish.FilmBox => (0.80, 0.16, 0.12),
        Finish.Metal => (0.82, 0.83, 0.86),
        Finish.Winding => (0.55, 0.22, 0.08),
        Finish.TrimmerBody => (0.20, 0.35, 0.75),
        Finish.LedEpoxy => (0.85, 0.10, 0.10),
        _ => (0.5, 0.5, 0.5),
    };

    /// <summary>Whether the finish is metal (for the glTF metallic factor).</summary>
    public static bool IsMetal(Finish finish) => finish is Finish.Plane or Finish.Copper or Finish.Lead or Finish.Solder or Finish.Metal;
}
