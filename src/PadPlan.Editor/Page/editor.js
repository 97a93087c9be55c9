// PadPlan bench: the page of `padplan edit`. Plain JavaScript, no libraries, nothing fetched from outside.
// The server owns the plan and runs the real check after every change; this page only draws what it is sent and
// sends small edits back. Project text is only ever placed with textContent, never parsed as HTML.
"use strict";

const token = new URLSearchParams(location.search).get("t") || "";
const svgNs = "http://www.w3.org/2000/svg";
const $ = id => document.getElementById(id);

const state = {
  plan: null,        // the last view the server sent
  tool: "pick",      // pick | pad | link
  chosen: null,      // { kind: "part" | "pad" | "link", id }
  linkFrom: null,    // first island of a jumper being made
  lit: new Set(),    // ids, refs, lead names and nets to highlight
  litFinding: null,  // rule and message of the finding whose items are lit, so a new view can tell whether it is still there
  view: null,        // { x, y, w, h } in board mm
  placing: false,
};

// ---------- talking to the server ----------

async function call(method, path, body) {
  const init = { method, headers: { "X-PadPlan-Token": token } };
  if (body !== undefined) {
    init.headers["Content-Type"] = "application/json";
    init.body = JSON.stringify(body);
  }
  const response = await fetch(path, init);
  let data = null;
  try { data = await response.json(); } catch { data = null; }
  return { ok: response.ok, status: response.status, data };
}

async function load() {
  const r = await call("GET", "/api/plan");
  if (r.ok) show(r.data); else notice((r.data && r.data.message) || "the editor did not answer");
}

async function edit(change) {
  const r = await call("POST", "/api/edit", change);
  if (r.ok) show(r.data);
  else { notice((r.data && r.data.message) || "the change was refused"); draw(); }
}

async function step(which) {
  const r = await call("POST", "/api/" + which);
  if (r.ok) show(r.data);
  else notice((r.data && r.data.message) || "the editor did not answer");
}

async function save() {
  const r = await call("POST", "/api/save");
  if (r.ok) { notice(r.data.message); await load(); return; }
  notice(r.data ? r.data.message : "saving failed", r.status === 409);
}

async function keepCopy() {
  const r = await call("POST", "/api/keep-copy");
  notice(r.data ? r.data.message : "keeping a copy failed");
  await load();
}

async function placeRest() {
  const r = await call("POST", "/api/place");
  if (!r.ok) { notice(r.data ? r.data.message : "the placer did not start"); return; }
  state.placing = true;
  controls();
  watchPlacer();
}

async function watchPlacer() {
  const r = await call("GET", "/api/place");
  if (!r.ok) return;
  const p = r.data;
  $("place-status").textContent = p.running
    ? `run ${p.run} of ${p.runs}: ${p.stage || "starting"}${p.step ? ", step " + p.step : ""}${p.left ? "; " + p.left : ""}`
    : p.note || "idle";
  if (p.running) { setTimeout(watchPlacer, 250); return; }
  state.placing = false;
  await load();
  if (p.note) notice(p.note);
}

async function finish() {
  if (state.plan && state.plan.unsaved && !confirm("There are unsaved changes. Finish anyway? They stay in the recovery copy beside the project.")) return;
  await call("POST", "/api/finish");
  window.onbeforeunload = null;
  document.body.textContent = "The editor has stopped. You can close this tab.";
}

// ---------- showing a view ----------

function show(plan) {
  state.plan = plan;
  if (state.chosen && !exists(state.chosen)) state.chosen = null;
  $("file").textContent = plan.file;
  $("unsaved").hidden = !plan.unsaved;
  document.title = (plan.unsaved ? "* " : "") + plan.project + " - PadPlan bench";
  fillSelect($("pad-net"), plan.netNames, $("pad-net").value);
  fillSelect($("pad-size"), plan.punches.map(String), $("pad-size").value);
  if (!state.view && plan.geometry) state.view = restoredView() || whole();
  findings();
  nets();
  draw();
  controls();
  $("status").textContent = `revision ${plan.revision}; checked in ${plan.checkMilliseconds} ms; ${plan.errors} errors, ${plan.warnings} warnings`;
  told();
}

// The 3D view (view3d.js) hears of every new plan and choice, and may choose in turn.
function told() { document.dispatchEvent(new CustomEvent("bench:changed", { detail: { plan: state.plan, chosen: state.chosen } })); }
document.addEventListener("bench:choose", e => choose(e.detail));

function exists(c) {
  const g = state.plan.geometry;
  if (!g) return false;
  if (c.kind === "part") return g.parts.some(p => p.ref === c.id);
  if (c.kind === "pad") return state.plan.pads.some(p => p.id === c.id);
  return g.jumpers.some(j => j.id === c.id);
}

function fillSelect(select, values, keep) {
  select.replaceChildren(...values.map(v => { const o = document.createElement("option"); o.value = v; o.textContent = v; return o; }));
  if (values.includes(keep)) select.value = keep;
}

function controls() {
  const p = state.plan;
  $("undo").disabled = !p || !p.canUndo || state.placing;
  $("redo").disabled = !p || !p.canRedo || state.placing;
  const c = state.chosen;
  $("turn").disabled = !c || c.kind !== "part" || state.placing;
  $("hold").disabled = !c || c.kind === "link" || state.placing;
  $("hold").textContent = c && isHeld(c) ? "Let go" : "Hold";
  $("remove").disabled = !c || c.kind === "part" || state.placing;
  $("swap-open").disabled = !c || c.kind !== "part" || state.placing;
  if (!c || c.kind !== "part" || c.id !== $("swap-panel").dataset.ref) $("swap-panel").hidden = true;
  $("place").disabled = state.placing;
  $("stop-place").hidden = !state.placing;
  for (const t of ["pick", "pad", "link"]) $("tool-" + t).classList.toggle("on", state.tool === t);
  $("chosen").textContent = c ? describe(c) : "nothing; click a part, pad, strip or jumper";
  window.onbeforeunload = p && p.unsaved ? e => { e.preventDefault(); e.returnValue = ""; return ""; } : null;
}

function isHeld(c) {
  if (c.kind === "part") return state.plan.heldParts.includes(c.id);
  const pad = state.plan.pads.find(p => p.id === c.id);
  return !!(pad && pad.held);
}

function describe(c) {
  const g = state.plan.geometry;
  if (c.kind === "part") {
    const p = g.parts.find(x => x.ref === c.id);
    return `part ${p.ref} (${p.value}, ${p.footprint}) at ${mm(p.position[0])}, ${mm(p.position[1])} turned ${p.rotation}°${isHeld(c) ? ", held" : ""}`;
  }
  if (c.kind === "pad") {
    const p = state.plan.pads.find(x => x.id === c.id);
    const nets = [...new Set(g.pads.filter(i => p.islands.includes(i.id)).map(i => i.net || "no net"))];
    return `${p.kind === "strip" ? "strip" : p.kind + " pad"} ${p.id} (net ${nets.join(", ")}) at ${mm(p.x)}, ${mm(p.y)}${p.held ? ", held" : ""}`;
  }
  const j = g.jumpers.find(x => x.id === c.id);
  return `jumper ${j.id} from ${j.from} to ${j.to}`;
}

const mm = v => (Math.round(v * 100) / 100).toString();

function notice(text, offerCopy) {
  $("notice-text").textContent = text;
  $("keep-copy").hidden = !offerCopy;
  $("notice").hidden = false;
}

function findings() {
  const p = state.plan;
  $("check-sum").textContent = p.errors + p.warnings === 0 ? "- no errors or warnings" : `- ${p.errors} errors, ${p.warnings} warnings`;
  const list = $("findings");
  list.replaceChildren(...p.findings.map((f, i) => {
    const li = document.createElement("li");
    li.className = f.severity;
    li.dataset.rule = f.rule;
    li.dataset.index = i;
    const sev = document.createElement("span"); sev.className = "sev"; sev.textContent = f.severity === "info" ? "note" : f.severity;
    const rule = document.createElement("code"); rule.textContent = f.rule;
    const msg = document.createElement("span"); msg.className = "msg"; msg.textContent = " " + f.message;
    const hint = document.createElement("span"); hint.className = "hint"; hint.textContent = f.hint;
    li.append(sev, rule, msg, hint);
    if (state.litFinding === key(f)) { li.classList.add("on"); state.lit = new Set(f.items); }
    li.addEventListener("click", () => {
      const on = li.classList.contains("on");
      for (const other of list.children) other.classList.remove("on");
      state.lit = on ? new Set() : new Set(f.items);
      state.litFinding = on ? null : key(f);
      if (!on) li.classList.add("on");
      light();
    });
    return li;
  }));
  // The finding that was lit is gone (mended, or taken back): nothing stays lit for it.
  if (state.litFinding && !p.findings.some(f => key(f) === state.litFinding)) unlight();
}

const key = f => f.rule + "\n" + f.message;

function unlight() {
  state.lit = new Set();
  state.litFinding = null;
  hoverNet = null;
  for (const li of $("findings").children) li.classList.remove("on");
  light();
}

function nets() {
  const list = $("nets");
  list.replaceChildren(...state.plan.netNames.map(n => {
    const li = document.createElement("li");
    li.textContent = n;
    li.addEventListener("mouseenter", () => lightNet(n));
    li.addEventListener("mouseleave", () => lightNet(null));
    return li;
  }));
}

// ---------- drawing ----------

function el(name, attrs, parent) {
  const e = document.createElementNS(svgNs, name);
  for (const [k, v] of Object.entries(attrs)) if (v !== undefined && v !== null) e.setAttribute(k, v);
  if (parent) parent.appendChild(e);
  return e;
}

function draw() {
  const svg = $("board");
  svg.replaceChildren();
  const g = state.plan && state.plan.geometry;
  $("empty").hidden = !!g;
  if (!g) return;
  const v = state.view;
  svg.setAttribute("viewBox", `${v.x} ${v.y} ${v.w} ${v.h}`);
  el("polygon", { class: "plane", points: g.board.outline.map(p => p.join(",")).join(" ") }, svg);
  const m = g.board.margin;
  el("rect", { class: "margin", x: m, y: m, width: g.board.width - 2 * m, height: g.board.height - 2 * m }, svg);
  for (const k of g.board.keepouts) shape(k, { class: "keepout" }, svg);
  const heldPads = new Set(state.plan.pads.filter(p => p.held).map(p => p.id));
  const padOf = new Map();
  for (const p of state.plan.pads) for (const i of p.islands) padOf.set(i, p.id);
  const pads = el("g", { id: "pads" }, svg);
  for (const i of g.pads) {
    const owner = padOf.get(i.id) || i.id;
    const s = shape(i, { class: "island" + (heldPads.has(owner) ? " held" : ""), "data-id": i.id, "data-pad": owner, "data-net": i.net }, pads);
    s.addEventListener("pointerdown", e => startDrag(e, { kind: "pad", id: owner, island: i.id }));
    s.addEventListener("mouseenter", () => lightNet(i.net));
    s.addEventListener("mouseleave", () => lightNet(null));
  }
  const links = el("g", { id: "links" }, svg);
  for (const j of g.jumpers) {
    const line = el("polyline", { class: "link", points: j.path.map(p => p.join(",")).join(" "), "data-id": j.id }, links);
    line.addEventListener("pointerdown", e => { e.stopPropagation(); choose({ kind: "link", id: j.id }); });
  }
  const held = new Set(state.plan.heldParts);
  const marksOf = new Map();
  for (const m of state.plan.marks) { if (!marksOf.has(m.ref)) marksOf.set(m.ref, []); marksOf.get(m.ref).push(m); }
  const named = new Set(state.plan.namedPins);
  const parts = el("g", { id: "parts" }, svg);
  for (const p of g.parts) {
    const group = el("g", { class: "part" + (held.has(p.ref) ? " held" : ""), "data-ref": p.ref, "data-x": p.position[0], "data-y": p.position[1] }, parts);
    for (const l of p.leads) {
      el("line", { class: "lead", x1: l.exit[0], y1: l.exit[1], x2: l.landing[0], y2: l.landing[1], "data-lead": `${p.ref}.${l.pin}`, "data-net": l.net }, group);
    }
    const body = el("polygon", { class: "body", points: p.body.map(q => q.join(",")).join(" "), "data-ref": p.ref }, group);
    body.addEventListener("pointerdown", e => startDrag(e, { kind: "part", id: p.ref }));
    el("title", {}, body).textContent = `${p.ref}: ${p.value} (${p.footprint})`;
    for (const m of marksOf.get(p.ref) || [])
      el("polygon", { class: "mark " + m.kind + (m.filled ? " filled" : ""), points: m.points.map(q => q.join(",")).join(" "), "data-mark": m.kind, "data-of": `${p.ref}.${m.lead}` }, group);
    const c = centre(p.body);
    const t = el("text", { class: "ref", x: c[0], y: c[1] - (showValues() ? 0.9 : 0) }, group);
    t.textContent = p.ref;
    // A long value ("12:3 turns bifilar toroid") is cut short on the body; the whole of it is in the body's hover title.
    if (showValues()) el("text", { class: "value", x: c[0], y: c[1] + 0.9 }, group).textContent = p.value.length > 10 ? p.value.slice(0, 9) + "\u2026" : p.value;
    for (const l of p.leads) {
      const end = el("circle", { class: "end" + (l.pad === null ? " plane-end" : ""), cx: l.landing[0], cy: l.landing[1], r: Math.max(0.4, l.diameter * 0.6), "data-lead": `${p.ref}.${l.pin}`, "data-net": l.net }, group);
      end.addEventListener("pointerdown", e => startDrag(e, { kind: "end", id: p.ref, pin: l.pin, x: l.landing[0], y: l.landing[1] }));
    }
    // Pin names (E/B/C, A/K, +/-) beside each lead end, as the assembly view prints them.
    if (named.has(p.ref))
      for (const l of p.leads) el("text", { class: "pin", x: l.landing[0], y: l.landing[1] - Math.max(0.9, l.diameter * 0.6 + 0.6), "data-of": `${p.ref}.${l.pin}` }, group).textContent = l.pin === "-" ? "\u2212" : l.pin;
  }
  // Pad ids last, so they read above part bodies.
  const ids = el("g", { id: "padids" }, svg);
  for (const i of g.pads) el("text", { class: "padid", x: i.x, y: i.y, "data-for": i.id }, ids).textContent = i.id;
  const threads = el("g", { id: "threads" }, svg);
  for (const o of state.plan.open) el("line", { class: "thread", x1: o.from[0], y1: o.from[1], x2: o.to[0], y2: o.to[1], "data-net": o.net }, threads);
  light();
}

function shape(s, attrs, parent) {
  return s.shape === "round"
    ? el("circle", { ...attrs, cx: s.x, cy: s.y, r: s.d / 2 }, parent)
    : el("rect", { ...attrs, x: s.x - s.w / 2, y: s.y - s.h / 2, width: s.w, height: s.h }, parent);
}

function centre(points) {
  const xs = points.map(p => p[0]), ys = points.map(p => p[1]);
  return [(Math.min(...xs) + Math.max(...xs)) / 2, (Math.min(...ys) + Math.max(...ys)) / 2];
}

function light() {
  const lit = state.lit;
  for (const e of $("board").querySelectorAll("[data-id],[data-ref],[data-lead],[data-net],[data-pad]")) {
    const d = e.dataset;
    const on = lit.size > 0 && (lit.has(d.id) || lit.has(d.ref) || lit.has(d.lead) || lit.has(d.net) || lit.has(d.pad));
    e.classList.toggle("lit", on);
  }
  for (const e of $("board").querySelectorAll(".chosen")) e.classList.remove("chosen");
  const c = state.chosen;
  if (!c) return;
  const sel = c.kind === "part" ? `g.part[data-ref="${CSS.escape(c.id)}"]` : c.kind === "pad" ? `.island[data-pad="${CSS.escape(c.id)}"]` : `.link[data-id="${CSS.escape(c.id)}"]`;
  for (const e of $("board").querySelectorAll(sel)) e.classList.add("chosen");
}

let hoverNet = null;
function lightNet(net) {
  if (hoverNet === net) return;
  hoverNet = net;
  for (const e of $("board").querySelectorAll("[data-net]")) e.classList.toggle("lit", !!net && e.dataset.net === net);
  if (!net) light();
}

// ---------- zoom and pan ----------

function whole() {
  const g = state.plan.geometry, pad = 4;
  return { x: -pad, y: -pad, w: g.board.width + 2 * pad, h: g.board.height + 2 * pad };
}

function restoredView() {
  try {
    const v = JSON.parse(sessionStorage.getItem("padplan-view") || "null");
    return v && [v.x, v.y, v.w, v.h].every(Number.isFinite) && v.w > 0 && v.h > 0 ? v : null;
  } catch { return null; }
}

function setView(v) {
  state.view = v;
  sessionStorage.setItem("padplan-view", JSON.stringify(v));
  $("board").setAttribute("viewBox", `${v.x} ${v.y} ${v.w} ${v.h}`);
}

function zoom(factor, at) {
  const v = state.view;
  if (!v) return;
  const c = at || [v.x + v.w / 2, v.y + v.h / 2];
  setView({ x: c[0] - (c[0] - v.x) * factor, y: c[1] - (c[1] - v.y) * factor, w: v.w * factor, h: v.h * factor });
}

function pan(dx, dy) {
  const v = state.view;
  if (v) setView({ ...v, x: v.x + dx * v.w, y: v.y + dy * v.h });
}

// Screen pixels to board millimetres, through the drawing's own transform.
function toBoard(e) {
  const svg = $("board");
  const p = svg.createSVGPoint();
  p.x = e.clientX; p.y = e.clientY;
  const q = p.matrixTransform(svg.getScreenCTM().inverse());
  return [q.x, q.y];
}

const grid = () => parseFloat($("grid").value);
const snap = v => Math.round(Math.round(v / grid()) * grid() * 1000) / 1000;

// ---------- dragging and clicking ----------

let drag = null;

function startDrag(e, what) {
  if (e.button !== 0 || state.placing) return;
  e.stopPropagation();
  e.preventDefault();
  if (state.tool === "link" && what.kind === "pad") { linkClick(what.island); return; }
  if (state.tool === "pad") return;
  // A lead end belongs to its part: grabbing it (on an upright part it lies inside the body) chooses that part.
  choose({ kind: what.kind === "end" ? "part" : what.kind, id: what.id });
  drag = { what, from: toBoard(e), moved: false, target: e.target };
  $("board").setPointerCapture(e.pointerId);
}

function onMove(e) {
  if (!drag) return;
  const at = toBoard(e);
  const dx = at[0] - drag.from[0], dy = at[1] - drag.from[1];
  if (Math.hypot(dx, dy) > 0.05) drag.moved = true;
  const w = drag.what;
  if (w.kind === "pan") { const v = state.view; setView({ ...v, x: drag.view.x - (e.clientX - drag.screen[0]) * v.w / $("board").clientWidth, y: drag.view.y - (e.clientY - drag.screen[1]) * v.h / $("board").clientHeight }); return; }
  if (w.kind === "part") $("board").querySelector(`g.part[data-ref="${CSS.escape(w.id)}"]`).setAttribute("transform", `translate(${dx} ${dy})`);
  if (w.kind === "pad") for (const s of $("board").querySelectorAll(`.island[data-pad="${CSS.escape(w.id)}"]`)) s.setAttribute("transform", `translate(${dx} ${dy})`);
  if (w.kind === "end") {
    const lead = `${w.id}.${w.pin}`;
    for (const s of $("board").querySelectorAll(`[data-lead="${CSS.escape(lead)}"]`)) {
      if (s.tagName === "circle") { s.setAttribute("cx", at[0]); s.setAttribute("cy", at[1]); }
      else { s.setAttribute("x2", at[0]); s.setAttribute("y2", at[1]); }
    }
  }
}

function onUp(e) {
  if (!drag) return;
  const d = drag;
  drag = null;
  if (d.what.kind === "pan" || !d.moved) { if (d.what.kind === "pan" && !d.moved && state.tool === "pick") choose(null); return; }
  const at = toBoard(e);
  const dx = at[0] - d.from[0], dy = at[1] - d.from[1];
  const w = d.what;
  if (w.kind === "part") {
    const p = state.plan.geometry.parts.find(x => x.ref === w.id);
    edit({ kind: "move-part", ref: w.id, x: snap(p.position[0] + dx), y: snap(p.position[1] + dy) });
  } else if (w.kind === "pad") {
    const p = state.plan.pads.find(x => x.id === w.id);
    edit({ kind: "move-pad", pad: w.id, x: snap(p.x + dx), y: snap(p.y + dy) });
  } else if (w.kind === "end") {
    // Dropped on pad copper: the lead lands there; dropped on bare board: it lands on the plane.
    const under = document.elementsFromPoint(e.clientX, e.clientY).find(x => x.classList && x.classList.contains("island"));
    const point = [snap(at[0]), snap(at[1])];
    if (under) edit({ kind: "land-lead", ref: w.id, pin: w.pin, x: point[0], y: point[1] });
    else edit({ kind: "land-lead", ref: w.id, pin: w.pin, x: point[0], y: point[1], net: "plane" });
  }
}

function onBoardDown(e) {
  if (drag || !state.plan || !state.plan.geometry) return;
  if (state.tool === "pad" && e.button === 0) {
    const at = toBoard(e);
    edit({ kind: "add-pad", x: snap(at[0]), y: snap(at[1]), net: $("pad-net").value, size: parseFloat($("pad-size").value) });
    return;
  }
  drag = { what: { kind: "pan" }, from: toBoard(e), screen: [e.clientX, e.clientY], view: { ...state.view }, moved: false };
  $("board").setPointerCapture(e.pointerId);
}

function linkClick(island) {
  if (!state.linkFrom) { state.linkFrom = island; notice(`jumper from ${island}: now click the other pad`); return; }
  const from = state.linkFrom;
  state.linkFrom = null;
  $("notice").hidden = true;
  if (from !== island) edit({ kind: "add-link", from, to: island });
}

function choose(c) {
  state.chosen = c;
  controls();
  light();
  told();
}

function setTool(t) {
  state.tool = t;
  state.linkFrom = null;
  controls();
}

function turn() { if (state.chosen && state.chosen.kind === "part") edit({ kind: "turn-part", ref: state.chosen.id }); }

function hold() {
  const c = state.chosen;
  if (!c || c.kind === "link") return;
  const change = { kind: "hold", held: !isHeld(c) };
  if (c.kind === "part") change.ref = c.id; else change.pad = c.id;
  edit(change);
}

function remove() {
  const c = state.chosen;
  if (!c) return;
  if (c.kind === "pad") edit({ kind: "remove-pad", pad: c.id });
  if (c.kind === "link") edit({ kind: "remove-link", link: c.id });
}

function showValues() { return $("values").checked; }

function toggleValues() { $("values").checked = !$("values").checked; valuesChanged(); }

function valuesChanged() {
  sessionStorage.setItem("padplan-values", $("values").checked ? "1" : "");
  draw();
}

// ---------- swapping a part for the one on hand ----------

async function openSwap() {
  const c = state.chosen;
  if (!c || c.kind !== "part") return;
  const r = await call("GET", "/api/swap?ref=" + encodeURIComponent(c.id));
  if (!r.ok) { notice((r.data && r.data.message) || "the editor did not answer"); return; }
  const s = r.data;
  $("swap-panel").dataset.ref = s.ref;
  $("swap-ref").textContent = `${s.ref} (${s.value}, ${s.footprint}${s.variant ? ", " + s.variant : ""})`;
  const fp = $("swap-footprint");
  fp.replaceChildren(...s.footprints.map(f => { const o = document.createElement("option"); o.value = f.name; o.textContent = f.name; o.title = f.description; o.dataset.variants = JSON.stringify(f.variants); return o; }));
  fp.value = s.footprint;
  fillVariants(s.variant);
  $("swap-value").value = s.value;
  $("swap-widen").value = "0";
  $("swap-panel").hidden = false;
}

function fillVariants(keep) {
  const o = $("swap-footprint").selectedOptions[0];
  const variants = o ? JSON.parse(o.dataset.variants) : [];
  fillSelect($("swap-variant"), ["", ...variants], keep || "");
  $("swap-variant").options[0].textContent = variants.length ? "(first)" : "(none)";
  $("swap-variant").disabled = variants.length === 0;
}

async function doSwap() {
  const ref = $("swap-panel").dataset.ref;
  $("swap-go").disabled = true;
  notice(`swapping ${ref} and placing it again among its neighbours ...`);
  const r = await call("POST", "/api/edit", { kind: "swap-part", ref, footprint: $("swap-footprint").value, variant: $("swap-variant").value || null, value: $("swap-value").value, widen: parseInt($("swap-widen").value, 10) });
  $("swap-go").disabled = false;
  if (!r.ok) { notice((r.data && r.data.message) || "the swap was refused"); return; }
  show(r.data);
  notice(`swapped ${ref}; the check ${r.data.errors === 0 ? "passes" : "finds " + r.data.errors + " errors"}. Take back undoes it.`);
  $("swap-panel").hidden = true;
}

// ---------- wiring up ----------

function keys(e) {
  if (e.target.tagName === "SELECT" || e.target.tagName === "INPUT") return;
  const k = e.key, ctrl = e.ctrlKey || e.metaKey;
  if (ctrl && (k === "z" || k === "Z")) { e.preventDefault(); step(e.shiftKey ? "redo" : "undo"); return; }
  if (ctrl && k === "s") { e.preventDefault(); save(); return; }
  if (ctrl) return;
  const actions = {
    "+": () => zoom(1 / 1.25), "=": () => zoom(1 / 1.25), "-": () => zoom(1.25), "0": () => setView(whole()),
    ArrowLeft: () => pan(-0.1, 0), ArrowRight: () => pan(0.1, 0), ArrowUp: () => pan(0, -0.1), ArrowDown: () => pan(0, 0.1),
    t: turn, h: hold, Delete: remove, Backspace: remove, p: () => setTool("pick"), n: () => setTool("pad"),
    j: () => setTool("link"), v: toggleValues,
    Escape: () => { setTool("pick"); choose(null); unlight(); },
  };
  if (actions[k]) { e.preventDefault(); actions[k](); }
}

document.addEventListener("DOMContentLoaded", () => {
  const svg = $("board");
  svg.addEventListener("pointerdown", onBoardDown);
  svg.addEventListener("pointermove", onMove);
  svg.addEventListener("pointerup", onUp);
  svg.addEventListener("wheel", e => { e.preventDefault(); zoom(e.deltaY > 0 ? 1.15 : 1 / 1.15, toBoard(e)); }, { passive: false });
  document.addEventListener("keydown", keys);
  $("undo").addEventListener("click", () => step("undo"));
  $("redo").addEventListener("click", () => step("redo"));
  $("tool-pick").addEventListener("click", () => setTool("pick"));
  $("tool-pad").addEventListener("click", () => setTool("pad"));
  $("tool-link").addEventListener("click", () => setTool("link"));
  $("turn").addEventListener("click", turn);
  $("hold").addEventListener("click", hold);
  $("remove").addEventListener("click", remove);
  $("swap-open").addEventListener("click", openSwap);
  $("swap-footprint").addEventListener("change", () => fillVariants(null));
  $("swap-go").addEventListener("click", doSwap);
  $("swap-cancel").addEventListener("click", () => { $("swap-panel").hidden = true; });
  $("values").addEventListener("change", valuesChanged);
  $("place").addEventListener("click", placeRest);
  $("stop-place").addEventListener("click", () => call("POST", "/api/place/stop"));
  $("grid").addEventListener("change", () => sessionStorage.setItem("padplan-grid", $("grid").value));
  $("fit").addEventListener("click", () => setView(whole()));
  $("save").addEventListener("click", save);
  $("keep-copy").addEventListener("click", keepCopy);
  $("notice-close").addEventListener("click", () => { $("notice").hidden = true; });
  $("finish").addEventListener("click", finish);
  const g = sessionStorage.getItem("padplan-grid");
  if (g) $("grid").value = g;
  $("values").checked = sessionStorage.getItem("padplan-values") === "1";
  load();
});
