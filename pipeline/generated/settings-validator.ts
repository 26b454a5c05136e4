// @ts-nocheck
/* eslint-disable */
/**
 * GENERATED from schemas/settings.schema.json by scripts/generate-validators.mjs (ajv standalone code). Do not edit by
 * hand: change the schema and run `npm run build && node scripts/generate-validators.mjs`. A test fails
 * when this file drifts.
 */
import { createRequire } from 'node:module';
const require = createRequire(import.meta.url);

export const validateSettingsInput = validate20;
const schema31 = {"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://qforge.invalid/schemas/settings.schema.json","title":"qforge database settings (qforge.yaml)","description":"Settings of one database folder, read from qforge.yaml at its root. Every key is optional and has the documented default; unknown keys are errors.","type":"object","additionalProperties":false,"properties":{"title":{"description":"Database title, written into thermo.json and the comment header of nasa7.txt. Default: 'qforge database'.","type":"string","minLength":1,"maxLength":200,"default":"qforge database"},"record_identifier":{"description":"Text of the date/identifier field (columns 19-24) of every 80-column record. Never today's date, so outputs stay reproducible. 0-6 characters of [A-Za-z0-9 ._/-]. Default: 'QFORGE'.","type":"string","pattern":"^[A-Za-z0-9 ._/-]{0,6}$","default":"QFORGE","title":"0-6 characters of A-Z a-z 0-9 space . _ / -"},"temperature_ranges":{"description":"Fit ranges in K: [low, mid] and [mid, high]. A species file may override them. Default: 200 / 1000 / 6000.","type":"object","additionalProperties":false,"properties":{"low":{"type":"number","exclusiveMinimum":0,"default":200},"mid":{"type":"number","exclusiveMinimum":0,"default":1000},"high":{"type":"number","exclusiveMinimum":0,"maximum":20000,"default":6000}}},"standard_pressure":{"description":"Standard-state pressure of the ideal-gas properties: '1 bar' (IUPAC, NIST-JANAF 4th ed.) or '1 atm' (older tables). Default: '1 bar'.","enum":["1 bar","1 atm"],"default":"1 bar","title":"'1 bar' or '1 atm'"},"fit":{"description":"How the NASA 7-coefficient polynomials are fitted.","type":"object","additionalProperties":false,"properties":{"weights":{"description":"Relative weights of the Cp/R, H/RT and S/R residuals. Default: 1 each.","type":"object","additionalProperties":false,"properties":{"cp":{"type":"number","minimum":0,"default":1},"h":{"type":"number","minimum":0,"default":1},"s":{"type":"number","minimum":0,"default":1}}},"method":{"description":"How the coefficients are chosen: 'minimax' (default) minimises the largest error relative to the limits of 'tolerances' (the measure the check uses, so a species passes exactly when the optimum is at most 1), started from and never worse than least squares; 'least_squares' minimises the weighted sum of squared errors (weights above).","enum":["minimax","least_squares"],"default":"minimax"},"continuity_order":{"description":"Highest derivative of Cp made continuous at the midpoint (H and S always are): 1 = Cp and dCp/dT, 2 = also d2Cp/dT2. Default: 1.","enum":[1,2],"default":1},"optimise_mid":{"description":"false keeps the midpoint at temperature_ranges.mid for every species; an object lets the fit choose the midpoint per species in [min, max] on the given step (K), clipped to 100 K inside the species' own range, minimising the worst error relative to the limits (minimax) or the worst weighted error (least_squares). A species that sets temperature_ranges.mid keeps that midpoint. Default: {min: 700, max: 2500, step: 100}.","default":{"min":700,"max":2500,"step":100},"oneOf":[{"const":false},{"type":"object","additionalProperties":false,"required":["min","max"],"properties":{"min":{"type":"number","exclusiveMinimum":0},"max":{"type":"number","exclusiveMinimum":0},"step":{"type":"number","exclusiveMinimum":0,"default":100}}}],"title":"false, or {min, max, step?} in K"},"sampling_step":{"description":"Spacing (K) of the grid of computed points the fit uses; the range ends, the midpoint and 298.15 K are always included. Default: 10.","type":"number","minimum":0.5,"maximum":500,"default":10},"nodes":{"description":"Which computed points of the sampling grid the fit is made from; the fit check always judges every sampling point. 'all': every one. A mapping: `count` target temperatures over the fit range spaced `uniform` (evenly in T), `geometric` (evenly in ln T, denser at low T) or `chebyshev` (Chebyshev-Lobatto points, denser at both ends), each moved to the nearest sampling point, plus the range ends, 298.15 K and every midpoint candidate (more points are filled in where a range would be too sparsely covered); `exchange: true` then adds the sampling points where the fit's error relative to its limit has a local maximum and fits again at the chosen midpoint (one Remez exchange step). Default: 'all'.","oneOf":[{"const":"all"},{"type":"object","additionalProperties":false,"properties":{"spacing":{"enum":["uniform","geometric","chebyshev"],"default":"geometric"},"count":{"type":"integer","minimum":2,"maximum":100000,"default":40},"exchange":{"type":"boolean","default":true}}}],"title":"'all', or {spacing?, count?, exchange?}","default":"all"}}},"tolerances":{"description":"Largest fit error accepted at each temperature (dimensionless): for q = cp, h, s the limit is max(q, relative_to_cp.q × Cp/R(T)), Cp/R the computed value. A species whose fit exceeds one fails. Defaults: cp 0.1 (|ΔCp/R|), h 0.02 (|ΔH/RT|), s 0.02 (|ΔS/R|); relative_to_cp cp 0.015, h 0.003, s 0.003. A species file may set the same keys for itself.","type":"object","additionalProperties":false,"properties":{"cp":{"type":"number","exclusiveMinimum":0,"default":0.1},"h":{"type":"number","exclusiveMinimum":0,"default":0.02},"s":{"type":"number","exclusiveMinimum":0,"default":0.02},"relative_to_cp":{"description":"Size-scaled part of the limits: multiples of the computed Cp/R at the same temperature. 0.003 in H/RT and S/R is the error a 0.3 % shift in temperature would cause. Defaults: cp 0.015, h 0.003, s 0.003.","type":"object","additionalProperties":false,"properties":{"cp":{"type":"number","minimum":0,"default":0.015},"h":{"type":"number","minimum":0,"default":0.003},"s":{"type":"number","minimum":0,"default":0.003}}}}},"outputs":{"description":"Which database files a build writes (summary.json is always written). Default: all true except report.","type":"object","additionalProperties":false,"properties":{"thermo_json":{"type":"boolean","default":true},"nasa7":{"type":"boolean","default":true},"tables":{"type":"boolean","default":true},"report":{"description":"Also write report.html: overview and per-species charts of the build (same as build --report). Default: false.","type":"boolean","default":false}}},"tables":{"description":"Temperature grid (K) of tables/<name>.csv: from, to, step, plus extra temperatures; clipped to each species' fitted range. Default: 200 to 6000 step 100, plus 298.15.","type":"object","additionalProperties":false,"properties":{"from":{"type":"number","exclusiveMinimum":0,"default":200},"to":{"type":"number","exclusiveMinimum":0,"default":6000},"step":{"type":"number","minimum":1,"default":100},"extra":{"type":"array","items":{"type":"number","exclusiveMinimum":0},"maxItems":1000,"default":[298.15]}}},"references":{"description":"Reference data `qforge compare` uses when no --reference is given: files relative to the database folder, the largest accepted deviations, and known deviations (species/temperature windows with a wider, reasoned limit). Default: no files; cp 0.5 J/(mol K), s 0.5 J/(mol K), h 0.5 kJ/mol; no known deviations.","type":"object","additionalProperties":false,"properties":{"files":{"type":"array","items":{"type":"string","minLength":1},"default":[]},"tolerances":{"type":"object","additionalProperties":false,"properties":{"cp":{"description":"J/(mol K)","type":"number","exclusiveMinimum":0,"default":0.5},"s":{"description":"J/(mol K)","type":"number","exclusiveMinimum":0,"default":0.5},"h":{"description":"H-H298, kJ/mol","type":"number","exclusiveMinimum":0,"default":0.5}}},"known_deviations":{"description":"Recorded, reasoned exceptions to references.tolerances: inside its temperature window, a value of the named species whose deviation exceeds the normal tolerance but not the widened one is reported as 'known' (not a breach; compare still exits 0). Each entry must give a reason. compare warns when an entry names a species absent from the build, covers no compared value, or is no longer needed (every value it covers is within the normal tolerance). `qforge compare --strict` ignores every entry. Entries for the same species may not overlap in temperature for the same quantity. Default: none.","type":"array","maxItems":1000,"default":[],"items":{"type":"object","additionalProperties":false,"required":["species","tolerances","reason"],"properties":{"species":{"description":"Species record name, exactly as in the build (e.g. 'H2').","type":"string","minLength":1},"from":{"description":"Lowest temperature (K, inclusive) the entry covers. Default: no lower limit.","type":"number","minimum":0},"to":{"description":"Highest temperature (K, inclusive) the entry covers. Default: no upper limit.","type":"number","exclusiveMinimum":0},"tolerances":{"description":"Widened largest |deviation| per quantity inside the window; each must exceed the normal references.tolerances value. Quantities not given keep the normal tolerance. At least one.","type":"object","additionalProperties":false,"minProperties":1,"properties":{"cp":{"description":"J/(mol K)","type":"number","exclusiveMinimum":0},"s":{"description":"J/(mol K)","type":"number","exclusiveMinimum":0},"h":{"description":"H-H298, kJ/mol","type":"number","exclusiveMinimum":0}},"title":"a mapping with any of cp, s (J/(mol K)), h (kJ/mol)"},"reason":{"description":"Why the deviation is accepted (the model limit, where it is documented). Printed by compare. At least 10 characters.","type":"string","minLength":10,"pattern":"\\S"}}}}}},"strict":{"description":"Treat every warning of `check` and `build` as an error (as --strict does), except the accepted ones. Default false.","type":"boolean","default":false},"accepted_warnings":{"description":"Warnings accepted in writing for the whole database or one species: code (as printed in [brackets]), optional species, reason. An accepted warning is neither printed nor made an error by strict mode; an entry that matches no warning is warned about (stale-accepted-warning).","type":"array","items":{"type":"object","additionalProperties":false,"required":["code","reason"],"properties":{"code":{"type":"string","pattern":"^[a-z0-9]+(-[a-z0-9]+)*$","title":"a diagnostic code in lower kebab-case"},"species":{"type":"string","minLength":1},"reason":{"type":"string","minLength":10,"title":"why the warning is accepted (at least 10 characters)"}}},"default":[]}}};
const func1 = Object.prototype.hasOwnProperty;
const func2 = require("ajv/dist/runtime/ucs2length").default;
const pattern4 = new RegExp("^[A-Za-z0-9 ._/-]{0,6}$", "u");
const pattern5 = new RegExp("\\S", "u");
const pattern6 = new RegExp("^[a-z0-9]+(-[a-z0-9]+)*$", "u");

function validate20(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
/*# sourceURL="https://qforge.invalid/schemas/settings.schema.json" */;
let vErrors = null;
let errors = 0;
const evaluated0 = validate20.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
for(const key0 in data){
if(!(func1.call(schema31.properties, key0))){
const err0 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
}
if(data.title !== undefined){
let data0 = data.title;
if(typeof data0 === "string"){
if(func2(data0) > 200){
const err1 = {instancePath:instancePath+"/title",schemaPath:"#/properties/title/maxLength",keyword:"maxLength",params:{limit: 200},message:"must NOT have more than 200 characters",schema:200,parentSchema:schema31.properties.title,data:data0};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(func2(data0) < 1){
const err2 = {instancePath:instancePath+"/title",schemaPath:"#/properties/title/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema31.properties.title,data:data0};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
}
else {
const err3 = {instancePath:instancePath+"/title",schemaPath:"#/properties/title/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.title.type,parentSchema:schema31.properties.title,data:data0};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
}
if(data.record_identifier !== undefined){
let data1 = data.record_identifier;
if(typeof data1 === "string"){
if(!pattern4.test(data1)){
const err4 = {instancePath:instancePath+"/record_identifier",schemaPath:"#/properties/record_identifier/pattern",keyword:"pattern",params:{pattern: "^[A-Za-z0-9 ._/-]{0,6}$"},message:"must match pattern \""+"^[A-Za-z0-9 ._/-]{0,6}$"+"\"",schema:"^[A-Za-z0-9 ._/-]{0,6}$",parentSchema:schema31.properties.record_identifier,data:data1};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
else {
const err5 = {instancePath:instancePath+"/record_identifier",schemaPath:"#/properties/record_identifier/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.record_identifier.type,parentSchema:schema31.properties.record_identifier,data:data1};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
if(data.temperature_ranges !== undefined){
let data2 = data.temperature_ranges;
if(data2 && typeof data2 == "object" && !Array.isArray(data2)){
for(const key1 in data2){
if(!(((key1 === "low") || (key1 === "mid")) || (key1 === "high"))){
const err6 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.temperature_ranges,data:data2};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
if(data2.low !== undefined){
let data3 = data2.low;
if((typeof data3 == "number") && (isFinite(data3))){
if(data3 <= 0 || isNaN(data3)){
const err7 = {instancePath:instancePath+"/temperature_ranges/low",schemaPath:"#/properties/temperature_ranges/properties/low/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.temperature_ranges.properties.low,data:data3};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
else {
const err8 = {instancePath:instancePath+"/temperature_ranges/low",schemaPath:"#/properties/temperature_ranges/properties/low/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.temperature_ranges.properties.low.type,parentSchema:schema31.properties.temperature_ranges.properties.low,data:data3};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
}
if(data2.mid !== undefined){
let data4 = data2.mid;
if((typeof data4 == "number") && (isFinite(data4))){
if(data4 <= 0 || isNaN(data4)){
const err9 = {instancePath:instancePath+"/temperature_ranges/mid",schemaPath:"#/properties/temperature_ranges/properties/mid/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.temperature_ranges.properties.mid,data:data4};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
else {
const err10 = {instancePath:instancePath+"/temperature_ranges/mid",schemaPath:"#/properties/temperature_ranges/properties/mid/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.temperature_ranges.properties.mid.type,parentSchema:schema31.properties.temperature_ranges.properties.mid,data:data4};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
if(data2.high !== undefined){
let data5 = data2.high;
if((typeof data5 == "number") && (isFinite(data5))){
if(data5 > 20000 || isNaN(data5)){
const err11 = {instancePath:instancePath+"/temperature_ranges/high",schemaPath:"#/properties/temperature_ranges/properties/high/maximum",keyword:"maximum",params:{comparison: "<=", limit: 20000},message:"must be <= 20000",schema:20000,parentSchema:schema31.properties.temperature_ranges.properties.high,data:data5};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
if(data5 <= 0 || isNaN(data5)){
const err12 = {instancePath:instancePath+"/temperature_ranges/high",schemaPath:"#/properties/temperature_ranges/properties/high/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.temperature_ranges.properties.high,data:data5};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
else {
const err13 = {instancePath:instancePath+"/temperature_ranges/high",schemaPath:"#/properties/temperature_ranges/properties/high/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.temperature_ranges.properties.high.type,parentSchema:schema31.properties.temperature_ranges.properties.high,data:data5};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
}
else {
const err14 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.temperature_ranges.type,parentSchema:schema31.properties.temperature_ranges,data:data2};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
if(data.standard_pressure !== undefined){
let data6 = data.standard_pressure;
if(!((data6 === "1 bar") || (data6 === "1 atm"))){
const err15 = {instancePath:instancePath+"/standard_pressure",schemaPath:"#/properties/standard_pressure/enum",keyword:"enum",params:{allowedValues: schema31.properties.standard_pressure.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.standard_pressure.enum,parentSchema:schema31.properties.standard_pressure,data:data6};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
if(data.fit !== undefined){
let data7 = data.fit;
if(data7 && typeof data7 == "object" && !Array.isArray(data7)){
for(const key2 in data7){
if(!((((((key2 === "weights") || (key2 === "method")) || (key2 === "continuity_order")) || (key2 === "optimise_mid")) || (key2 === "sampling_step")) || (key2 === "nodes"))){
const err16 = {instancePath:instancePath+"/fit",schemaPath:"#/properties/fit/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.fit,data:data7};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
}
if(data7.weights !== undefined){
let data8 = data7.weights;
if(data8 && typeof data8 == "object" && !Array.isArray(data8)){
for(const key3 in data8){
if(!(((key3 === "cp") || (key3 === "h")) || (key3 === "s"))){
const err17 = {instancePath:instancePath+"/fit/weights",schemaPath:"#/properties/fit/properties/weights/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.fit.properties.weights,data:data8};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
if(data8.cp !== undefined){
let data9 = data8.cp;
if((typeof data9 == "number") && (isFinite(data9))){
if(data9 < 0 || isNaN(data9)){
const err18 = {instancePath:instancePath+"/fit/weights/cp",schemaPath:"#/properties/fit/properties/weights/properties/cp/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.fit.properties.weights.properties.cp,data:data9};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
}
else {
const err19 = {instancePath:instancePath+"/fit/weights/cp",schemaPath:"#/properties/fit/properties/weights/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.fit.properties.weights.properties.cp.type,parentSchema:schema31.properties.fit.properties.weights.properties.cp,data:data9};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data8.h !== undefined){
let data10 = data8.h;
if((typeof data10 == "number") && (isFinite(data10))){
if(data10 < 0 || isNaN(data10)){
const err20 = {instancePath:instancePath+"/fit/weights/h",schemaPath:"#/properties/fit/properties/weights/properties/h/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.fit.properties.weights.properties.h,data:data10};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
else {
const err21 = {instancePath:instancePath+"/fit/weights/h",schemaPath:"#/properties/fit/properties/weights/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.fit.properties.weights.properties.h.type,parentSchema:schema31.properties.fit.properties.weights.properties.h,data:data10};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
if(data8.s !== undefined){
let data11 = data8.s;
if((typeof data11 == "number") && (isFinite(data11))){
if(data11 < 0 || isNaN(data11)){
const err22 = {instancePath:instancePath+"/fit/weights/s",schemaPath:"#/properties/fit/properties/weights/properties/s/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.fit.properties.weights.properties.s,data:data11};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
else {
const err23 = {instancePath:instancePath+"/fit/weights/s",schemaPath:"#/properties/fit/properties/weights/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.fit.properties.weights.properties.s.type,parentSchema:schema31.properties.fit.properties.weights.properties.s,data:data11};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
}
else {
const err24 = {instancePath:instancePath+"/fit/weights",schemaPath:"#/properties/fit/properties/weights/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.fit.properties.weights.type,parentSchema:schema31.properties.fit.properties.weights,data:data8};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
}
if(data7.method !== undefined){
let data12 = data7.method;
if(!((data12 === "minimax") || (data12 === "least_squares"))){
const err25 = {instancePath:instancePath+"/fit/method",schemaPath:"#/properties/fit/properties/method/enum",keyword:"enum",params:{allowedValues: schema31.properties.fit.properties.method.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.fit.properties.method.enum,parentSchema:schema31.properties.fit.properties.method,data:data12};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
}
if(data7.continuity_order !== undefined){
let data13 = data7.continuity_order;
if(!((data13 === 1) || (data13 === 2))){
const err26 = {instancePath:instancePath+"/fit/continuity_order",schemaPath:"#/properties/fit/properties/continuity_order/enum",keyword:"enum",params:{allowedValues: schema31.properties.fit.properties.continuity_order.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.fit.properties.continuity_order.enum,parentSchema:schema31.properties.fit.properties.continuity_order,data:data13};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
if(data7.optimise_mid !== undefined){
let data14 = data7.optimise_mid;
const _errs31 = errors;
let valid4 = false;
let passing0 = null;
const _errs32 = errors;
if(false !== data14){
const err27 = {instancePath:instancePath+"/fit/optimise_mid",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/0/const",keyword:"const",params:{allowedValue: false},message:"must be equal to constant",schema:false,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[0],data:data14};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
var _valid0 = _errs32 === errors;
if(_valid0){
valid4 = true;
passing0 = 0;
}
const _errs33 = errors;
if(data14 && typeof data14 == "object" && !Array.isArray(data14)){
if(data14.min === undefined){
const err28 = {instancePath:instancePath+"/fit/optimise_mid",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/required",keyword:"required",params:{missingProperty: "min"},message:"must have required property '"+"min"+"'",schema:schema31.properties.fit.properties.optimise_mid.oneOf[1].required,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1],data:data14};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
if(data14.max === undefined){
const err29 = {instancePath:instancePath+"/fit/optimise_mid",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/required",keyword:"required",params:{missingProperty: "max"},message:"must have required property '"+"max"+"'",schema:schema31.properties.fit.properties.optimise_mid.oneOf[1].required,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1],data:data14};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
for(const key4 in data14){
if(!(((key4 === "min") || (key4 === "max")) || (key4 === "step"))){
const err30 = {instancePath:instancePath+"/fit/optimise_mid",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1],data:data14};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
if(data14.min !== undefined){
let data15 = data14.min;
if((typeof data15 == "number") && (isFinite(data15))){
if(data15 <= 0 || isNaN(data15)){
const err31 = {instancePath:instancePath+"/fit/optimise_mid/min",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/properties/min/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.min,data:data15};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
}
else {
const err32 = {instancePath:instancePath+"/fit/optimise_mid/min",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/properties/min/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.min.type,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.min,data:data15};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
}
if(data14.max !== undefined){
let data16 = data14.max;
if((typeof data16 == "number") && (isFinite(data16))){
if(data16 <= 0 || isNaN(data16)){
const err33 = {instancePath:instancePath+"/fit/optimise_mid/max",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/properties/max/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.max,data:data16};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
}
else {
const err34 = {instancePath:instancePath+"/fit/optimise_mid/max",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/properties/max/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.max.type,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.max,data:data16};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
}
if(data14.step !== undefined){
let data17 = data14.step;
if((typeof data17 == "number") && (isFinite(data17))){
if(data17 <= 0 || isNaN(data17)){
const err35 = {instancePath:instancePath+"/fit/optimise_mid/step",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/properties/step/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.step,data:data17};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
}
else {
const err36 = {instancePath:instancePath+"/fit/optimise_mid/step",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/properties/step/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.step.type,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1].properties.step,data:data17};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
}
else {
const err37 = {instancePath:instancePath+"/fit/optimise_mid",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf/1/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.fit.properties.optimise_mid.oneOf[1].type,parentSchema:schema31.properties.fit.properties.optimise_mid.oneOf[1],data:data14};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
var _valid0 = _errs33 === errors;
if(_valid0 && valid4){
valid4 = false;
passing0 = [passing0, 1];
}
else {
if(_valid0){
valid4 = true;
passing0 = 1;
}
}
if(!valid4){
const err38 = {instancePath:instancePath+"/fit/optimise_mid",schemaPath:"#/properties/fit/properties/optimise_mid/oneOf",keyword:"oneOf",params:{passingSchemas: passing0},message:"must match exactly one schema in oneOf",schema:schema31.properties.fit.properties.optimise_mid.oneOf,parentSchema:schema31.properties.fit.properties.optimise_mid,data:data14};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
else {
errors = _errs31;
if(vErrors !== null){
if(_errs31){
vErrors.length = _errs31;
}
else {
vErrors = null;
}
}
}
}
if(data7.sampling_step !== undefined){
let data18 = data7.sampling_step;
if((typeof data18 == "number") && (isFinite(data18))){
if(data18 > 500 || isNaN(data18)){
const err39 = {instancePath:instancePath+"/fit/sampling_step",schemaPath:"#/properties/fit/properties/sampling_step/maximum",keyword:"maximum",params:{comparison: "<=", limit: 500},message:"must be <= 500",schema:500,parentSchema:schema31.properties.fit.properties.sampling_step,data:data18};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
if(data18 < 0.5 || isNaN(data18)){
const err40 = {instancePath:instancePath+"/fit/sampling_step",schemaPath:"#/properties/fit/properties/sampling_step/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0.5},message:"must be >= 0.5",schema:0.5,parentSchema:schema31.properties.fit.properties.sampling_step,data:data18};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
}
else {
const err41 = {instancePath:instancePath+"/fit/sampling_step",schemaPath:"#/properties/fit/properties/sampling_step/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.fit.properties.sampling_step.type,parentSchema:schema31.properties.fit.properties.sampling_step,data:data18};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
}
if(data7.nodes !== undefined){
let data19 = data7.nodes;
const _errs45 = errors;
let valid6 = false;
let passing1 = null;
const _errs46 = errors;
if("all" !== data19){
const err42 = {instancePath:instancePath+"/fit/nodes",schemaPath:"#/properties/fit/properties/nodes/oneOf/0/const",keyword:"const",params:{allowedValue: "all"},message:"must be equal to constant",schema:"all",parentSchema:schema31.properties.fit.properties.nodes.oneOf[0],data:data19};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
var _valid1 = _errs46 === errors;
if(_valid1){
valid6 = true;
passing1 = 0;
}
const _errs47 = errors;
if(data19 && typeof data19 == "object" && !Array.isArray(data19)){
for(const key5 in data19){
if(!(((key5 === "spacing") || (key5 === "count")) || (key5 === "exchange"))){
const err43 = {instancePath:instancePath+"/fit/nodes",schemaPath:"#/properties/fit/properties/nodes/oneOf/1/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key5},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.fit.properties.nodes.oneOf[1],data:data19};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
}
if(data19.spacing !== undefined){
let data20 = data19.spacing;
if(!(((data20 === "uniform") || (data20 === "geometric")) || (data20 === "chebyshev"))){
const err44 = {instancePath:instancePath+"/fit/nodes/spacing",schemaPath:"#/properties/fit/properties/nodes/oneOf/1/properties/spacing/enum",keyword:"enum",params:{allowedValues: schema31.properties.fit.properties.nodes.oneOf[1].properties.spacing.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.fit.properties.nodes.oneOf[1].properties.spacing.enum,parentSchema:schema31.properties.fit.properties.nodes.oneOf[1].properties.spacing,data:data20};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
}
if(data19.count !== undefined){
let data21 = data19.count;
if(!(((typeof data21 == "number") && (!(data21 % 1) && !isNaN(data21))) && (isFinite(data21)))){
const err45 = {instancePath:instancePath+"/fit/nodes/count",schemaPath:"#/properties/fit/properties/nodes/oneOf/1/properties/count/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema31.properties.fit.properties.nodes.oneOf[1].properties.count.type,parentSchema:schema31.properties.fit.properties.nodes.oneOf[1].properties.count,data:data21};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
if((typeof data21 == "number") && (isFinite(data21))){
if(data21 > 100000 || isNaN(data21)){
const err46 = {instancePath:instancePath+"/fit/nodes/count",schemaPath:"#/properties/fit/properties/nodes/oneOf/1/properties/count/maximum",keyword:"maximum",params:{comparison: "<=", limit: 100000},message:"must be <= 100000",schema:100000,parentSchema:schema31.properties.fit.properties.nodes.oneOf[1].properties.count,data:data21};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
if(data21 < 2 || isNaN(data21)){
const err47 = {instancePath:instancePath+"/fit/nodes/count",schemaPath:"#/properties/fit/properties/nodes/oneOf/1/properties/count/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema31.properties.fit.properties.nodes.oneOf[1].properties.count,data:data21};
if(vErrors === null){
vErrors = [err47];
}
else {
vErrors.push(err47);
}
errors++;
}
}
}
if(data19.exchange !== undefined){
let data22 = data19.exchange;
if(typeof data22 !== "boolean"){
const err48 = {instancePath:instancePath+"/fit/nodes/exchange",schemaPath:"#/properties/fit/properties/nodes/oneOf/1/properties/exchange/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema31.properties.fit.properties.nodes.oneOf[1].properties.exchange.type,parentSchema:schema31.properties.fit.properties.nodes.oneOf[1].properties.exchange,data:data22};
if(vErrors === null){
vErrors = [err48];
}
else {
vErrors.push(err48);
}
errors++;
}
}
}
else {
const err49 = {instancePath:instancePath+"/fit/nodes",schemaPath:"#/properties/fit/properties/nodes/oneOf/1/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.fit.properties.nodes.oneOf[1].type,parentSchema:schema31.properties.fit.properties.nodes.oneOf[1],data:data19};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
var _valid1 = _errs47 === errors;
if(_valid1 && valid6){
valid6 = false;
passing1 = [passing1, 1];
}
else {
if(_valid1){
valid6 = true;
passing1 = 1;
}
}
if(!valid6){
const err50 = {instancePath:instancePath+"/fit/nodes",schemaPath:"#/properties/fit/properties/nodes/oneOf",keyword:"oneOf",params:{passingSchemas: passing1},message:"must match exactly one schema in oneOf",schema:schema31.properties.fit.properties.nodes.oneOf,parentSchema:schema31.properties.fit.properties.nodes,data:data19};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
else {
errors = _errs45;
if(vErrors !== null){
if(_errs45){
vErrors.length = _errs45;
}
else {
vErrors = null;
}
}
}
}
}
else {
const err51 = {instancePath:instancePath+"/fit",schemaPath:"#/properties/fit/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.fit.type,parentSchema:schema31.properties.fit,data:data7};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
}
if(data.tolerances !== undefined){
let data23 = data.tolerances;
if(data23 && typeof data23 == "object" && !Array.isArray(data23)){
for(const key6 in data23){
if(!((((key6 === "cp") || (key6 === "h")) || (key6 === "s")) || (key6 === "relative_to_cp"))){
const err52 = {instancePath:instancePath+"/tolerances",schemaPath:"#/properties/tolerances/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key6},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.tolerances,data:data23};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
}
if(data23.cp !== undefined){
let data24 = data23.cp;
if((typeof data24 == "number") && (isFinite(data24))){
if(data24 <= 0 || isNaN(data24)){
const err53 = {instancePath:instancePath+"/tolerances/cp",schemaPath:"#/properties/tolerances/properties/cp/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tolerances.properties.cp,data:data24};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
}
else {
const err54 = {instancePath:instancePath+"/tolerances/cp",schemaPath:"#/properties/tolerances/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.cp.type,parentSchema:schema31.properties.tolerances.properties.cp,data:data24};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
}
if(data23.h !== undefined){
let data25 = data23.h;
if((typeof data25 == "number") && (isFinite(data25))){
if(data25 <= 0 || isNaN(data25)){
const err55 = {instancePath:instancePath+"/tolerances/h",schemaPath:"#/properties/tolerances/properties/h/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tolerances.properties.h,data:data25};
if(vErrors === null){
vErrors = [err55];
}
else {
vErrors.push(err55);
}
errors++;
}
}
else {
const err56 = {instancePath:instancePath+"/tolerances/h",schemaPath:"#/properties/tolerances/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.h.type,parentSchema:schema31.properties.tolerances.properties.h,data:data25};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
}
if(data23.s !== undefined){
let data26 = data23.s;
if((typeof data26 == "number") && (isFinite(data26))){
if(data26 <= 0 || isNaN(data26)){
const err57 = {instancePath:instancePath+"/tolerances/s",schemaPath:"#/properties/tolerances/properties/s/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tolerances.properties.s,data:data26};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
}
else {
const err58 = {instancePath:instancePath+"/tolerances/s",schemaPath:"#/properties/tolerances/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.s.type,parentSchema:schema31.properties.tolerances.properties.s,data:data26};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
}
if(data23.relative_to_cp !== undefined){
let data27 = data23.relative_to_cp;
if(data27 && typeof data27 == "object" && !Array.isArray(data27)){
for(const key7 in data27){
if(!(((key7 === "cp") || (key7 === "h")) || (key7 === "s"))){
const err59 = {instancePath:instancePath+"/tolerances/relative_to_cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key7},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.tolerances.properties.relative_to_cp,data:data27};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
}
if(data27.cp !== undefined){
let data28 = data27.cp;
if((typeof data28 == "number") && (isFinite(data28))){
if(data28 < 0 || isNaN(data28)){
const err60 = {instancePath:instancePath+"/tolerances/relative_to_cp/cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/cp/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.cp,data:data28};
if(vErrors === null){
vErrors = [err60];
}
else {
vErrors.push(err60);
}
errors++;
}
}
else {
const err61 = {instancePath:instancePath+"/tolerances/relative_to_cp/cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.relative_to_cp.properties.cp.type,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.cp,data:data28};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
}
if(data27.h !== undefined){
let data29 = data27.h;
if((typeof data29 == "number") && (isFinite(data29))){
if(data29 < 0 || isNaN(data29)){
const err62 = {instancePath:instancePath+"/tolerances/relative_to_cp/h",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/h/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.h,data:data29};
if(vErrors === null){
vErrors = [err62];
}
else {
vErrors.push(err62);
}
errors++;
}
}
else {
const err63 = {instancePath:instancePath+"/tolerances/relative_to_cp/h",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.relative_to_cp.properties.h.type,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.h,data:data29};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
}
if(data27.s !== undefined){
let data30 = data27.s;
if((typeof data30 == "number") && (isFinite(data30))){
if(data30 < 0 || isNaN(data30)){
const err64 = {instancePath:instancePath+"/tolerances/relative_to_cp/s",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/s/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.s,data:data30};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
}
else {
const err65 = {instancePath:instancePath+"/tolerances/relative_to_cp/s",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.relative_to_cp.properties.s.type,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.s,data:data30};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
}
}
else {
const err66 = {instancePath:instancePath+"/tolerances/relative_to_cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.tolerances.properties.relative_to_cp.type,parentSchema:schema31.properties.tolerances.properties.relative_to_cp,data:data27};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
}
}
else {
const err67 = {instancePath:instancePath+"/tolerances",schemaPath:"#/properties/tolerances/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.tolerances.type,parentSchema:schema31.properties.tolerances,data:data23};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
}
if(data.outputs !== undefined){
let data31 = data.outputs;
if(data31 && typeof data31 == "object" && !Array.isArray(data31)){
for(const key8 in data31){
if(!((((key8 === "thermo_json") || (key8 === "nasa7")) || (key8 === "tables")) || (key8 === "report"))){
const err68 = {instancePath:instancePath+"/outputs",schemaPath:"#/properties/outputs/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key8},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.outputs,data:data31};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
}
if(data31.thermo_json !== undefined){
let data32 = data31.thermo_json;
if(typeof data32 !== "boolean"){
const err69 = {instancePath:instancePath+"/outputs/thermo_json",schemaPath:"#/properties/outputs/properties/thermo_json/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema31.properties.outputs.properties.thermo_json.type,parentSchema:schema31.properties.outputs.properties.thermo_json,data:data32};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
}
if(data31.nasa7 !== undefined){
let data33 = data31.nasa7;
if(typeof data33 !== "boolean"){
const err70 = {instancePath:instancePath+"/outputs/nasa7",schemaPath:"#/properties/outputs/properties/nasa7/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema31.properties.outputs.properties.nasa7.type,parentSchema:schema31.properties.outputs.properties.nasa7,data:data33};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
}
if(data31.tables !== undefined){
let data34 = data31.tables;
if(typeof data34 !== "boolean"){
const err71 = {instancePath:instancePath+"/outputs/tables",schemaPath:"#/properties/outputs/properties/tables/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema31.properties.outputs.properties.tables.type,parentSchema:schema31.properties.outputs.properties.tables,data:data34};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
}
if(data31.report !== undefined){
let data35 = data31.report;
if(typeof data35 !== "boolean"){
const err72 = {instancePath:instancePath+"/outputs/report",schemaPath:"#/properties/outputs/properties/report/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema31.properties.outputs.properties.report.type,parentSchema:schema31.properties.outputs.properties.report,data:data35};
if(vErrors === null){
vErrors = [err72];
}
else {
vErrors.push(err72);
}
errors++;
}
}
}
else {
const err73 = {instancePath:instancePath+"/outputs",schemaPath:"#/properties/outputs/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.outputs.type,parentSchema:schema31.properties.outputs,data:data31};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
}
if(data.tables !== undefined){
let data36 = data.tables;
if(data36 && typeof data36 == "object" && !Array.isArray(data36)){
for(const key9 in data36){
if(!((((key9 === "from") || (key9 === "to")) || (key9 === "step")) || (key9 === "extra"))){
const err74 = {instancePath:instancePath+"/tables",schemaPath:"#/properties/tables/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key9},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.tables,data:data36};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
}
if(data36.from !== undefined){
let data37 = data36.from;
if((typeof data37 == "number") && (isFinite(data37))){
if(data37 <= 0 || isNaN(data37)){
const err75 = {instancePath:instancePath+"/tables/from",schemaPath:"#/properties/tables/properties/from/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tables.properties.from,data:data37};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
}
else {
const err76 = {instancePath:instancePath+"/tables/from",schemaPath:"#/properties/tables/properties/from/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tables.properties.from.type,parentSchema:schema31.properties.tables.properties.from,data:data37};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
}
if(data36.to !== undefined){
let data38 = data36.to;
if((typeof data38 == "number") && (isFinite(data38))){
if(data38 <= 0 || isNaN(data38)){
const err77 = {instancePath:instancePath+"/tables/to",schemaPath:"#/properties/tables/properties/to/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tables.properties.to,data:data38};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
}
else {
const err78 = {instancePath:instancePath+"/tables/to",schemaPath:"#/properties/tables/properties/to/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tables.properties.to.type,parentSchema:schema31.properties.tables.properties.to,data:data38};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
}
if(data36.step !== undefined){
let data39 = data36.step;
if((typeof data39 == "number") && (isFinite(data39))){
if(data39 < 1 || isNaN(data39)){
const err79 = {instancePath:instancePath+"/tables/step",schemaPath:"#/properties/tables/properties/step/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema31.properties.tables.properties.step,data:data39};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
}
else {
const err80 = {instancePath:instancePath+"/tables/step",schemaPath:"#/properties/tables/properties/step/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tables.properties.step.type,parentSchema:schema31.properties.tables.properties.step,data:data39};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
}
if(data36.extra !== undefined){
let data40 = data36.extra;
if(Array.isArray(data40)){
if(data40.length > 1000){
const err81 = {instancePath:instancePath+"/tables/extra",schemaPath:"#/properties/tables/properties/extra/maxItems",keyword:"maxItems",params:{limit: 1000},message:"must NOT have more than 1000 items",schema:1000,parentSchema:schema31.properties.tables.properties.extra,data:data40};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
const len0 = data40.length;
for(let i0=0; i0<len0; i0++){
let data41 = data40[i0];
if((typeof data41 == "number") && (isFinite(data41))){
if(data41 <= 0 || isNaN(data41)){
const err82 = {instancePath:instancePath+"/tables/extra/" + i0,schemaPath:"#/properties/tables/properties/extra/items/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tables.properties.extra.items,data:data41};
if(vErrors === null){
vErrors = [err82];
}
else {
vErrors.push(err82);
}
errors++;
}
}
else {
const err83 = {instancePath:instancePath+"/tables/extra/" + i0,schemaPath:"#/properties/tables/properties/extra/items/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tables.properties.extra.items.type,parentSchema:schema31.properties.tables.properties.extra.items,data:data41};
if(vErrors === null){
vErrors = [err83];
}
else {
vErrors.push(err83);
}
errors++;
}
}
}
else {
const err84 = {instancePath:instancePath+"/tables/extra",schemaPath:"#/properties/tables/properties/extra/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.tables.properties.extra.type,parentSchema:schema31.properties.tables.properties.extra,data:data40};
if(vErrors === null){
vErrors = [err84];
}
else {
vErrors.push(err84);
}
errors++;
}
}
}
else {
const err85 = {instancePath:instancePath+"/tables",schemaPath:"#/properties/tables/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.tables.type,parentSchema:schema31.properties.tables,data:data36};
if(vErrors === null){
vErrors = [err85];
}
else {
vErrors.push(err85);
}
errors++;
}
}
if(data.references !== undefined){
let data42 = data.references;
if(data42 && typeof data42 == "object" && !Array.isArray(data42)){
for(const key10 in data42){
if(!(((key10 === "files") || (key10 === "tolerances")) || (key10 === "known_deviations"))){
const err86 = {instancePath:instancePath+"/references",schemaPath:"#/properties/references/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key10},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.references,data:data42};
if(vErrors === null){
vErrors = [err86];
}
else {
vErrors.push(err86);
}
errors++;
}
}
if(data42.files !== undefined){
let data43 = data42.files;
if(Array.isArray(data43)){
const len1 = data43.length;
for(let i1=0; i1<len1; i1++){
let data44 = data43[i1];
if(typeof data44 === "string"){
if(func2(data44) < 1){
const err87 = {instancePath:instancePath+"/references/files/" + i1,schemaPath:"#/properties/references/properties/files/items/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema31.properties.references.properties.files.items,data:data44};
if(vErrors === null){
vErrors = [err87];
}
else {
vErrors.push(err87);
}
errors++;
}
}
else {
const err88 = {instancePath:instancePath+"/references/files/" + i1,schemaPath:"#/properties/references/properties/files/items/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.references.properties.files.items.type,parentSchema:schema31.properties.references.properties.files.items,data:data44};
if(vErrors === null){
vErrors = [err88];
}
else {
vErrors.push(err88);
}
errors++;
}
}
}
else {
const err89 = {instancePath:instancePath+"/references/files",schemaPath:"#/properties/references/properties/files/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.references.properties.files.type,parentSchema:schema31.properties.references.properties.files,data:data43};
if(vErrors === null){
vErrors = [err89];
}
else {
vErrors.push(err89);
}
errors++;
}
}
if(data42.tolerances !== undefined){
let data45 = data42.tolerances;
if(data45 && typeof data45 == "object" && !Array.isArray(data45)){
for(const key11 in data45){
if(!(((key11 === "cp") || (key11 === "s")) || (key11 === "h"))){
const err90 = {instancePath:instancePath+"/references/tolerances",schemaPath:"#/properties/references/properties/tolerances/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key11},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.references.properties.tolerances,data:data45};
if(vErrors === null){
vErrors = [err90];
}
else {
vErrors.push(err90);
}
errors++;
}
}
if(data45.cp !== undefined){
let data46 = data45.cp;
if((typeof data46 == "number") && (isFinite(data46))){
if(data46 <= 0 || isNaN(data46)){
const err91 = {instancePath:instancePath+"/references/tolerances/cp",schemaPath:"#/properties/references/properties/tolerances/properties/cp/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.references.properties.tolerances.properties.cp,data:data46};
if(vErrors === null){
vErrors = [err91];
}
else {
vErrors.push(err91);
}
errors++;
}
}
else {
const err92 = {instancePath:instancePath+"/references/tolerances/cp",schemaPath:"#/properties/references/properties/tolerances/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.references.properties.tolerances.properties.cp.type,parentSchema:schema31.properties.references.properties.tolerances.properties.cp,data:data46};
if(vErrors === null){
vErrors = [err92];
}
else {
vErrors.push(err92);
}
errors++;
}
}
if(data45.s !== undefined){
let data47 = data45.s;
if((typeof data47 == "number") && (isFinite(data47))){
if(data47 <= 0 || isNaN(data47)){
const err93 = {instancePath:instancePath+"/references/tolerances/s",schemaPath:"#/properties/references/properties/tolerances/properties/s/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.references.properties.tolerances.properties.s,data:data47};
if(vErrors === null){
vErrors = [err93];
}
else {
vErrors.push(err93);
}
errors++;
}
}
else {
const err94 = {instancePath:instancePath+"/references/tolerances/s",schemaPath:"#/properties/references/properties/tolerances/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.references.properties.tolerances.properties.s.type,parentSchema:schema31.properties.references.properties.tolerances.properties.s,data:data47};
if(vErrors === null){
vErrors = [err94];
}
else {
vErrors.push(err94);
}
errors++;
}
}
if(data45.h !== undefined){
let data48 = data45.h;
if((typeof data48 == "number") && (isFinite(data48))){
if(data48 <= 0 || isNaN(data48)){
const err95 = {instancePath:instancePath+"/references/tolerances/h",schemaPath:"#/properties/references/properties/tolerances/properties/h/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.references.properties.tolerances.properties.h,data:data48};
if(vErrors === null){
vErrors = [err95];
}
else {
vErrors.push(err95);
}
errors++;
}
}
else {
const err96 = {instancePath:instancePath+"/references/tolerances/h",schemaPath:"#/properties/references/properties/tolerances/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.references.properties.tolerances.properties.h.type,parentSchema:schema31.properties.references.properties.tolerances.properties.h,data:data48};
if(vErrors === null){
vErrors = [err96];
}
else {
vErrors.push(err96);
}
errors++;
}
}
}
else {
const err97 = {instancePath:instancePath+"/references/tolerances",schemaPath:"#/properties/references/properties/tolerances/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.references.properties.tolerances.type,parentSchema:schema31.properties.references.properties.tolerances,data:data45};
if(vErrors === null){
vErrors = [err97];
}
else {
vErrors.push(err97);
}
errors++;
}
}
if(data42.known_deviations !== undefined){
let data49 = data42.known_deviations;
if(Array.isArray(data49)){
if(data49.length > 1000){
const err98 = {instancePath:instancePath+"/references/known_deviations",schemaPath:"#/properties/references/properties/known_deviations/maxItems",keyword:"maxItems",params:{limit: 1000},message:"must NOT have more than 1000 items",schema:1000,parentSchema:schema31.properties.references.properties.known_deviations,data:data49};
if(vErrors === null){
vErrors = [err98];
}
else {
vErrors.push(err98);
}
errors++;
}
const len2 = data49.length;
for(let i2=0; i2<len2; i2++){
let data50 = data49[i2];
if(data50 && typeof data50 == "object" && !Array.isArray(data50)){
if(data50.species === undefined){
const err99 = {instancePath:instancePath+"/references/known_deviations/" + i2,schemaPath:"#/properties/references/properties/known_deviations/items/required",keyword:"required",params:{missingProperty: "species"},message:"must have required property '"+"species"+"'",schema:schema31.properties.references.properties.known_deviations.items.required,parentSchema:schema31.properties.references.properties.known_deviations.items,data:data50};
if(vErrors === null){
vErrors = [err99];
}
else {
vErrors.push(err99);
}
errors++;
}
if(data50.tolerances === undefined){
const err100 = {instancePath:instancePath+"/references/known_deviations/" + i2,schemaPath:"#/properties/references/properties/known_deviations/items/required",keyword:"required",params:{missingProperty: "tolerances"},message:"must have required property '"+"tolerances"+"'",schema:schema31.properties.references.properties.known_deviations.items.required,parentSchema:schema31.properties.references.properties.known_deviations.items,data:data50};
if(vErrors === null){
vErrors = [err100];
}
else {
vErrors.push(err100);
}
errors++;
}
if(data50.reason === undefined){
const err101 = {instancePath:instancePath+"/references/known_deviations/" + i2,schemaPath:"#/properties/references/properties/known_deviations/items/required",keyword:"required",params:{missingProperty: "reason"},message:"must have required property '"+"reason"+"'",schema:schema31.properties.references.properties.known_deviations.items.required,parentSchema:schema31.properties.references.properties.known_deviations.items,data:data50};
if(vErrors === null){
vErrors = [err101];
}
else {
vErrors.push(err101);
}
errors++;
}
for(const key12 in data50){
if(!(((((key12 === "species") || (key12 === "from")) || (key12 === "to")) || (key12 === "tolerances")) || (key12 === "reason"))){
const err102 = {instancePath:instancePath+"/references/known_deviations/" + i2,schemaPath:"#/properties/references/properties/known_deviations/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key12},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.references.properties.known_deviations.items,data:data50};
if(vErrors === null){
vErrors = [err102];
}
else {
vErrors.push(err102);
}
errors++;
}
}
if(data50.species !== undefined){
let data51 = data50.species;
if(typeof data51 === "string"){
if(func2(data51) < 1){
const err103 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/species",schemaPath:"#/properties/references/properties/known_deviations/items/properties/species/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.species,data:data51};
if(vErrors === null){
vErrors = [err103];
}
else {
vErrors.push(err103);
}
errors++;
}
}
else {
const err104 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/species",schemaPath:"#/properties/references/properties/known_deviations/items/properties/species/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.references.properties.known_deviations.items.properties.species.type,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.species,data:data51};
if(vErrors === null){
vErrors = [err104];
}
else {
vErrors.push(err104);
}
errors++;
}
}
if(data50.from !== undefined){
let data52 = data50.from;
if((typeof data52 == "number") && (isFinite(data52))){
if(data52 < 0 || isNaN(data52)){
const err105 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/from",schemaPath:"#/properties/references/properties/known_deviations/items/properties/from/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.from,data:data52};
if(vErrors === null){
vErrors = [err105];
}
else {
vErrors.push(err105);
}
errors++;
}
}
else {
const err106 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/from",schemaPath:"#/properties/references/properties/known_deviations/items/properties/from/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.references.properties.known_deviations.items.properties.from.type,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.from,data:data52};
if(vErrors === null){
vErrors = [err106];
}
else {
vErrors.push(err106);
}
errors++;
}
}
if(data50.to !== undefined){
let data53 = data50.to;
if((typeof data53 == "number") && (isFinite(data53))){
if(data53 <= 0 || isNaN(data53)){
const err107 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/to",schemaPath:"#/properties/references/properties/known_deviations/items/properties/to/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.to,data:data53};
if(vErrors === null){
vErrors = [err107];
}
else {
vErrors.push(err107);
}
errors++;
}
}
else {
const err108 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/to",schemaPath:"#/properties/references/properties/known_deviations/items/properties/to/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.references.properties.known_deviations.items.properties.to.type,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.to,data:data53};
if(vErrors === null){
vErrors = [err108];
}
else {
vErrors.push(err108);
}
errors++;
}
}
if(data50.tolerances !== undefined){
let data54 = data50.tolerances;
if(data54 && typeof data54 == "object" && !Array.isArray(data54)){
if(Object.keys(data54).length < 1){
const err109 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/minProperties",keyword:"minProperties",params:{limit: 1},message:"must NOT have fewer than 1 properties",schema:1,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances,data:data54};
if(vErrors === null){
vErrors = [err109];
}
else {
vErrors.push(err109);
}
errors++;
}
for(const key13 in data54){
if(!(((key13 === "cp") || (key13 === "s")) || (key13 === "h"))){
const err110 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key13},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances,data:data54};
if(vErrors === null){
vErrors = [err110];
}
else {
vErrors.push(err110);
}
errors++;
}
}
if(data54.cp !== undefined){
let data55 = data54.cp;
if((typeof data55 == "number") && (isFinite(data55))){
if(data55 <= 0 || isNaN(data55)){
const err111 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances/cp",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/properties/cp/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.cp,data:data55};
if(vErrors === null){
vErrors = [err111];
}
else {
vErrors.push(err111);
}
errors++;
}
}
else {
const err112 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances/cp",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.cp.type,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.cp,data:data55};
if(vErrors === null){
vErrors = [err112];
}
else {
vErrors.push(err112);
}
errors++;
}
}
if(data54.s !== undefined){
let data56 = data54.s;
if((typeof data56 == "number") && (isFinite(data56))){
if(data56 <= 0 || isNaN(data56)){
const err113 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances/s",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/properties/s/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.s,data:data56};
if(vErrors === null){
vErrors = [err113];
}
else {
vErrors.push(err113);
}
errors++;
}
}
else {
const err114 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances/s",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.s.type,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.s,data:data56};
if(vErrors === null){
vErrors = [err114];
}
else {
vErrors.push(err114);
}
errors++;
}
}
if(data54.h !== undefined){
let data57 = data54.h;
if((typeof data57 == "number") && (isFinite(data57))){
if(data57 <= 0 || isNaN(data57)){
const err115 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances/h",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/properties/h/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.h,data:data57};
if(vErrors === null){
vErrors = [err115];
}
else {
vErrors.push(err115);
}
errors++;
}
}
else {
const err116 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances/h",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.h.type,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.properties.h,data:data57};
if(vErrors === null){
vErrors = [err116];
}
else {
vErrors.push(err116);
}
errors++;
}
}
}
else {
const err117 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/tolerances",schemaPath:"#/properties/references/properties/known_deviations/items/properties/tolerances/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.references.properties.known_deviations.items.properties.tolerances.type,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.tolerances,data:data54};
if(vErrors === null){
vErrors = [err117];
}
else {
vErrors.push(err117);
}
errors++;
}
}
if(data50.reason !== undefined){
let data58 = data50.reason;
if(typeof data58 === "string"){
if(func2(data58) < 10){
const err118 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/reason",schemaPath:"#/properties/references/properties/known_deviations/items/properties/reason/minLength",keyword:"minLength",params:{limit: 10},message:"must NOT have fewer than 10 characters",schema:10,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.reason,data:data58};
if(vErrors === null){
vErrors = [err118];
}
else {
vErrors.push(err118);
}
errors++;
}
if(!pattern5.test(data58)){
const err119 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/reason",schemaPath:"#/properties/references/properties/known_deviations/items/properties/reason/pattern",keyword:"pattern",params:{pattern: "\\S"},message:"must match pattern \""+"\\S"+"\"",schema:"\\S",parentSchema:schema31.properties.references.properties.known_deviations.items.properties.reason,data:data58};
if(vErrors === null){
vErrors = [err119];
}
else {
vErrors.push(err119);
}
errors++;
}
}
else {
const err120 = {instancePath:instancePath+"/references/known_deviations/" + i2+"/reason",schemaPath:"#/properties/references/properties/known_deviations/items/properties/reason/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.references.properties.known_deviations.items.properties.reason.type,parentSchema:schema31.properties.references.properties.known_deviations.items.properties.reason,data:data58};
if(vErrors === null){
vErrors = [err120];
}
else {
vErrors.push(err120);
}
errors++;
}
}
}
else {
const err121 = {instancePath:instancePath+"/references/known_deviations/" + i2,schemaPath:"#/properties/references/properties/known_deviations/items/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.references.properties.known_deviations.items.type,parentSchema:schema31.properties.references.properties.known_deviations.items,data:data50};
if(vErrors === null){
vErrors = [err121];
}
else {
vErrors.push(err121);
}
errors++;
}
}
}
else {
const err122 = {instancePath:instancePath+"/references/known_deviations",schemaPath:"#/properties/references/properties/known_deviations/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.references.properties.known_deviations.type,parentSchema:schema31.properties.references.properties.known_deviations,data:data49};
if(vErrors === null){
vErrors = [err122];
}
else {
vErrors.push(err122);
}
errors++;
}
}
}
else {
const err123 = {instancePath:instancePath+"/references",schemaPath:"#/properties/references/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.references.type,parentSchema:schema31.properties.references,data:data42};
if(vErrors === null){
vErrors = [err123];
}
else {
vErrors.push(err123);
}
errors++;
}
}
if(data.strict !== undefined){
let data59 = data.strict;
if(typeof data59 !== "boolean"){
const err124 = {instancePath:instancePath+"/strict",schemaPath:"#/properties/strict/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema31.properties.strict.type,parentSchema:schema31.properties.strict,data:data59};
if(vErrors === null){
vErrors = [err124];
}
else {
vErrors.push(err124);
}
errors++;
}
}
if(data.accepted_warnings !== undefined){
let data60 = data.accepted_warnings;
if(Array.isArray(data60)){
const len3 = data60.length;
for(let i3=0; i3<len3; i3++){
let data61 = data60[i3];
if(data61 && typeof data61 == "object" && !Array.isArray(data61)){
if(data61.code === undefined){
const err125 = {instancePath:instancePath+"/accepted_warnings/" + i3,schemaPath:"#/properties/accepted_warnings/items/required",keyword:"required",params:{missingProperty: "code"},message:"must have required property '"+"code"+"'",schema:schema31.properties.accepted_warnings.items.required,parentSchema:schema31.properties.accepted_warnings.items,data:data61};
if(vErrors === null){
vErrors = [err125];
}
else {
vErrors.push(err125);
}
errors++;
}
if(data61.reason === undefined){
const err126 = {instancePath:instancePath+"/accepted_warnings/" + i3,schemaPath:"#/properties/accepted_warnings/items/required",keyword:"required",params:{missingProperty: "reason"},message:"must have required property '"+"reason"+"'",schema:schema31.properties.accepted_warnings.items.required,parentSchema:schema31.properties.accepted_warnings.items,data:data61};
if(vErrors === null){
vErrors = [err126];
}
else {
vErrors.push(err126);
}
errors++;
}
for(const key14 in data61){
if(!(((key14 === "code") || (key14 === "species")) || (key14 === "reason"))){
const err127 = {instancePath:instancePath+"/accepted_warnings/" + i3,schemaPath:"#/properties/accepted_warnings/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key14},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.accepted_warnings.items,data:data61};
if(vErrors === null){
vErrors = [err127];
}
else {
vErrors.push(err127);
}
errors++;
}
}
if(data61.code !== undefined){
let data62 = data61.code;
if(typeof data62 === "string"){
if(!pattern6.test(data62)){
const err128 = {instancePath:instancePath+"/accepted_warnings/" + i3+"/code",schemaPath:"#/properties/accepted_warnings/items/properties/code/pattern",keyword:"pattern",params:{pattern: "^[a-z0-9]+(-[a-z0-9]+)*$"},message:"must match pattern \""+"^[a-z0-9]+(-[a-z0-9]+)*$"+"\"",schema:"^[a-z0-9]+(-[a-z0-9]+)*$",parentSchema:schema31.properties.accepted_warnings.items.properties.code,data:data62};
if(vErrors === null){
vErrors = [err128];
}
else {
vErrors.push(err128);
}
errors++;
}
}
else {
const err129 = {instancePath:instancePath+"/accepted_warnings/" + i3+"/code",schemaPath:"#/properties/accepted_warnings/items/properties/code/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.accepted_warnings.items.properties.code.type,parentSchema:schema31.properties.accepted_warnings.items.properties.code,data:data62};
if(vErrors === null){
vErrors = [err129];
}
else {
vErrors.push(err129);
}
errors++;
}
}
if(data61.species !== undefined){
let data63 = data61.species;
if(typeof data63 === "string"){
if(func2(data63) < 1){
const err130 = {instancePath:instancePath+"/accepted_warnings/" + i3+"/species",schemaPath:"#/properties/accepted_warnings/items/properties/species/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema31.properties.accepted_warnings.items.properties.species,data:data63};
if(vErrors === null){
vErrors = [err130];
}
else {
vErrors.push(err130);
}
errors++;
}
}
else {
const err131 = {instancePath:instancePath+"/accepted_warnings/" + i3+"/species",schemaPath:"#/properties/accepted_warnings/items/properties/species/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.accepted_warnings.items.properties.species.type,parentSchema:schema31.properties.accepted_warnings.items.properties.species,data:data63};
if(vErrors === null){
vErrors = [err131];
}
else {
vErrors.push(err131);
}
errors++;
}
}
if(data61.reason !== undefined){
let data64 = data61.reason;
if(typeof data64 === "string"){
if(func2(data64) < 10){
const err132 = {instancePath:instancePath+"/accepted_warnings/" + i3+"/reason",schemaPath:"#/properties/accepted_warnings/items/properties/reason/minLength",keyword:"minLength",params:{limit: 10},message:"must NOT have fewer than 10 characters",schema:10,parentSchema:schema31.properties.accepted_warnings.items.properties.reason,data:data64};
if(vErrors === null){
vErrors = [err132];
}
else {
vErrors.push(err132);
}
errors++;
}
}
else {
const err133 = {instancePath:instancePath+"/accepted_warnings/" + i3+"/reason",schemaPath:"#/properties/accepted_warnings/items/properties/reason/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.accepted_warnings.items.properties.reason.type,parentSchema:schema31.properties.accepted_warnings.items.properties.reason,data:data64};
if(vErrors === null){
vErrors = [err133];
}
else {
vErrors.push(err133);
}
errors++;
}
}
}
else {
const err134 = {instancePath:instancePath+"/accepted_warnings/" + i3,schemaPath:"#/properties/accepted_warnings/items/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.accepted_warnings.items.type,parentSchema:schema31.properties.accepted_warnings.items,data:data61};
if(vErrors === null){
vErrors = [err134];
}
else {
vErrors.push(err134);
}
errors++;
}
}
}
else {
const err135 = {instancePath:instancePath+"/accepted_warnings",schemaPath:"#/properties/accepted_warnings/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.accepted_warnings.type,parentSchema:schema31.properties.accepted_warnings,data:data60};
if(vErrors === null){
vErrors = [err135];
}
else {
vErrors.push(err135);
}
errors++;
}
}
}
else {
const err136 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.type,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err136];
}
else {
vErrors.push(err136);
}
errors++;
}
validate20.errors = vErrors;
return errors === 0;
}
validate20.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

