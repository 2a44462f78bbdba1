// WindScript report: animates the rotating field F(θ, t) from the frames embedded in the page.
// No network, no libraries. window.windscriptReport exposes the state for tests and for people
// poking at the page: frame, frames, drive, playing, setFrame(i), setDrive(i), play(), pause().
(function () {
  'use strict';
  var figure = document.getElementById('ws-animation');
  var data = JSON.parse(document.getElementById('ws-frames').textContent);
  var slider = document.getElementById('ws-time');
  var button = document.getElementById('ws-play');
  var select = document.getElementById('ws-drive');
  var readout = document.getElementById('ws-readout');
  var stair = document.getElementById('ws-stair');
  var fund = document.getElementById('ws-fund');
  var crest = document.getElementById('ws-crest');
  var q = data.slots, p = data.polePairs, chart = data.chart, ring = data.ring;
  var state = { drive: 0, frame: 0, playing: false, timer: null };

  function x(deg) { return chart.left + deg / 360 * chart.width; }
  function y(v) { return chart.top + chart.height / 2 - v / chart.yMax * chart.height / 2; }
  function n(v) { return Math.round(v * 100) / 100; }
  function slotDeg(i) { return 360 * (i + 0.5) / q; }

  // The diverging purple–white–green field scale of the static pictures (Palette.Diverging; not phase colours).
  function diverging(v) {
    v = Math.max(-1, Math.min(1, v));
    var end = v >= 0 ? [0x1b, 0x78, 0x37] : [0x76, 0x2a, 0x83], t = 1 - Math.abs(v);
    return 'rgb(' + end.map(function (c) { return Math.round(c + (255 - c) * t); }).join(',') + ')';
  }

  function draw() {
    var drive = data.drives[state.drive], f = drive.frames[state.frame], levels = f.levels;
    // Staircase: level i from the centre of slot i to that of slot i + 1, wrapping at 360°.
    var d = 'M' + n(x(0)) + ' ' + n(y(levels[q - 1]));
    for (var i = 0; i < q; i++) {
      d += 'L' + n(x(slotDeg(i))) + ' ' + n(y(levels[(i + q - 1) % q])) + 'L' + n(x(slotDeg(i))) + ' ' + n(y(levels[i]));
    }
    stair.setAttribute('d', d + 'L' + n(x(360)) + ' ' + n(y(levels[q - 1])));
    // Working wave F_p(θ) = Re(C·e^(jpθ)).
    var re = f.fundamental[0], im = f.fundamental[1], e = '';
    for (var k = 0; k <= 720; k++) {
      var th = k / 2 * Math.PI / 180;
      e += (k ? 'L' : 'M') + n(x(k / 2)) + ' ' + n(y(re * Math.cos(p * th) - im * Math.sin(p * th)));
    }
    fund.setAttribute('d', e);
    for (var w = 0; w < q; w++) document.getElementById('ws-wedge-' + w).setAttribute('fill', diverging(levels[w] / chart.yMax));
    // Crests of the working wave: θ = (2πk − arg C)/p, as spokes across the ring.
    var s = '';
    if (Math.hypot(re, im) > 1e-12 * chart.yMax) {
      for (var c = 0; c < p; c++) {
        var a = (2 * Math.PI * c - Math.atan2(im, re)) / p;
        s += 'M' + n(ring.cx + (ring.inner - 4) * Math.cos(a)) + ' ' + n(ring.cy - (ring.inner - 4) * Math.sin(a)) +
             'L' + n(ring.cx + (ring.outer + 6) * Math.cos(a)) + ' ' + n(ring.cy - (ring.outer + 6) * Math.sin(a));
      }
    }
    crest.setAttribute('d', s);
    var when = drive.period === null ? 'direct current (standing field)'
      : 't = ' + (f.t * 1000).toFixed(3) + ' ms (' + Math.round(360 * state.frame / drive.frames.length) + '° of the period)';
    readout.textContent = when + ' | ' + data.phases.map(function (name, j) { return name + ' ' + f.currents[j].toFixed(2) + ' A'; }).join(', ');
    figure.setAttribute('data-frame', String(state.frame));
    figure.setAttribute('data-drive', String(state.drive));
  }

  function setFrame(i) {
    var count = data.drives[state.drive].frames.length;
    state.frame = ((Math.round(i) % count) + count) % count;
    slider.value = String(state.frame);
    draw();
  }
  function play() {
    if (state.playing) return;
    state.playing = true;
    button.textContent = 'Pause';
    button.setAttribute('aria-pressed', 'true');
    state.timer = window.setInterval(function () { setFrame(state.frame + 1); }, 70);
  }
  function pause() {
    state.playing = false;
    button.textContent = 'Play';
    button.setAttribute('aria-pressed', 'false');
    if (state.timer !== null) window.clearInterval(state.timer);
    state.timer = null;
  }
  function setDrive(i) {
    state.drive = Math.max(0, Math.min(data.drives.length - 1, i));
    select.value = String(state.drive);
    slider.max = String(data.drives[state.drive].frames.length - 1);
    setFrame(state.frame);
  }

  slider.addEventListener('input', function () { setFrame(Number(slider.value)); });
  button.addEventListener('click', function () { if (state.playing) pause(); else play(); });
  select.addEventListener('change', function () { setDrive(Number(select.value)); });

  window.windscriptReport = {
    get frame() { return state.frame; },
    get frames() { return data.drives[state.drive].frames.length; },
    get drive() { return state.drive; },
    get playing() { return state.playing; },
    setFrame: setFrame, setDrive: setDrive, play: play, pause: pause
  };
  setDrive(0);
  figure.setAttribute('data-ready', 'true');
})();
