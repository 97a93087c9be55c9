// PadPlan bench, the 3D view: the same glTF model `padplan export --model` writes, fetched from this editor and drawn
// with three.js (vendored beside this file with its licence; nothing is fetched from outside). Drag to turn the board,
// use the wheel to zoom, click a part, pad or jumper to choose it: the choice is shared with the flat bench through
// two events, "bench:changed" (from editor.js: a new plan or choice) and "bench:choose" (to editor.js).
"use strict";

const token = new URLSearchParams(location.search).get("t") || "";
const $ = id => document.getElementById(id);
const chosenColour = 0xff7b00;

const view = {
  three: null,       // the three.js module, loaded the first time the view opens
  renderer: null, scene: null, camera: null, model: null,
  plan: null, chosen: null,
  revision: -1,      // the plan revision whose model is shown
  loading: false,
  orbit: { azimuth: -Math.PI / 4, elevation: 0.62, distance: 100, target: [0, 0, 0] },
};

document.addEventListener("bench:changed", e => {
  view.plan = e.detail.plan;
  view.chosen = e.detail.chosen;
  if (!$("view3d").hidden) refresh();
});

$("view3d-toggle").addEventListener("click", toggle);
document.addEventListener("keydown", e => {
  if (e.key === "3" && !e.ctrlKey && !e.metaKey && !e.altKey && !(e.target instanceof HTMLInputElement) && !(e.target instanceof HTMLSelectElement)) toggle();
});
window.addEventListener("resize", () => { if (!$("view3d").hidden) { size(); render(); } });

async function toggle() {
  const box = $("view3d");
  box.hidden = !box.hidden;
  $("view3d-toggle").classList.toggle("on", !box.hidden);
  if (!box.hidden) await refresh();
}

async function refresh() {
  if (!view.plan) {
    const r = await fetch("/api/plan", { headers: { "X-PadPlan-Token": token } });
    if (!r.ok) return;
    view.plan = await r.json();
  }
  if (!view.renderer && !(await start())) return;
  if (view.plan.revision !== view.revision && !view.loading) await load(view.plan.revision);
  mark();
  size();
  render();
}

async function start() {
  const box = $("view3d");
  try {
    view.three = await import("./three.module.min.js?t=" + encodeURIComponent(token));
    const THREE = view.three;
    view.renderer = new THREE.WebGLRenderer({ antialias: true, preserveDrawingBuffer: true });
  } catch (e) {
    box.textContent = "This browser cannot draw the 3D view (it needs WebGL). 'padplan export PROJECT --model board.glb' writes the same model for any glTF viewer.";
    return false;
  }
  const THREE = view.three;
  view.renderer.setPixelRatio(window.devicePixelRatio || 1);
  view.renderer.setClearColor(0xe9e2d3);
  box.replaceChildren(view.renderer.domElement);
  const hint = document.createElement("p");
  hint.className = "hint";
  hint.textContent = "drag to turn, wheel to zoom, click to choose; 3 or the 3D view button goes back to the flat bench";
  box.append(hint);
  view.scene = new THREE.Scene();
  view.scene.add(new THREE.HemisphereLight(0xffffff, 0x6b5a40, 1.6));
  const sun = new THREE.DirectionalLight(0xffffff, 2.2);
  sun.position.set(-0.4, 1, 0.6);
  view.scene.add(sun);
  view.camera = new THREE.PerspectiveCamera(35, 1, 1, 10000);
  listen(view.renderer.domElement);
  return true;
}

// ---------- the model: a glb file read by hand (the few parts of glTF 2.0 this editor writes) ----------

async function load(revision) {
  view.loading = true;
  try {
    const r = await fetch("/api/model.glb", { headers: { "X-PadPlan-Token": token } });
    if (!r.ok) {
      if (view.model) { view.scene.remove(view.model); view.model = null; }
      $("view3d").dataset.revision = String(revision);
      view.revision = revision;
      return;
    }
    const glb = parse(await r.arrayBuffer());
    if (view.model) view.scene.remove(view.model);
    view.model = build(glb);
    view.scene.add(view.model);
    if (view.revision < 0) aim();
    view.revision = revision;
    const box = $("view3d");
    box.dataset.revision = String(revision);
    box.dataset.nodes = String(glb.json.nodes.length);
  } finally {
    view.loading = false;
  }
}

function parse(buffer) {
  const data = new DataView(buffer);
  if (data.getUint32(0, true) !== 0x46546c67 || data.getUint32(4, true) !== 2) throw new Error("not a glTF 2.0 binary file");
  let json = null, bin = null;
  for (let at = 12; at < buffer.byteLength;) {
    const length = data.getUint32(at, true), type = data.getUint32(at + 4, true);
    if (type === 0x4e4f534a) json = JSON.parse(new TextDecoder().decode(new Uint8Array(buffer, at + 8, length)));
    else if (type === 0x004e4942) bin = buffer.slice(at + 8, at + 8 + length);
    at += 8 + length;
  }
  return { json, bin };
}

function accessor(glb, index) {
  const a = glb.json.accessors[index];
  const v = glb.json.bufferViews[a.bufferView];
  const start = (v.byteOffset || 0) + (a.byteOffset || 0);
  const width = { SCALAR: 1, VEC2: 2, VEC3: 3, VEC4: 4 }[a.type];
  switch (a.componentType) {
    case 5126: return new Float32Array(glb.bin, start, a.count * width);
    case 5125: return new Uint32Array(glb.bin, start, a.count * width);
    case 5123: return new Uint16Array(glb.bin, start, a.count * width);
    default: throw new Error("unexpected accessor type " + a.componentType);
  }
}

function build(glb) {
  const THREE = view.three;
  const materials = (glb.json.materials || []).map(m => {
    const pbr = m.pbrMetallicRoughness || {};
    const [r, g, b] = pbr.baseColorFactor || [1, 1, 1, 1];
    const colour = new THREE.Color().setRGB(r, g, b, THREE.LinearSRGBColorSpace);
    return new THREE.MeshStandardMaterial({ color: colour, metalness: pbr.metallicFactor ?? 1, roughness: pbr.roughnessFactor ?? 1 });
  });
  const root = new THREE.Group();
  root.scale.setScalar(1000); // the file is in metres; the view works in millimetres
  const add = (index, parent, item) => {
    const node = glb.json.nodes[index];
    const group = new THREE.Group();
    group.name = node.name || "";
    const owner = item || group.name;
    if (node.mesh !== undefined) {
      for (const p of glb.json.meshes[node.mesh].primitives) {
        const geometry = new THREE.BufferGeometry();
        geometry.setAttribute("position", new THREE.BufferAttribute(accessor(glb, p.attributes.POSITION), 3));
        geometry.setAttribute("normal", new THREE.BufferAttribute(accessor(glb, p.attributes.NORMAL), 3));
        geometry.setIndex(new THREE.BufferAttribute(accessor(glb, p.indices), 1));
        const mesh = new THREE.Mesh(geometry, materials[p.material].clone());
        mesh.userData.item = owner;
        group.add(mesh);
      }
    }
    for (const child of node.children || []) add(child, group, owner);
    parent.add(group);
  };
  for (const index of glb.json.scenes[glb.json.scene || 0].nodes) add(index, root, null);
  return root;
}

// ---------- choosing ----------

function kindOf(item) {
  const p = view.plan, g = p && p.geometry;
  if (!g) return null;
  if (g.parts.some(x => x.ref === item)) return { kind: "part", id: item };
  if (p.pads.some(x => x.id === item)) return { kind: "pad", id: item };
  if (g.jumpers.some(x => x.id === item)) return { kind: "link", id: item };
  return null;
}

function mark() {
  if (!view.model) return;
  const c = view.chosen;
  $("view3d").dataset.chosen = c ? c.id : "";
  view.model.traverse(o => {
    if (!o.isMesh) return;
    o.material.emissive.setHex(c && o.userData.item === c.id ? chosenColour : 0x000000);
    o.material.emissiveIntensity = 0.55;
  });
}

function pick(x, y) {
  const THREE = view.three;
  const rect = view.renderer.domElement.getBoundingClientRect();
  const ray = new THREE.Raycaster();
  ray.setFromCamera(new THREE.Vector2(((x - rect.left) / rect.width) * 2 - 1, -((y - rect.top) / rect.height) * 2 + 1), view.camera);
  const hit = ray.intersectObject(view.model, true).find(h => kindOf(h.object.userData.item));
  const choice = hit ? kindOf(hit.object.userData.item) : null;
  document.dispatchEvent(new CustomEvent("bench:choose", { detail: choice }));
}

// Where an item's middle appears in the page (CSS pixels), for scripts and the browser tests; null when it is not drawn.
window.padplanView3d = {
  screenOf(item) {
    if (!view.model) return null;
    const THREE = view.three, box = new THREE.Box3();
    view.model.traverse(o => { if (o.isMesh && o.userData.item === item) box.expandByObject(o); });
    if (box.isEmpty()) return null;
    const p = box.getCenter(new THREE.Vector3()).project(view.camera);
    const rect = view.renderer.domElement.getBoundingClientRect();
    return [rect.left + (p.x + 1) / 2 * rect.width, rect.top + (1 - p.y) / 2 * rect.height];
  },
};

// ---------- turning and zooming ----------

function aim() {
  const g = view.plan.geometry;
  const w = g ? g.board.width : 100, h = g ? g.board.height : 100;
  view.orbit.target = [w / 2, 0, h / 2];
  view.orbit.distance = 1.9 * Math.max(w, h);
}

function size() {
  const box = $("view3d");
  const w = Math.max(1, box.clientWidth), h = Math.max(1, box.clientHeight);
  view.renderer.setSize(w, h, false);
  view.camera.aspect = w / h;
  view.camera.updateProjectionMatrix();
}

function render() {
  if (!view.renderer) return;
  const o = view.orbit, [tx, ty, tz] = o.target;
  const c = Math.cos(o.elevation);
  view.camera.position.set(tx + o.distance * c * Math.sin(o.azimuth), ty + o.distance * Math.sin(o.elevation), tz + o.distance * c * Math.cos(o.azimuth));
  view.camera.lookAt(tx, ty, tz);
  view.renderer.render(view.scene, view.camera);
}

function listen(canvas) {
  let down = null;
  canvas.addEventListener("pointerdown", e => { down = { x: e.clientX, y: e.clientY, moved: false }; canvas.setPointerCapture(e.pointerId); });
  canvas.addEventListener("pointermove", e => {
    if (!down) return;
    const dx = e.clientX - down.x, dy = e.clientY - down.y;
    if (Math.abs(dx) + Math.abs(dy) > 3) down.moved = true;
    if (!down.moved) return;
    view.orbit.azimuth -= dx * 0.008;
    view.orbit.elevation = Math.min(1.55, Math.max(0.05, view.orbit.elevation + dy * 0.008));
    down.x = e.clientX;
    down.y = e.clientY;
    render();
  });
  canvas.addEventListener("pointerup", e => {
    if (down && !down.moved && view.model) pick(e.clientX, e.clientY);
    down = null;
  });
  canvas.addEventListener("wheel", e => {
    e.preventDefault();
    view.orbit.distance = Math.min(5000, Math.max(5, view.orbit.distance * Math.exp(e.deltaY * 0.001)));
    render();
  }, { passive: false });
}
