namespace PadPlan.Planning;

/// <summary>Fixed numbers of the engine, gathered in one place so none hides in a loop.</summary>
internal static class PlacerLimits
{
    /// <summary>Kept inside every hard limit so that rounding coordinates to 0.01 mm can never break a rule.</summary>
    public const double Safety = 0.03;
    /// <summary>Extra room demanded on every gap and reach while annealing, dropped for the final check, so small leftovers of annealing are still legal.</summary>
    public const double AnnealSlack = 0.4;
    /// <summary>Gap kept between part bodies so parts do not touch (common practice, no source).</summary>
    public const double BodyGap = 0.3;
    /// <summary>Coordinates written to the project are rounded to this step (mm).</summary>
    public const double WriteStep = 0.01;
    /// <summary>Longest rectangle the planner cuts for one net before it splits the net over jumpered pads (common practice, no source).</summary>
    public const double MaxRectLength = 30.0;
    /// <summary>Lead reach distances tried for ground landings beyond the shortest one (mm).</summary>
    public static readonly double[] GroundSteps = [0, 1.5, 3.0];
    /// <summary>Directions tried for a ground landing, as turns from the lead's outward direction (degrees).</summary>
    public static readonly double[] GroundTurns = [0, 45, -45, 90, -90, 135, -135, 180];
    /// <summary>VPR target acceptance rate for the move-range limiter (Betz and Rose, 1997).</summary>
    public const double TargetAcceptance = 0.44;
    /// <summary>Cooling factor while 15-80 % of moves are kept; VPR uses 0.95, 0.9 halved the moves for the same cost within seed-to-seed noise in our measurements at 500 and 1,000 parts.</summary>
    public const double MiddleCooling = 0.9;
    /// <summary>
    /// VPR's cooling factor in that band, used on circuits of up to <see cref="PlacerSettings.SteadyCircuit"/> parts, where runs are
    /// cheap: on the crystal oscillator, 12 single runs from the spring start ended at a median cost of 210 (173-276) against 229
    /// (200-263) at 0.9, for twice the moves (2026-12-04, docs/benchmarks.md).
    /// </summary>
    public const double SteadyCooling = 0.95;
    /// <summary>Runs that anneal the best layout of the independent runs again (cool, close by, a new seed each), two at a time; the best of all is kept.</summary>
    public const int RefineRuns = 4;
    /// <summary>VPR initial temperature: this many standard deviations of the cost change of random moves.</summary>
    public const double StartTemperatureSigmas = 20;
    /// <summary>VPR stopping rule: temperature below this fraction of the mean cost per net.</summary>
    public const double StopFraction = 0.005;
    /// <summary>Safety stop on the number of temperature steps.</summary>
    public const int MaxSteps = 400;
    /// <summary>Floor on moves per temperature (before the effort factor), so a board of a handful of parts still gets a few hundred moves per temperature; above it moves grow as N^(4/3) (VPR).</summary>
    public const int MinMovesPerTemperature = 60;
    /// <summary>Convergence: a temperature counts as frozen when it changes the annealing cost by less than this fraction of it ...</summary>
    public const double FrozenCostChange = 0.002;
    /// <summary>... and the run stops after this many frozen temperatures in a row.</summary>
    public const int FrozenSteps = 3;
    /// <summary>Violation (mm) below which a layout counts as clean for the stopping rule; the legaliser then removes the rest.</summary>
    public const double ViolationTolerance = 1e-6;
    /// <summary>Start temperature of the annealing that follows the spring start, in standard deviations of the cost change of moves within <see cref="SpringStartRangeCells"/> cells: low, so the start's order survives.</summary>
    public const double SpringStartSigmas = 1.0;
    /// <summary>Range of the trial moves that set the spring start's temperature, in cells: the temperature of a local clean-up, not of a new search.</summary>
    public const double SpringProbeCells = 0.5;
    /// <summary>Move range of the annealing that follows the spring start, in cells of the spread (one cell is about one part with its pads).</summary>
    public const double SpringStartRangeCells = 2.0;
    /// <summary>The spring start spreads parts over a box of this many times the sum of body and pad areas (or the whole region, if smaller).</summary>
    public const double SpringSpreadArea = 1.8;
    /// <summary>Gauss-Seidel sweeps that smooth the spring start's y noise into the slowest modes of the springs.</summary>
    public const int SpringSweeps = 200;
    /// <summary>Conjugate-gradient iterations of the spring start's x solve at most; a chain of N parts needs about N.</summary>
    public const int SpringIterations = 5000;
    /// <summary>The x solve stops when the residual is this fraction of the right-hand side (both as vector lengths).</summary>
    public const double SpringResidual = 1e-8;
    /// <summary>Weak pull of every item to the middle in the spring start's y smoothing, against a spring's weight of 1: keeps parts without wires in the region.</summary>
    public const double SpringCentrePull = 0.02;
    /// <summary>
    /// In the exact x solve, the pull of every item toward where netlist order puts it, against a spring's weight of 1. It
    /// keeps parts without wires, and parts of the circuit no input or output anchors, determined, and orders them as written.
    /// A pull of weight c flattens a chain's own order beyond about 1 / sqrt(c) parts from its anchors, so it is weak (here
    /// about 58 parts; 0.01 failed the shuffled-chain test, 1e-4 to 1e-3 passed it). Against the old pull of 0.02 to the middle,
    /// on the benchmark circuit (2026-12-02, seeds 1 and 2, all legal): 4 to 19 % lower cost at quick 500 and normal 1,000 parts.
    /// </summary>
    public const double SpringOrderPull = 3e-4;
    /// <summary>Independent runs done together before the runs so far are compared; fixed, so the result never depends on the machine.</summary>
    public const int RunBatch = 2;
    /// <summary>Runs stop early once the best two legal ones are within this fraction of each other's cost.</summary>
    public const double RunsAgree = 0.03;
    /// <summary>Extra temperature steps at the final temperature while rules are still broken.</summary>
    public const int CleanupSteps = 12;
    /// <summary>Times a run the legaliser leaves a little short is annealed a little more and legalised again.</summary>
    public const int ReworkTries = 3;
    /// <summary>
    /// Broken rules (mm per item) after the legaliser up to which a run is reworked: a few knots in a large layout (a
    /// 300- or 500-resistor ring: 0.002 mm per item or less), not a small layout that is broken all over (a failed run of
    /// the crystal oscillator: 0.01 mm per item, never mended by rework, and 0.3 s of its 1 s went on trying).
    /// </summary>
    public const double ReworkViolationPerItem = 0.005;
    /// <summary>Temperature steps of each such rework.</summary>
    public const int ReworkSteps = 4;
    /// <summary>Temperature of a rework after the first, as a fraction of the run's final temperature: warm enough for a trade of places to pass, cool enough to keep the legal rest (at the full final temperature the layout broke open again by 8-12 mm on a 300-resistor ring).</summary>
    public const double ReworkCooling = 0.1;
    /// <summary>Share of trial moves aimed at a net that breaks its reach (before the table is normalised; the other kinds sum to about 1.15). While no net is broken such a move is an ordinary shift.</summary>
    public const double MendShare = 0.1;
    /// <summary>Smallest shift (mm) of a move aimed at crowding: about a pad and its gap, enough to step past a neighbour.</summary>
    public const double MendCrowdingShift = 4.0;
    /// <summary>Weight of broken rules in the greedy passes after legalising (polish, final descent): no move that breaks one is ever kept.</summary>
    public const double ProhibitivePenalty = 1e6;
    /// <summary>Fewest moves of one greedy pass, for the smallest boards.</summary>
    public const int GreedyMinMoves = 200;
    /// <summary>
    /// Moves of each range of the final descent, per N^(4/3) and per unit of the effort's move factor (32 N^(4/3) at normal
    /// effort). Over seeds 1-20 (2026-12-05, docs/benchmarks.md) half of it gave the same medians, a worse worst seed on the
    /// crystal oscillator (83.1 mm against 72.9) and 0.3 s less on 50 parts; a quarter of it a little longer leads.
    /// </summary>
    public const double DescentMoves = 8;
    /// <summary>Move ranges (mm) of one round of the final descent, widest first: trades and steps past a neighbour, then the fine fit.</summary>
    public static readonly double[] DescentRanges = [2.0, 1.0, 0.5, 0.25];
    /// <summary>The final descent stops after a round that lowers the cost by less than this fraction ...</summary>
    public const double DescentGain = 1e-3;
    /// <summary>... or after this many rounds.</summary>
    public const int DescentRounds = 50;
    /// <summary>Added to the seed's run numbers for the final descent's own random moves, so they never repeat a run's.</summary>
    public const int DescentRun = 99;

    /// <summary>Run number of the polish of a failed layout carried over to a new plan of its pads.</summary>
    public const int CarryRun = 500;
    /// <summary>Smallest move range (mm).</summary>
    public const double MinRange = 0.5;
    /// <summary>Violation (mm per item) after annealing beyond which the legaliser does not try: such a run is not legal, and another run or a larger region is the remedy.</summary>
    public const double HopelessViolationPerItem = 0.05;
    /// <summary>Times the automatic board region may grow when a layout does not fit.</summary>
    public const int AutoGrowTries = 4;
    /// <summary>Growth of the automatic region per try.</summary>
    public const double AutoGrowFactor = 1.2;
    /// <summary>
    /// Area allowance of the first automatic region over the sum of body and pad areas: 2.6 up to 50 parts, rising with the
    /// logarithm of the part count to 3.8 at 500 parts and more. Large circuits have more nets that must cross the board and need
    /// room between parts (measured: the 1,000-part benchmark circuit froze with broken rules at 3.2, legal at 3.8; a small
    /// board is no more compact than 2.6 allows).
    /// </summary>
    public static double AutoAreaFactor(int parts) =>
        parts <= 50 ? 2.6 : parts >= 500 ? 3.8 : 2.6 + 1.2 * Math.Log(parts / 50.0) / Math.Log(10);
}
