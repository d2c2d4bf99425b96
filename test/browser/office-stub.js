/*
 * Stand-in for Office.js in the pane's browser tests. The tests answer the pane's request for
 * https://appsforoffice.microsoft.com/lib/1/hosted/office.js with this file. It models the few
 * APIs the pane uses over an in-memory workbook, with Office.js's batching rules: property
 * writes and method calls are queued and run in order at context.sync(); a loadable property
 * read before load() + sync() throws, as Office.js does.
 *
 * Modelled: Office.onReady, Office.context.officeTheme, Office.context.document.addHandlerAsync
 * (theme changes), Office.HostType / EventType, CustomFunctions.associate (collected);
 * Excel.run; workbook.getSelectedRange, workbook.worksheets (load items/name, getItem, add),
 * workbook.tables (load items/name); worksheet.name, getRange(A1), getRangeByIndexes,
 * getUsedRangeOrNullObject, tables.add, activate; range values / formulas / numberFormat
 * (2-D, set and load), rowIndex / columnIndex / rowCount / columnCount / address / isNullObject
 * (load), worksheet, select, format.fill.color, format.font.{bold,italic,color,size}, format.wrapText,
 * format.columnWidth, format.autofitColumns, format.borders.getItem(edge).style,
 * conditionalFormats.add(...).colorScale.criteria; worksheet.charts.add(type, range, seriesBy)
 * with series.getItemAt(0).setXAxisValues, title.text, axes.categoryAxis / valueAxis title.text,
 * legend.visible and setPosition; table.name / style. Formulas are stored, not calculated (a formula cell's value reads "").
 *
 * Test hooks on window.__orbitStub: setCell, getCell, select, selection, sheetNames, dump,
 * tables, conditionalFormats, charts, overwrites (content writes onto cells that held data: must stay
 * empty), errors, associated (custom function ids), setTheme, failNextRun (the next Excel.run
 * rejects with that message, as when Excel refuses a batch), delayNextRun (the next Excel.run
 * starts that many ms late, so a test can look at the pane while it waits). Configure before the page loads
 * with window.__stubConfig = { theme: {...} | null, host: "Excel" | null, sheets: ["Sheet1"] }.
 */
(function () {
  "use strict";
  var config = window.__stubConfig || {};
  var MAX_ROWS = 1048576;
  var MAX_COLS = 16384;

  // ---- workbook model ------------------------------------------------------------------
  var model = { sheets: [], selection: null, tables: [], overwrites: [], errors: [], activeSheet: null };

  function newSheet(name) {
    var s = { name: name, cells: new Map(), colWidths: {}, conditionalFormats: [], charts: [] };
    model.sheets.push(s);
    return s;
  }
  (config.sheets || ["Sheet1"]).forEach(newSheet);
  model.activeSheet = model.sheets[0].name;
  model.selection = { sheet: model.sheets[0].name, row: 0, col: 0, rows: 1, cols: 1 };

  function findSheet(name) {
    for (var i = 0; i < model.sheets.length; i++) if (model.sheets[i].name.toLowerCase() === String(name).toLowerCase()) return model.sheets[i];
    return null;
  }
  function sheetOrThrow(name) {
    var s = findSheet(name);
    if (!s) throw officeError("ItemNotFound", "The requested resource doesn't exist: worksheet " + name);
    return s;
  }
  function officeError(code, message) {
    var e = new Error(message);
    e.name = "RichApi.Error";
    e.code = code;
    return e;
  }
  var key = function (r, c) { return r + "," + c; };
  function cellOf(sheet, r, c, create) {
    var k = key(r, c);
    var cell = sheet.cells.get(k);
    if (!cell && create) {
      cell = { value: "", formula: "", numberFormat: "General", format: {} };
      sheet.cells.set(k, cell);
    }
    return cell;
  }
  function hasContent(cell) { return !!cell && ((cell.value !== "" && cell.value !== null && cell.value !== undefined) || (cell.formula !== "" && cell.formula !== undefined)); }

  function colLetters(c) {
    var n = c + 1, out = "";
    while (n > 0) { var rem = (n - 1) % 26; out = String.fromCharCode(65 + rem) + out; n = Math.floor((n - 1) / 26); }
    return out;
  }
  function a1(r, c) { return colLetters(c) + (r + 1); }
  function blockA1(b) { return b.rows === 1 && b.cols === 1 ? a1(b.row, b.col) : a1(b.row, b.col) + ":" + a1(b.row + b.rows - 1, b.col + b.cols - 1); }
  function parseCellRef(ref) {
    var m = /^\$?([A-Za-z]{1,3})\$?([0-9]+)$/.exec(ref);
    if (!m) throw officeError("InvalidArgument", "Bad cell reference " + ref);
    var col = 0;
    m[1].toUpperCase().split("").forEach(function (ch) { col = col * 26 + (ch.charCodeAt(0) - 64); });
    return { row: Number(m[2]) - 1, col: col - 1 };
  }
  function parseBlock(address) {
    var part = String(address).split("!").pop();
    var ends = part.split(":");
    var a = parseCellRef(ends[0]);
    var b = ends.length > 1 ? parseCellRef(ends[1]) : a;
    return { row: Math.min(a.row, b.row), col: Math.min(a.col, b.col), rows: Math.abs(b.row - a.row) + 1, cols: Math.abs(b.col - a.col) + 1 };
  }
  function checkBlock(b) {
    if (b.row < 0 || b.col < 0 || b.rows < 1 || b.cols < 1 || b.row + b.rows > MAX_ROWS || b.col + b.cols > MAX_COLS) throw officeError("InvalidArgument", "Range outside the sheet");
  }
  function usedBlock(sheet) {
    var minR = Infinity, minC = Infinity, maxR = -1, maxC = -1;
    sheet.cells.forEach(function (cell, k) {
      var used = hasContent(cell) || cell.numberFormat !== "General" || Object.keys(cell.format).length > 0;
      if (!used) return;
      var rc = k.split(",").map(Number);
      minR = Math.min(minR, rc[0]); minC = Math.min(minC, rc[1]); maxR = Math.max(maxR, rc[0]); maxC = Math.max(maxC, rc[1]);
    });
    return maxR < 0 ? null : { row: minR, col: minC, rows: maxR - minR + 1, cols: maxC - minC + 1 };
  }
  function grid(b, fn) {
    var out = [];
    for (var r = 0; r < b.rows; r++) { var row = []; for (var c = 0; c < b.cols; c++) row.push(fn(b.row + r, b.col + c)); out.push(row); }
    return out;
  }
  function checkShape(b, data, what) {
    if (!Array.isArray(data) || data.length !== b.rows || data.some(function (row) { return !Array.isArray(row) || row.length !== b.cols; }))
      throw officeError("InvalidArgument", "The number of rows or columns in the input array doesn't match the size or dimensions of the range (" + what + ", " + blockA1(b) + ")");
  }

  // ---- batching -------------------------------------------------------------------------
  function notLoaded(prop) {
    return new Error("PropertyNotLoaded: The property '" + prop + "' is not available. Before reading the property's value, call the load method on the containing object and call \"context.sync()\" on the associated request context.");
  }
  function parseLoad(arg) {
    if (arg === undefined) return ["*"];
    if (Array.isArray(arg)) return arg;
    if (typeof arg === "string") return arg.split(",").map(function (s) { return s.trim(); }).filter(Boolean);
    if (typeof arg === "object" && arg.select) return parseLoad(arg.select);
    return Object.keys(arg);
  }

  function RequestContext() {
    this.queue = [];
    this.workbook = new WorkbookProxy(this);
  }
  RequestContext.prototype.enqueue = function (op) { this.queue.push(op); };
  RequestContext.prototype.sync = function () {
    var q = this.queue;
    this.queue = [];
    try {
      q.forEach(function (op) { op(); });
    } catch (e) {
      model.errors.push(String(e && e.message));
      return Promise.reject(e);
    }
    return new Promise(function (res) { setTimeout(res, 0); });
  };

  /** Base for loadable proxies: `loadable` maps property name → getter over the model at sync time. */
  function defineLoadable(obj, ctx, loadable) {
    obj._loaded = {};
    Object.keys(loadable).forEach(function (prop) {
      Object.defineProperty(obj, prop, {
        configurable: true,
        enumerable: true,
        get: function () {
          if (!(prop in obj._loaded)) throw notLoaded(prop);
          return obj._loaded[prop];
        },
        set: loadable[prop].set
          ? function (v) { ctx.enqueue(function () { loadable[prop].set(v); }); obj._loaded[prop] = v; }
          : function () { throw new Error("The property '" + prop + "' is read-only."); },
      });
    });
    obj.load = function (arg) {
      var props = parseLoad(arg);
      ctx.enqueue(function () {
        props.forEach(function (p) {
          var names = p === "*" ? Object.keys(loadable) : [p.split("/")[0]];
          names.forEach(function (n) {
            if (!loadable[n]) throw officeError("PropertyNotFound", "No property " + n + " to load");
            obj._loaded[n] = loadable[n].get(p);
          });
        });
      });
      return obj;
    };
  }

  // ---- proxies --------------------------------------------------------------------------
  function WorkbookProxy(ctx) {
    var self = this;
    this.worksheets = new WorksheetsProxy(ctx);
    this.tables = new TablesProxy(ctx);
    this.getSelectedRange = function () {
      return new RangeProxy(ctx, function () {
        var s = model.selection;
        return { sheet: sheetOrThrow(s.sheet), row: s.row, col: s.col, rows: s.rows, cols: s.cols };
      });
    };
    void self;
  }

  function WorksheetsProxy(ctx) {
    defineLoadable(this, ctx, {
      items: {
        get: function () {
          return model.sheets.map(function (s) { var p = new WorksheetProxy(ctx, function () { return sheetOrThrow(s.name); }); p._loaded.name = s.name; return p; });
        },
      },
    });
    this.getItem = function (name) { return new WorksheetProxy(ctx, function () { return sheetOrThrow(name); }); };
    this.add = function (name) {
      var made = null;
      ctx.enqueue(function () {
        if (findSheet(name)) throw officeError("ItemAlreadyExists", "A sheet named " + name + " already exists");
        if (String(name).length > 31) throw officeError("InvalidArgument", "Sheet names are at most 31 characters");
        made = newSheet(name);
      });
      return new WorksheetProxy(ctx, function () { if (!made) throw officeError("ItemNotFound", "sheet not made yet"); return made; });
    };
  }

  function TablesProxy(ctx) {
    defineLoadable(this, ctx, {
      items: { get: function () { return model.tables.map(function (t) { var p = new TableProxy(ctx, function () { return t; }); p._loaded.name = t.name; return p; }); } },
    });
  }

  function TableProxy(ctx, resolve) {
    defineLoadable(this, ctx, {
      name: {
        get: function () { return resolve().name; },
        set: function (v) {
          var t = resolve();
          if (model.tables.some(function (o) { return o !== t && o.name.toLowerCase() === String(v).toLowerCase(); })) throw officeError("InvalidArgument", "A table named " + v + " already exists");
          t.name = v;
        },
      },
      style: { get: function () { return resolve().style; }, set: function (v) { resolve().style = v; } },
    });
  }

  function WorksheetProxy(ctx, resolve) {
    var self = this;
    defineLoadable(this, ctx, { name: { get: function () { return resolve().name; } } });
    this.getRange = function (address) {
      return new RangeProxy(ctx, function () { var b = parseBlock(address); checkBlock(b); b.sheet = resolve(); return b; });
    };
    this.getRangeByIndexes = function (row, col, rows, cols) {
      return new RangeProxy(ctx, function () { var b = { row: row, col: col, rows: rows, cols: cols }; checkBlock(b); b.sheet = resolve(); return b; });
    };
    this.getUsedRangeOrNullObject = function () {
      return new RangeProxy(ctx, function () { var s = resolve(); var b = usedBlock(s); if (!b) return { sheet: s, nullObject: true }; b.sheet = s; return b; });
    };
    this.activate = function () { ctx.enqueue(function () { model.activeSheet = resolve().name; }); };
    this.charts = {
      add: function (type, range, seriesBy) {
        var chart = { type: type, seriesBy: seriesBy, source: null, xValues: null, title: null, xTitle: null, yTitle: null, legendVisible: null, from: null, to: null };
        ctx.enqueue(function () { var b = range._resolve(); checkBlock(b); chart.source = blockA1(b); resolve().charts.push(chart); });
        var later = function (fn) { ctx.enqueue(fn); };
        var titled = function (prop) {
          var t = {};
          Object.defineProperty(t, "text", { set: function (v) { later(function () { chart[prop] = v; }); } });
          return { title: t };
        };
        var legend = {};
        Object.defineProperty(legend, "visible", { set: function (v) { later(function () { chart.legendVisible = v; }); } });
        return {
          series: { getItemAt: function (i) { return { setXAxisValues: function (r) { later(function () { if (i !== 0) throw officeError("InvalidArgument", "one series"); chart.xValues = blockA1(r._resolve()); }); } }; } },
          title: titled("title").title,
          axes: { categoryAxis: titled("xTitle"), valueAxis: titled("yTitle") },
          legend: legend,
          setPosition: function (from, to) { later(function () { parseCellRef(from); parseCellRef(to); chart.from = from; chart.to = to; }); },
        };
      },
    };
    this.tables = {
      add: function (range, hasHeaders) {
        var made = null;
        ctx.enqueue(function () {
          var b = typeof range === "string" ? Object.assign(parseBlock(range), { sheet: resolve() }) : range._resolve();
          made = { name: "Table" + (model.tables.length + 1), sheet: b.sheet.name, address: blockA1(b), hasHeaders: !!hasHeaders, style: "TableStyleMedium2", header: grid({ row: b.row, col: b.col, rows: 1, cols: b.cols }, function (r, c) { var cell = cellOf(b.sheet, r, c, false); return cell ? cell.value : ""; })[0] };
          model.tables.push(made);
        });
        return new TableProxy(ctx, function () { return made; });
      },
    };
    void self;
  }

  function RangeProxy(ctx, resolve) {
    var self = this;
    this._resolve = resolve;
    var live = function () { var b = resolve(); if (b.nullObject) throw officeError("InvalidObjectPath", "null object"); return b; };
    var write = function (kind) {
      return function (data) {
        var b = live();
        checkShape(b, data, kind);
        data.forEach(function (row, r) {
          row.forEach(function (v, c) {
            var cell = cellOf(b.sheet, b.row + r, b.col + c, true);
            if (kind === "numberFormat") { cell.numberFormat = v; return; }
            if (hasContent(cell)) model.overwrites.push(b.sheet.name + "!" + a1(b.row + r, b.col + c));
            if (kind === "formulas" && typeof v === "string" && v.charAt(0) === "=") { cell.formula = v; cell.value = ""; }
            else { cell.value = v === null ? "" : v; cell.formula = ""; }
          });
        });
      };
    };
    // Like Office.js, a null object loads without error: its properties read null.
    var orNull = function (get) { return function () { return resolve().nullObject ? null : get(); }; };
    defineLoadable(this, ctx, {
      values: { get: function () { var b = live(); return grid(b, function (r, c) { var cell = cellOf(b.sheet, r, c, false); return cell ? cell.value : ""; }); }, set: write("values") },
      formulas: {
        get: function () { var b = live(); return grid(b, function (r, c) { var cell = cellOf(b.sheet, r, c, false); return cell ? (cell.formula || cell.value) : ""; }); },
        set: write("formulas"),
      },
      numberFormat: { get: function () { var b = live(); return grid(b, function (r, c) { var cell = cellOf(b.sheet, r, c, false); return cell ? cell.numberFormat : "General"; }); }, set: write("numberFormat") },
      rowIndex: { get: orNull(function () { return live().row; }) },
      columnIndex: { get: orNull(function () { return live().col; }) },
      rowCount: { get: orNull(function () { return live().rows; }) },
      columnCount: { get: orNull(function () { return live().cols; }) },
      address: { get: function () { var b = live(); return b.sheet.name + "!" + blockA1(b); } },
      isNullObject: { get: function () { return !!resolve().nullObject; } },
    });
    this.worksheet = new WorksheetProxy(ctx, function () { return resolve().sheet; });
    this.select = function () { ctx.enqueue(function () { var b = live(); model.selection = { sheet: b.sheet.name, row: b.row, col: b.col, rows: b.rows, cols: b.cols }; model.activeSheet = b.sheet.name; }); };
    var styleEach = function (name, v) {
      var b = live();
      for (var r = 0; r < b.rows; r++) for (var c = 0; c < b.cols; c++) cellOf(b.sheet, b.row + r, b.col + c, true).format[name] = v;
    };
    var setter = function (name) { return { set: function (v) { ctx.enqueue(function () { styleEach(name, v); }); }, enumerable: true }; };
    var fill = {};
    Object.defineProperty(fill, "color", setter("fill"));
    var font = {};
    ["bold", "italic", "color", "size"].forEach(function (p) { Object.defineProperty(font, p, setter("font." + p)); });
    var borders = {
      getItem: function (edge) {
        var border = {};
        Object.defineProperty(border, "style", setter("border." + edge));
        return border;
      },
    };
    this.format = { fill: fill, font: font, borders: borders, autofitColumns: function () { ctx.enqueue(function () { live(); }); } };
    Object.defineProperty(this.format, "wrapText", setter("wrapText"));
    Object.defineProperty(this.format, "columnWidth", {
      set: function (w) { ctx.enqueue(function () { var b = live(); for (var c = 0; c < b.cols; c++) b.sheet.colWidths[colLetters(b.col + c)] = w; }); },
    });
    this.conditionalFormats = {
      add: function (type) {
        var cf = { type: type, address: null, criteria: null };
        ctx.enqueue(function () { var b = live(); cf.address = blockA1(b); b.sheet.conditionalFormats.push(cf); });
        var colorScale = {};
        Object.defineProperty(colorScale, "criteria", { set: function (v) { ctx.enqueue(function () { cf.criteria = JSON.parse(JSON.stringify(v)); }); } });
        return { colorScale: colorScale };
      },
    };
    void self;
  }

  // ---- globals --------------------------------------------------------------------------
  var themeHandlers = [];
  var hostName = config.host === undefined ? "Excel" : config.host;
  var context = {
    officeTheme: config.theme || undefined,
    document: {
      addHandlerAsync: function (type, handler, cb) {
        if (type === "officeThemeChanged") themeHandlers.push(handler);
        if (cb) cb({ status: "succeeded" });
      },
    },
    requirements: { isSetSupported: function () { return true; } },
  };
  window.Office = {
    HostType: { Excel: "Excel", Word: "Word" },
    PlatformType: { OfficeOnline: "OfficeOnline", PC: "PC" },
    EventType: { OfficeThemeChanged: "officeThemeChanged" },
    context: context,
    onReady: function (cb) {
      var info = { host: hostName, platform: hostName ? "OfficeOnline" : null };
      return new Promise(function (res) {
        setTimeout(function () { if (cb) cb(info); res(info); }, Number(config.readyDelayMs || 30));
      });
    },
  };
  var failNext = null;
  var delayNext = 0;
  if (hostName === "Excel") {
    window.Excel = {
      run: function (batch) {
        var ctx = new RequestContext();
        if (delayNext > 0) {
          var ms = delayNext;
          delayNext = 0;
          return new Promise(function (res) { setTimeout(res, ms); }).then(function () { return window.Excel.run(batch); });
        }
        if (failNext) {
          var err = failNext;
          failNext = null;
          return Promise.reject(officeError("GeneralException", err));
        }
        return Promise.resolve()
          .then(function () { return batch(ctx); })
          .then(function (result) { return ctx.sync().then(function () { return result; }); });
      },
    };
  }
  var associated = [];
  function CellErr(code, message) { this.code = code; this.message = message; }
  window.CustomFunctions = {
    associate: function (id) { associated.push(id); },
    Error: CellErr,
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!", divisionByZero: "#DIV/0!", nullReference: "#NULL!", invalidName: "#NAME?", invalidReference: "#REF!" },
  };

  // ---- test hooks -----------------------------------------------------------------------
  function describeCell(cell) {
    return cell ? { value: cell.value, formula: cell.formula, numberFormat: cell.numberFormat, format: Object.assign({}, cell.format) } : null;
  }
  window.__orbitStub = {
    setCell: function (sheetName, ref, content) {
      var s = findSheet(sheetName) || newSheet(sheetName);
      var p = parseCellRef(ref);
      var cell = cellOf(s, p.row, p.col, true);
      if (typeof content === "string" && content.charAt(0) === "=") { cell.formula = content; cell.value = ""; }
      else { cell.value = content; cell.formula = ""; }
    },
    getCell: function (sheetName, ref) { var s = findSheet(sheetName); if (!s) return null; var p = parseCellRef(ref); return describeCell(cellOf(s, p.row, p.col, false)); },
    select: function (sheetName, address) { var b = parseBlock(address); model.selection = { sheet: sheetName, row: b.row, col: b.col, rows: b.rows, cols: b.cols }; model.activeSheet = sheetName; },
    selection: function () { return Object.assign({ address: blockA1(model.selection) }, model.selection); },
    activeSheet: function () { return model.activeSheet; },
    sheetNames: function () { return model.sheets.map(function (s) { return s.name; }); },
    dump: function (sheetName) {
      var s = findSheet(sheetName);
      var out = {};
      if (s) s.cells.forEach(function (cell, k) { var rc = k.split(",").map(Number); if (hasContent(cell)) out[a1(rc[0], rc[1])] = cell.formula || cell.value; });
      return out;
    },
    cells: function (sheetName) {
      var s = findSheet(sheetName);
      var out = {};
      if (s) s.cells.forEach(function (cell, k) { var rc = k.split(",").map(Number); out[a1(rc[0], rc[1])] = describeCell(cell); });
      return out;
    },
    columnWidths: function (sheetName) { var s = findSheet(sheetName); return s ? Object.assign({}, s.colWidths) : null; },
    tables: function () { return JSON.parse(JSON.stringify(model.tables)); },
    conditionalFormats: function (sheetName) { var s = findSheet(sheetName); return s ? JSON.parse(JSON.stringify(s.conditionalFormats)) : []; },
    charts: function (sheetName) { var s = findSheet(sheetName); return s ? JSON.parse(JSON.stringify(s.charts)) : []; },
    overwrites: function () { return model.overwrites.slice(); },
    errors: function () { return model.errors.slice(); },
    associated: function () { return associated.slice(); },
    failNextRun: function (message) { failNext = String(message); },
    delayNextRun: function (ms) { delayNext = Number(ms); },
    setTheme: function (theme) { context.officeTheme = theme; themeHandlers.forEach(function (h) { h({ type: "officeThemeChanged", officeTheme: theme }); }); },
  };
})();
