using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>Compiles a project into a <see cref="PlacementProblem"/>: which items move, which stay, the strips under DIPs, the planned pads of every net and the ground landing choices of every ground lead.</summary>
internal static class ProblemBuilder
{
    /// <param name="ownPadNets">Nets whose strip segments are not counted as room for leads from elsewhere: every such lead gets room on a pad of its own (an earlier try left the net broken at a strip).</param>
    /// <param name="splitNets">Nets planned with at least this many pads: an earlier try left the net broken with its leads in that many groups, too far apart for one pad.</param>
    public static PlacementProblem Build(Project project, PlacerSettings settings, CostWeights weights, IReadOnlySet<string>? ownPadNets = null, IReadOnlyDictionary<string, int>? splitNets = null)
    {
        var rules = project.Rules;
        var toolkit = project.Toolkit;
        var nets = project.Nets.Where(n => !n.Ground).Select(n => new ProblemNet { Net = n, MaxLead = rules.MaxLeadFor(n) }).ToList();
        var netIndex = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var i = 0; i < nets.Count; i++) netIndex[nets[i].Net.Name] = i;
        var groundNets = project.Nets.Where(n => n.Ground).ToDictionary(n => n.Name, StringComparer.Ordinal);

        var items = new List<ProblemItem>();
        var islands = new List<ProblemIsland>();
        var leads = new List<ProblemLead>();
        var existing = project.Layout ?? Layout.Empty;
        var placed = existing.Placements.ToDictionary(p => p.Ref, StringComparer.Ordinal);

        foreach (var part in project.Parts)
        {
            var footprint = project.FootprintOf(part);
            var item = new ProblemItem { Index = items.Count, Part = part, Footprint = footprint, IsLanding = footprint.Mount == MountStyle.Landing, KeepsOffPads = footprint.Mount != MountStyle.Landing, LiesFlat = footprint.Mount == MountStyle.Axial, HasBody = true };
            if ((part.Locked || settings.KeepExisting) && placed.TryGetValue(part.Ref, out var placement))
            {
                item.Fixed = true;
                item.StartX = placement.Position.X;
                item.StartY = placement.Position.Y;
                item.StartRot = (int)placement.Rotation / 90;
            }
            item.BodyMinX = footprint.Body.Min(p => p.X);
            item.BodyMaxX = footprint.Body.Max(p => p.X);
            item.BodyMinY = footprint.Body.Min(p => p.Y);
            item.BodyMaxY = footprint.Body.Max(p => p.Y);
            items.Add(item);
            AddLeads(project, item, netIndex, groundNets, leads, weights);
            // Heights above the plane. A part stands on the highest copper its leads land on (the checker's solids): a pad's
            // stock when any lead goes to a net's pad or strip, the plane itself when every lead goes to ground. So a part whose
            // leads all go to ground sits a stock thickness lower than one beside it on pads, and the leads of the other pass that
            // much nearer its underside.
            var seat = item.Leads.Any(l => leads[l].Net >= 0) ? toolkit.StockThickness : 0;
            item.BodyBottom = seat + footprint.BodyBottom;
            item.LeadLevel = seat + footprint.Leads.Max(l => Math.Max(footprint.Shape == BodyShape.Wires ? footprint.Height : footprint.LeadBend, l.Diameter) + l.Diameter / 2);
            if (item.Fixed && placed.TryGetValue(part.Ref, out var held)) KeepGroundLandings(item, held, leads);
            if (footprint.Mount == MountStyle.Strip && !item.Fixed) AddStrips(project, item, netIndex, islands, leads);
        }

        foreach (var pad in existing.Pads.Where(p => p.Locked || settings.KeepExisting))
        {
            var item = new ProblemItem { Index = items.Count, KeptPad = pad, Fixed = true };
            items.Add(item);
            var group = pad is StripPad ? islands.Count : -1;
            var own = new List<int>();
            var k = 0;
            foreach (var island in pad.Islands())
            {
                own.Add(islands.Count);
                islands.Add(new ProblemIsland
                {
                    Item = item.Index, Net = island.Net is not null && netIndex.TryGetValue(island.Net, out var n) ? n : -1,
                    Round = island.Shape == IslandShape.Round, LocalX = island.Center.X, LocalY = island.Center.Y,
                    HalfW = island.Width / 2, HalfH = island.Height / 2, Capacity = toolkit.CapacityOf(island),
                    StripGroup = group, StripIndex = k++, Id = island.Id,
                });
            }
            item.Islands = [.. own];
        }
        PinFixedStripLeads(items, islands, leads);
        foreach (var item in items.Where(i => i.Fixed && i.Footprint?.Mount == MountStyle.Strip && i.Leads.All(l => leads[l].OwnIsland < 0)))
            AddStrips(project, item, netIndex, islands, leads);

        var usedIds = new HashSet<string>(islands.Select(s => s.Id).Concat(existing.Pads.Where(p => p.Locked || settings.KeepExisting).Select(p => p.Id)), StringComparer.Ordinal);
        var padNumber = 0;
        // Parts wired across an IC's rows get pads of their own on circuits too large to be placed for steadiness, where every
        // run has to come out legal (the 500-part benchmark circuits found no legal layout without them). On smaller ones the
        // pads made the worst of ten seeds longer (CW filter 18 %, synthetic 50 7 %; docs/benchmarks.md). With anything held,
        // the layout's own pads stand.
        var across = items.Any(i => i.Fixed) || project.Parts.Count <= PlacerSettings.SteadyCircuit ? new Dictionary<string, int>() : AcrossRows.Of(project);
        foreach (var (net, index) in nets.Select((n, i) => (n, i)))
        {
            var netLeads = leads.Select((l, i) => (l, i)).Where(x => x.l.Net == index).Select(x => x.i).ToArray();
            var spare = 0;
            var acrossParts = across.GetValueOrDefault(net.Net.Name);
            var ownPads = ownPadNets?.Contains(net.Net.Name) == true || acrossParts > 0;
            foreach (var island in islands.Where(s => s.Net == index))
            {
                if (ownPads && items[island.Item].IsPart) continue;
                var room = island.Capacity - netLeads.Count(l => leads[l].OwnIsland >= 0 && islands[leads[l].OwnIsland] == island);
                // A strip segment is counted for one extra lead only: crowding every lead of a net onto IC segments pins the IC down.
                spare += items[island.Item].IsPart ? Math.Min(1, room) : room;
            }
            var free = netLeads.Count(l => leads[l].OwnIsland < 0);
            var atLeast = Math.Max(splitNets?.GetValueOrDefault(net.Net.Name) ?? 1, acrossParts);
            foreach (var planned in PadPlanner.PlanNet(net.Net, free - spare, toolkit, rules, atLeast))
            {
                var item = new ProblemItem { Index = items.Count, Pad = planned, CanTurn = planned.Shape == PlannedShape.Rect && planned.Width != planned.Height };
                items.Add(item);
                item.Islands = [islands.Count];
                islands.Add(new ProblemIsland
                {
                    Item = item.Index, Net = index, Round = planned.Shape == PlannedShape.Round,
                    HalfW = planned.Width / 2, HalfH = planned.Height / 2, Capacity = planned.Capacity, Id = NextId(usedIds, ref padNumber),
                });
            }
            net.Leads = netLeads;
            net.FreeLeads = [.. netLeads.Where(l => leads[l].OwnIsland < 0)];
            net.Islands = [.. islands.Select((s, i) => (s, i)).Where(x => x.s.Net == index).Select(x => x.i)];
            if (net.Islands.Length > 1 && !rules.AllowJumpers)
                throw new PlacementImpossibleException(new PlacementFailure(
                    $"net {net.Net.Name} needs {net.Islands.Length} pads or strip segments joined by jumpers (its leads do not fit on one), but jumpers are switched off.",
                    "Set rules.allowJumpers to true, or change the circuit so the net's leads fit on one pad."));
            var capacity = net.Islands.Sum(i => islands[i].Capacity);
            if (capacity < netLeads.Length)
                throw new PlacementImpossibleException(new PlacementFailure(
                    $"net {net.Net.Name} has {netLeads.Length} leads but its kept pads hold only {capacity}.",
                    "Unlock or remove the net's kept pads so the placer can size them, or run without --keep-existing."));
        }

        foreach (var island in islands) BareCopper(island, items[island.Item]);

        foreach (var item in items)
        {
            var touched = new SortedSet<int>();
            foreach (var l in item.Leads) if (leads[l].Net >= 0) touched.Add(leads[l].Net);
            foreach (var s in item.Islands) if (islands[s].Net >= 0) touched.Add(islands[s].Net);
            item.Nets = [.. touched];
            var roles = item.Nets.Select(n => nets[n].Net.Role).ToList();
            if (item.Pad is not null || item.IsLanding)
                item.Flow = roles.Contains(SignalRole.Output) ? 1 : roles.Contains(SignalRole.Input) ? -1 : 0;
        }

        var problem = new PlacementProblem
        {
            Project = project, Items = [.. items], Islands = [.. islands], Leads = [.. leads], Nets = [.. nets],
            Region = default, AutoBoard = project.Board.IsAuto, Weights = weights, Rules = rules,
        };
        var board = project.Board;
        var region = board.IsAuto ? AutoRegion(problem, board.Margin, PlacerLimits.AutoAreaFactor(project.Parts.Count)) : Region.OfBoard(board.Width!.Value, board.Height!.Value, board.Margin);
        return problem.WithRegion(region);
    }

    /// <summary>Sets where leads from elsewhere land on an island: the largest piece of it that its own item's body leaves bare, or all of it.</summary>
    private static void BareCopper(ProblemIsland s, ProblemItem owner)
    {
        (s.LandX, s.LandY, s.LandHalfW, s.LandHalfH) = (s.LocalX, s.LocalY, s.HalfW, s.HalfH);
        if (BarePiece(s, owner) is not { } bare) return;
        (s.LandX, s.LandY, s.LandHalfW, s.LandHalfH) = ((bare.X0 + bare.X1) / 2, (bare.Y0 + bare.Y1) / 2, (bare.X1 - bare.X0) / 2, (bare.Y1 - bare.Y0) / 2);
        s.Covered = true;
    }

    /// <summary>The largest piece of a strip segment that its own part's body leaves bare (part coordinates), when the body covers some of it; null when the body leaves it all bare or covers it all (the check judges what lands there).</summary>
    private static (double X0, double Y0, double X1, double Y1)? BarePiece(ProblemIsland s, ProblemItem owner)
    {
        var (x0, y0, x1, y1) = (s.LocalX - s.HalfW, s.LocalY - s.HalfH, s.LocalX + s.HalfW, s.LocalY + s.HalfH);
        var (bx0, by0, bx1, by1) = (owner.BodyMinX, owner.BodyMinY, owner.BodyMaxX, owner.BodyMaxY);
        if (s.Round || !owner.IsPart || !owner.HasBody || bx0 >= x1 || bx1 <= x0 || by0 >= y1 || by1 <= y0) return null;
        // the bare pieces beside the body, each the island's full width or height
        (double X0, double Y0, double X1, double Y1)[] pieces = [(x0, y0, bx0, y1), (bx1, y0, x1, y1), (x0, y0, x1, by0), (x0, by1, x1, y1)];
        var best = pieces.Where(p => p.X1 > p.X0 && p.Y1 > p.Y0).OrderByDescending(p => (p.X1 - p.X0) * (p.Y1 - p.Y0)).FirstOrDefault();
        return best == default ? null : best;
    }

    private static string NextId(HashSet<string> used, ref int number)
    {
        string id;
        do id = GeneratedIds.Pad(++number); while (!used.Add(id));
        return id;
    }

    /// <summary>A first guess at the region for an automatic board: the raw area times a factor, 3:2 landscape because signals run left to right.</summary>
    public static Region AutoRegion(PlacementProblem problem, double margin, double factor)
    {
        var groundRoom = problem.Leads.Count(l => l.Ground) * Math.Pow(2 * problem.Rules.GroundGap, 2);
        var area = (problem.RawArea + groundRoom) * factor;
        var largest = problem.Items.Where(i => i.HasBody).Select(i => Math.Max(i.BodyMaxX - i.BodyMinX, i.BodyMaxY - i.BodyMinY)).DefaultIfEmpty(0).Max() + 10;
        var width = Math.Max(largest, Math.Sqrt(area * 1.5));
        var height = Math.Max(largest, area / width);
        return new Region(margin, margin, margin + width, margin + height);
    }

    private static void AddLeads(Project project, ProblemItem item, Dictionary<string, int> netIndex, Dictionary<string, Net> groundNets, List<ProblemLead> leads, CostWeights weights)
    {
        var part = item.Part!;
        var footprint = item.Footprint!;
        var pins = footprint.PinNames(part.Variant);
        var cx = (item.BodyMinX + item.BodyMaxX) / 2;
        var cy = (item.BodyMinY + item.BodyMaxY) / 2;
        var own = new List<int>();
        var ground = new List<int>();
        for (var i = 0; i < footprint.Leads.Count; i++)
        {
            var fl = footprint.Leads[i];
            var netName = part.NetOf(pins[i]);
            if (netName is null && footprint.Mount != MountStyle.Strip) continue; // an unconnected lead is cut off short
            var (ox, oy) = (fl.Exit.X - cx, fl.Exit.Y - cy);
            var len = Math.Sqrt(ox * ox + oy * oy);
            (ox, oy) = len < 0.1 ? (0.0, -1.0) : (ox / len, oy / len);
            var lead = new ProblemLead
            {
                Item = item.Index, Pin = pins[i], Diameter = fl.Diameter, MinReach = fl.MinReach,
                ExitX = fl.Exit.X, ExitY = fl.Exit.Y, OutX = ox, OutY = oy,
            };
            Net? net = null;
            if (netName is not null && groundNets.TryGetValue(netName, out var g)) { lead.Ground = true; net = g; }
            else if (netName is not null) { lead.Net = netIndex[netName]; net = project.Nets.First(n => n.Name == netName); }
            lead.MaxReach = net is null ? fl.MaxReach : Math.Min(fl.MaxReach, project.Rules.MaxLeadFor(net));
            lead.Weight = net?.Class == NetClass.Rf ? weights.RfFactor : 1;
            if (lead.MinReach > lead.MaxReach - 2 * PlacerLimits.Safety)
                throw new PlacementImpossibleException(new PlacementFailure(
                    FormattableString.Invariant($"lead {part.Ref}.{pins[i]} needs at least {fl.MinReach:0.##} mm of lead to bend, but net {netName} allows at most {lead.MaxReach:0.##} mm."),
                    $"Raise the net's maxLead (or the class limit in rules), or use a footprint whose lead can be bent shorter."));
            if (lead.Ground) GroundCandidates(lead);
            if (lead.Ground) ground.Add(leads.Count);
            own.Add(leads.Count);
            leads.Add(lead);
        }
        item.Leads = [.. own];
        item.GroundLeads = [.. ground];
    }

    /// <summary>
    /// A held part's ground leads start where the layout has them meet the plane (the nearest candidate landing): holding a
    /// part holds its landings too, unless a move must change one. Starting every such lead on its first candidate instead
    /// broke rules the layout kept (a placed project held whole did not place again).
    /// </summary>
    private static void KeepGroundLandings(ProblemItem item, Placement held, List<ProblemLead> leads)
    {
        foreach (var l in item.GroundLeads)
        {
            var lead = leads[l];
            if (held.Leads.FirstOrDefault(x => x.OnPlane && string.Equals(x.Pin, lead.Pin, StringComparison.Ordinal)) is not { } landing) continue;
            var (best, bestD) = (0, double.PositiveInfinity);
            for (var c = 0; c < lead.GroundX.Length; c++)
            {
                var (gx, gy) = Geometry.Rotate(item.StartRot, lead.GroundX[c], lead.GroundY[c]);
                var (dx, dy) = (item.StartX + gx - landing.At.X, item.StartY + gy - landing.At.Y);
                var d = dx * dx + dy * dy;
                if (d < bestD) (best, bestD) = (c, d);
            }
            lead.StartChoice = best;
        }
    }

    private static void GroundCandidates(ProblemLead lead)
    {
        var xs = new List<double>();
        var ys = new List<double>();
        var rs = new List<double>();
        var shortest = lead.MinReach > 0 ? lead.MinReach + PlacerLimits.Safety : 0;
        if (shortest == 0) { xs.Add(lead.ExitX); ys.Add(lead.ExitY); rs.Add(0); }
        var first = Math.Max(shortest, 0.8);
        foreach (var step in PlacerLimits.GroundSteps)
        {
            var r = first + step;
            if (r > lead.MaxReach - PlacerLimits.Safety) break;
            foreach (var turn in PlacerLimits.GroundTurns)
            {
                var a = turn * Math.PI / 180;
                var (dx, dy) = (lead.OutX * Math.Cos(a) - lead.OutY * Math.Sin(a), lead.OutX * Math.Sin(a) + lead.OutY * Math.Cos(a));
                xs.Add(lead.ExitX + dx * r);
                ys.Add(lead.ExitY + dy * r);
                rs.Add(r);
            }
        }
        if (xs.Count == 0) { xs.Add(lead.ExitX + lead.OutX * shortest); ys.Add(lead.ExitY + lead.OutY * shortest); rs.Add(shortest); }
        lead.GroundX = [.. xs];
        lead.GroundY = [.. ys];
        lead.GroundReach = [.. rs];
    }

    private static void AddStrips(Project project, ProblemItem item, Dictionary<string, int> netIndex, List<ProblemIsland> islands, List<ProblemLead> leads)
    {
        var runs = StripLayout.For(item.Part!, item.Footprint!, project);
        item.Strips = runs;
        var own = new List<int>();
        var byPin = item.Leads.ToDictionary(l => leads[l].Pin, StringComparer.Ordinal);
        foreach (var run in runs)
        {
            var capacityInner = project.Toolkit.RectCapacity(run.Width, run.Pitch - run.Score);
            var group = islands.Count;
            for (var k = 0; k < run.Pins.Count; k++)
            {
                var pin = run.Pins[k];
                // Every segment is one pitch long, with the score's half-width lost on inner ends.
                var from = k * run.Pitch + (k > 0 ? run.Score / 2 : 0);
                var to = (k + 1) * run.Pitch - (k < run.Pins.Count - 1 ? run.Score / 2 : 0);
                var mid = (from + to) / 2;
                var island = new ProblemIsland
                {
                    Item = item.Index, Net = pin.Net is null ? -1 : netIndex[pin.Net], Round = false,
                    LocalX = run.Vertical ? run.Start.X : run.Start.X + mid, LocalY = run.Vertical ? run.Start.Y + mid : run.Start.Y,
                    HalfW = run.Vertical ? run.Width / 2 : (to - from) / 2, HalfH = run.Vertical ? (to - from) / 2 : run.Width / 2,
                    Capacity = capacityInner, StripGroup = group, StripIndex = k, Id = $"{item.Part!.Ref}-{pin.Pin}",
                };
                // Leads from elsewhere land only on the copper the body leaves bare: the segment takes its own pin and what fits there.
                if (BarePiece(island, item) is { } bare)
                    island.Capacity = Math.Min(island.Capacity, 1 + project.Toolkit.LeadsOn(bare.X1 - bare.X0, bare.Y1 - bare.Y0));
                leads[byPin[pin.Pin]].OwnIsland = islands.Count;
                own.Add(islands.Count);
                islands.Add(island);
            }
        }
        item.Islands = [.. own];
    }

    /// <summary>A fixed strip-mounted part keeps its pins on whatever kept island of the right net lies beneath each pin.</summary>
    private static void PinFixedStripLeads(List<ProblemItem> items, List<ProblemIsland> islands, List<ProblemLead> leads)
    {
        foreach (var item in items.Where(i => i.Fixed && i.Footprint?.Mount == MountStyle.Strip))
            foreach (var l in item.Leads)
            {
                var lead = leads[l];
                if (lead.Ground) continue;
                var (ex, ey) = Geometry.Rotate(item.StartRot, lead.ExitX, lead.ExitY);
                ex += item.StartX;
                ey += item.StartY;
                for (var s = 0; s < islands.Count; s++)
                {
                    var island = islands[s];
                    if (island.Net != lead.Net || !items[island.Item].Fixed || items[island.Item].IsPart) continue;
                    if (Math.Abs(ex - island.LocalX) <= island.HalfW && Math.Abs(ey - island.LocalY) <= island.HalfH) { lead.OwnIsland = s; break; }
                }
            }
    }
}
