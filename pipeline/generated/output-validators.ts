// @ts-nocheck
/* eslint-disable */
/**
 * GENERATED from schemas/database.schema.json, summary.schema.json and settings.schema.json (as
 * pipeline/core/output-schemas.ts derives them) by scripts/generate-validators.mjs (ajv standalone code). Do not edit by
 * hand: change the schema and run `npm run build && node scripts/generate-validators.mjs`. A test fails
 * when this file drifts.
 */
import { createRequire } from 'node:module';
const require = createRequire(import.meta.url);

export const validateDatabaseSpecies = validate8;
const schema2 = {"type":"object","additionalProperties":false,"required":["name","file","composition","charge","phase","molar_mass_g_per_mol","temperature_ranges","coefficients","at_298_15","fit_metrics","model","input_hash","sources"],"properties":{"name":{"type":"string","minLength":1,"maxLength":16},"file":{"type":"string","description":"Species file, relative to the database folder."},"composition":{"type":"object","additionalProperties":{"type":"integer","minimum":1},"minProperties":1},"charge":{"type":"integer"},"phase":{"const":"G"},"molar_mass_g_per_mol":{"type":"number","exclusiveMinimum":0},"temperature_ranges":{"type":"object","additionalProperties":false,"required":["low","mid","high"],"properties":{"low":{"type":"number"},"mid":{"type":"number"},"high":{"type":"number"}}},"coefficients":{"type":"object","additionalProperties":false,"required":["low","high"],"properties":{"low":{"$ref":"#/$defs/coefficients","description":"a1..a7 for [low, mid]"},"high":{"$ref":"#/$defs/coefficients","description":"a1..a7 for [mid, high]"}}},"at_298_15":{"type":"object","additionalProperties":false,"required":["enthalpy_of_formation_kj_per_mol","entropy_j_per_mol_k","heat_capacity_j_per_mol_k","h298_minus_h0_kj_per_mol"],"properties":{"enthalpy_of_formation_kj_per_mol":{"type":"number"},"entropy_j_per_mol_k":{"type":"number"},"heat_capacity_j_per_mol_k":{"type":"number"},"h298_minus_h0_kj_per_mol":{"type":"number"}}},"fit_metrics":{"type":"object","additionalProperties":false,"required":["low","high","continuity","anchor"],"description":"Errors of the fit against the computed points, dimensionless (Cp/R, H/RT, S/R).","properties":{"low":{"$ref":"#/$defs/rangeMetrics"},"high":{"$ref":"#/$defs/rangeMetrics"},"continuity":{"type":"object","additionalProperties":false,"required":["cp","dcp","d2cp","h","s"],"properties":{"cp":{"type":"number"},"dcp":{"type":"number"},"d2cp":{"type":"number"},"h":{"type":"number"},"s":{"type":"number"}}},"anchor":{"type":"object","additionalProperties":false,"required":["h","s"],"properties":{"h":{"type":"number"},"s":{"type":"number"}}}}},"model":{"type":"object","additionalProperties":false,"required":["structure","contributions","options","notes"],"properties":{"structure":{"enum":["atom","diatomic","linear","nonlinear"]},"contributions":{"type":"array","items":{"type":"string"}},"options":{"type":"object","additionalProperties":{"type":["string","number","boolean"]}},"notes":{"type":"array","items":{"type":"string"}}}},"input_hash":{"type":"string","pattern":"^sha256:[0-9a-f]{64}$"},"input":{"type":"object","description":"The species' normalised input (internal units: cm-1 for spectroscopic energies, J/mol for enthalpies, K, g/mol; keys sorted) that input_hash hashes. Keys are qforge's internal model field names (camelCase), not output keys. Recorded so that `qforge diff` can name the input fields that changed; absent in databases written before it was recorded."},"sources":{"type":"array","items":{"type":"string"},"minItems":1},"uncertainty":{"$ref":"#/$defs/uncertainty"}}};
const schema3 = {"type":"array","items":{"type":"number"},"minItems":7,"maxItems":7};
const func0 = Object.prototype.hasOwnProperty;
const func1 = require("ajv/dist/runtime/ucs2length").default;
const schema5 = {"type":"object","additionalProperties":false,"required":["points","max_abs","rms","t_at_max"],"properties":{"points":{"type":"integer","minimum":0},"max_abs":{"$ref":"#/$defs/triple"},"rms":{"$ref":"#/$defs/triple"},"t_at_max":{"$ref":"#/$defs/triple"}}};
const schema6 = {"type":"object","additionalProperties":false,"required":["cp","h","s"],"properties":{"cp":{"type":"number"},"h":{"type":"number"},"s":{"type":"number"}}};

function validate2(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate2.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.points === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "points"},message:"must have required property '"+"points"+"'"};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.max_abs === undefined){
const err1 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "max_abs"},message:"must have required property '"+"max_abs"+"'"};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(data.rms === undefined){
const err2 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "rms"},message:"must have required property '"+"rms"+"'"};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data.t_at_max === undefined){
const err3 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "t_at_max"},message:"must have required property '"+"t_at_max"+"'"};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
for(const key0 in data){
if(!((((key0 === "points") || (key0 === "max_abs")) || (key0 === "rms")) || (key0 === "t_at_max"))){
const err4 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
if(data.points !== undefined){
let data0 = data.points;
if(!((typeof data0 == "number") && (!(data0 % 1) && !isNaN(data0)))){
const err5 = {instancePath:instancePath+"/points",schemaPath:"#/properties/points/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if(typeof data0 == "number"){
if(data0 < 0 || isNaN(data0)){
const err6 = {instancePath:instancePath+"/points",schemaPath:"#/properties/points/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
}
if(data.max_abs !== undefined){
let data1 = data.max_abs;
if(data1 && typeof data1 == "object" && !Array.isArray(data1)){
if(data1.cp === undefined){
const err7 = {instancePath:instancePath+"/max_abs",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "cp"},message:"must have required property '"+"cp"+"'"};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
if(data1.h === undefined){
const err8 = {instancePath:instancePath+"/max_abs",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "h"},message:"must have required property '"+"h"+"'"};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
if(data1.s === undefined){
const err9 = {instancePath:instancePath+"/max_abs",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "s"},message:"must have required property '"+"s"+"'"};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
for(const key1 in data1){
if(!(((key1 === "cp") || (key1 === "h")) || (key1 === "s"))){
const err10 = {instancePath:instancePath+"/max_abs",schemaPath:"#/$defs/triple/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
if(data1.cp !== undefined){
if(!(typeof data1.cp == "number")){
const err11 = {instancePath:instancePath+"/max_abs/cp",schemaPath:"#/$defs/triple/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
}
if(data1.h !== undefined){
if(!(typeof data1.h == "number")){
const err12 = {instancePath:instancePath+"/max_abs/h",schemaPath:"#/$defs/triple/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
if(data1.s !== undefined){
if(!(typeof data1.s == "number")){
const err13 = {instancePath:instancePath+"/max_abs/s",schemaPath:"#/$defs/triple/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
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
const err14 = {instancePath:instancePath+"/max_abs",schemaPath:"#/$defs/triple/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
if(data.rms !== undefined){
let data5 = data.rms;
if(data5 && typeof data5 == "object" && !Array.isArray(data5)){
if(data5.cp === undefined){
const err15 = {instancePath:instancePath+"/rms",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "cp"},message:"must have required property '"+"cp"+"'"};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
if(data5.h === undefined){
const err16 = {instancePath:instancePath+"/rms",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "h"},message:"must have required property '"+"h"+"'"};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
if(data5.s === undefined){
const err17 = {instancePath:instancePath+"/rms",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "s"},message:"must have required property '"+"s"+"'"};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
for(const key2 in data5){
if(!(((key2 === "cp") || (key2 === "h")) || (key2 === "s"))){
const err18 = {instancePath:instancePath+"/rms",schemaPath:"#/$defs/triple/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
}
if(data5.cp !== undefined){
if(!(typeof data5.cp == "number")){
const err19 = {instancePath:instancePath+"/rms/cp",schemaPath:"#/$defs/triple/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data5.h !== undefined){
if(!(typeof data5.h == "number")){
const err20 = {instancePath:instancePath+"/rms/h",schemaPath:"#/$defs/triple/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
if(data5.s !== undefined){
if(!(typeof data5.s == "number")){
const err21 = {instancePath:instancePath+"/rms/s",schemaPath:"#/$defs/triple/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
}
else {
const err22 = {instancePath:instancePath+"/rms",schemaPath:"#/$defs/triple/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
if(data.t_at_max !== undefined){
let data9 = data.t_at_max;
if(data9 && typeof data9 == "object" && !Array.isArray(data9)){
if(data9.cp === undefined){
const err23 = {instancePath:instancePath+"/t_at_max",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "cp"},message:"must have required property '"+"cp"+"'"};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
if(data9.h === undefined){
const err24 = {instancePath:instancePath+"/t_at_max",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "h"},message:"must have required property '"+"h"+"'"};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
if(data9.s === undefined){
const err25 = {instancePath:instancePath+"/t_at_max",schemaPath:"#/$defs/triple/required",keyword:"required",params:{missingProperty: "s"},message:"must have required property '"+"s"+"'"};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
for(const key3 in data9){
if(!(((key3 === "cp") || (key3 === "h")) || (key3 === "s"))){
const err26 = {instancePath:instancePath+"/t_at_max",schemaPath:"#/$defs/triple/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
if(data9.cp !== undefined){
if(!(typeof data9.cp == "number")){
const err27 = {instancePath:instancePath+"/t_at_max/cp",schemaPath:"#/$defs/triple/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
}
if(data9.h !== undefined){
if(!(typeof data9.h == "number")){
const err28 = {instancePath:instancePath+"/t_at_max/h",schemaPath:"#/$defs/triple/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
}
if(data9.s !== undefined){
if(!(typeof data9.s == "number")){
const err29 = {instancePath:instancePath+"/t_at_max/s",schemaPath:"#/$defs/triple/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
}
}
else {
const err30 = {instancePath:instancePath+"/t_at_max",schemaPath:"#/$defs/triple/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
}
else {
const err31 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
validate2.errors = vErrors;
return errors === 0;
}
validate2.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

const schema9 = {"type":"object","description":"Standard uncertainties propagated linearly from the declared input uncertainties (independent inputs; the vibration scale factor moves all vibrations together). Model errors are not included. A species that declares none has declared = false and zeros.","additionalProperties":false,"required":["declared","method","inputs","points"],"properties":{"declared":{"type":"boolean","description":"Whether the species declares any input uncertainty."},"method":{"type":"string"},"inputs":{"type":"array","items":{"type":"object","additionalProperties":false,"required":["name","value","u","unit","sensitivity"],"properties":{"name":{"type":"string"},"value":{"type":"number"},"u":{"type":"number","exclusiveMinimum":0},"unit":{"type":"string"},"sensitivity":{"enum":["analytic","central-difference"]}}}},"points":{"type":"array","items":{"type":"object","additionalProperties":false,"required":["t_k","u_cp_j_per_mol_k","u_s_j_per_mol_k","u_h_minus_h298_kj_per_mol","u_h_kj_per_mol","largest"],"properties":{"t_k":{"type":"number"},"u_cp_j_per_mol_k":{"type":"number","minimum":0},"u_s_j_per_mol_k":{"type":"number","minimum":0},"u_h_minus_h298_kj_per_mol":{"type":"number","minimum":0},"u_h_kj_per_mol":{"type":"number","minimum":0},"largest":{"type":"object","additionalProperties":false,"required":["cp","s","h_minus_h298","h"],"properties":{"cp":{"$ref":"#/$defs/contributors"},"s":{"$ref":"#/$defs/contributors"},"h_minus_h298":{"$ref":"#/$defs/contributors"},"h":{"$ref":"#/$defs/contributors"}}}}}},"monte_carlo":{"type":"array","description":"Sampled check (build --uncertainty-samples N): sample standard deviations of the same quantities.","items":{"type":"object","additionalProperties":false,"required":["t_k","samples","seed","u_cp_j_per_mol_k","u_s_j_per_mol_k","u_h_minus_h298_kj_per_mol","u_h_kj_per_mol"],"properties":{"t_k":{"type":"number"},"samples":{"type":"integer","minimum":2},"seed":{"type":"integer"},"u_cp_j_per_mol_k":{"type":"number","minimum":0},"u_s_j_per_mol_k":{"type":"number","minimum":0},"u_h_minus_h298_kj_per_mol":{"type":"number","minimum":0},"u_h_kj_per_mol":{"type":"number","minimum":0}}}}}};
const schema10 = {"type":"array","description":"The largest contributions |sensitivity| x u, largest first (at most three), in the unit of the quantity.","items":{"type":"object","additionalProperties":false,"required":["input","contribution"],"properties":{"input":{"type":"string"},"contribution":{"type":"number","minimum":0}}}};

function validate5(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate5.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.declared === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "declared"},message:"must have required property '"+"declared"+"'"};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.method === undefined){
const err1 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "method"},message:"must have required property '"+"method"+"'"};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(data.inputs === undefined){
const err2 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "inputs"},message:"must have required property '"+"inputs"+"'"};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data.points === undefined){
const err3 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "points"},message:"must have required property '"+"points"+"'"};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
for(const key0 in data){
if(!(((((key0 === "declared") || (key0 === "method")) || (key0 === "inputs")) || (key0 === "points")) || (key0 === "monte_carlo"))){
const err4 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
if(data.declared !== undefined){
if(typeof data.declared !== "boolean"){
const err5 = {instancePath:instancePath+"/declared",schemaPath:"#/properties/declared/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
if(data.method !== undefined){
if(typeof data.method !== "string"){
const err6 = {instancePath:instancePath+"/method",schemaPath:"#/properties/method/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
if(data.inputs !== undefined){
let data2 = data.inputs;
if(Array.isArray(data2)){
const len0 = data2.length;
for(let i0=0; i0<len0; i0++){
let data3 = data2[i0];
if(data3 && typeof data3 == "object" && !Array.isArray(data3)){
if(data3.name === undefined){
const err7 = {instancePath:instancePath+"/inputs/" + i0,schemaPath:"#/properties/inputs/items/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'"};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
if(data3.value === undefined){
const err8 = {instancePath:instancePath+"/inputs/" + i0,schemaPath:"#/properties/inputs/items/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'"};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
if(data3.u === undefined){
const err9 = {instancePath:instancePath+"/inputs/" + i0,schemaPath:"#/properties/inputs/items/required",keyword:"required",params:{missingProperty: "u"},message:"must have required property '"+"u"+"'"};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
if(data3.unit === undefined){
const err10 = {instancePath:instancePath+"/inputs/" + i0,schemaPath:"#/properties/inputs/items/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'"};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
if(data3.sensitivity === undefined){
const err11 = {instancePath:instancePath+"/inputs/" + i0,schemaPath:"#/properties/inputs/items/required",keyword:"required",params:{missingProperty: "sensitivity"},message:"must have required property '"+"sensitivity"+"'"};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
for(const key1 in data3){
if(!(((((key1 === "name") || (key1 === "value")) || (key1 === "u")) || (key1 === "unit")) || (key1 === "sensitivity"))){
const err12 = {instancePath:instancePath+"/inputs/" + i0,schemaPath:"#/properties/inputs/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
if(data3.name !== undefined){
if(typeof data3.name !== "string"){
const err13 = {instancePath:instancePath+"/inputs/" + i0+"/name",schemaPath:"#/properties/inputs/items/properties/name/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
if(data3.value !== undefined){
if(!(typeof data3.value == "number")){
const err14 = {instancePath:instancePath+"/inputs/" + i0+"/value",schemaPath:"#/properties/inputs/items/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
if(data3.u !== undefined){
let data6 = data3.u;
if(typeof data6 == "number"){
if(data6 <= 0 || isNaN(data6)){
const err15 = {instancePath:instancePath+"/inputs/" + i0+"/u",schemaPath:"#/properties/inputs/items/properties/u/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
else {
const err16 = {instancePath:instancePath+"/inputs/" + i0+"/u",schemaPath:"#/properties/inputs/items/properties/u/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
}
if(data3.unit !== undefined){
if(typeof data3.unit !== "string"){
const err17 = {instancePath:instancePath+"/inputs/" + i0+"/unit",schemaPath:"#/properties/inputs/items/properties/unit/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
if(data3.sensitivity !== undefined){
let data8 = data3.sensitivity;
if(!((data8 === "analytic") || (data8 === "central-difference"))){
const err18 = {instancePath:instancePath+"/inputs/" + i0+"/sensitivity",schemaPath:"#/properties/inputs/items/properties/sensitivity/enum",keyword:"enum",params:{allowedValues: schema9.properties.inputs.items.properties.sensitivity.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
}
}
else {
const err19 = {instancePath:instancePath+"/inputs/" + i0,schemaPath:"#/properties/inputs/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
}
else {
const err20 = {instancePath:instancePath+"/inputs",schemaPath:"#/properties/inputs/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
if(data.points !== undefined){
let data9 = data.points;
if(Array.isArray(data9)){
const len1 = data9.length;
for(let i1=0; i1<len1; i1++){
let data10 = data9[i1];
if(data10 && typeof data10 == "object" && !Array.isArray(data10)){
if(data10.t_k === undefined){
const err21 = {instancePath:instancePath+"/points/" + i1,schemaPath:"#/properties/points/items/required",keyword:"required",params:{missingProperty: "t_k"},message:"must have required property '"+"t_k"+"'"};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
if(data10.u_cp_j_per_mol_k === undefined){
const err22 = {instancePath:instancePath+"/points/" + i1,schemaPath:"#/properties/points/items/required",keyword:"required",params:{missingProperty: "u_cp_j_per_mol_k"},message:"must have required property '"+"u_cp_j_per_mol_k"+"'"};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
if(data10.u_s_j_per_mol_k === undefined){
const err23 = {instancePath:instancePath+"/points/" + i1,schemaPath:"#/properties/points/items/required",keyword:"required",params:{missingProperty: "u_s_j_per_mol_k"},message:"must have required property '"+"u_s_j_per_mol_k"+"'"};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
if(data10.u_h_minus_h298_kj_per_mol === undefined){
const err24 = {instancePath:instancePath+"/points/" + i1,schemaPath:"#/properties/points/items/required",keyword:"required",params:{missingProperty: "u_h_minus_h298_kj_per_mol"},message:"must have required property '"+"u_h_minus_h298_kj_per_mol"+"'"};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
if(data10.u_h_kj_per_mol === undefined){
const err25 = {instancePath:instancePath+"/points/" + i1,schemaPath:"#/properties/points/items/required",keyword:"required",params:{missingProperty: "u_h_kj_per_mol"},message:"must have required property '"+"u_h_kj_per_mol"+"'"};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
if(data10.largest === undefined){
const err26 = {instancePath:instancePath+"/points/" + i1,schemaPath:"#/properties/points/items/required",keyword:"required",params:{missingProperty: "largest"},message:"must have required property '"+"largest"+"'"};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
for(const key2 in data10){
if(!((((((key2 === "t_k") || (key2 === "u_cp_j_per_mol_k")) || (key2 === "u_s_j_per_mol_k")) || (key2 === "u_h_minus_h298_kj_per_mol")) || (key2 === "u_h_kj_per_mol")) || (key2 === "largest"))){
const err27 = {instancePath:instancePath+"/points/" + i1,schemaPath:"#/properties/points/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
}
if(data10.t_k !== undefined){
if(!(typeof data10.t_k == "number")){
const err28 = {instancePath:instancePath+"/points/" + i1+"/t_k",schemaPath:"#/properties/points/items/properties/t_k/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
}
if(data10.u_cp_j_per_mol_k !== undefined){
let data12 = data10.u_cp_j_per_mol_k;
if(typeof data12 == "number"){
if(data12 < 0 || isNaN(data12)){
const err29 = {instancePath:instancePath+"/points/" + i1+"/u_cp_j_per_mol_k",schemaPath:"#/properties/points/items/properties/u_cp_j_per_mol_k/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
}
else {
const err30 = {instancePath:instancePath+"/points/" + i1+"/u_cp_j_per_mol_k",schemaPath:"#/properties/points/items/properties/u_cp_j_per_mol_k/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
if(data10.u_s_j_per_mol_k !== undefined){
let data13 = data10.u_s_j_per_mol_k;
if(typeof data13 == "number"){
if(data13 < 0 || isNaN(data13)){
const err31 = {instancePath:instancePath+"/points/" + i1+"/u_s_j_per_mol_k",schemaPath:"#/properties/points/items/properties/u_s_j_per_mol_k/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err32 = {instancePath:instancePath+"/points/" + i1+"/u_s_j_per_mol_k",schemaPath:"#/properties/points/items/properties/u_s_j_per_mol_k/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
}
if(data10.u_h_minus_h298_kj_per_mol !== undefined){
let data14 = data10.u_h_minus_h298_kj_per_mol;
if(typeof data14 == "number"){
if(data14 < 0 || isNaN(data14)){
const err33 = {instancePath:instancePath+"/points/" + i1+"/u_h_minus_h298_kj_per_mol",schemaPath:"#/properties/points/items/properties/u_h_minus_h298_kj_per_mol/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err34 = {instancePath:instancePath+"/points/" + i1+"/u_h_minus_h298_kj_per_mol",schemaPath:"#/properties/points/items/properties/u_h_minus_h298_kj_per_mol/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
}
if(data10.u_h_kj_per_mol !== undefined){
let data15 = data10.u_h_kj_per_mol;
if(typeof data15 == "number"){
if(data15 < 0 || isNaN(data15)){
const err35 = {instancePath:instancePath+"/points/" + i1+"/u_h_kj_per_mol",schemaPath:"#/properties/points/items/properties/u_h_kj_per_mol/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err36 = {instancePath:instancePath+"/points/" + i1+"/u_h_kj_per_mol",schemaPath:"#/properties/points/items/properties/u_h_kj_per_mol/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
if(data10.largest !== undefined){
let data16 = data10.largest;
if(data16 && typeof data16 == "object" && !Array.isArray(data16)){
if(data16.cp === undefined){
const err37 = {instancePath:instancePath+"/points/" + i1+"/largest",schemaPath:"#/properties/points/items/properties/largest/required",keyword:"required",params:{missingProperty: "cp"},message:"must have required property '"+"cp"+"'"};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
if(data16.s === undefined){
const err38 = {instancePath:instancePath+"/points/" + i1+"/largest",schemaPath:"#/properties/points/items/properties/largest/required",keyword:"required",params:{missingProperty: "s"},message:"must have required property '"+"s"+"'"};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
if(data16.h_minus_h298 === undefined){
const err39 = {instancePath:instancePath+"/points/" + i1+"/largest",schemaPath:"#/properties/points/items/properties/largest/required",keyword:"required",params:{missingProperty: "h_minus_h298"},message:"must have required property '"+"h_minus_h298"+"'"};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
if(data16.h === undefined){
const err40 = {instancePath:instancePath+"/points/" + i1+"/largest",schemaPath:"#/properties/points/items/properties/largest/required",keyword:"required",params:{missingProperty: "h"},message:"must have required property '"+"h"+"'"};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
for(const key3 in data16){
if(!((((key3 === "cp") || (key3 === "s")) || (key3 === "h_minus_h298")) || (key3 === "h"))){
const err41 = {instancePath:instancePath+"/points/" + i1+"/largest",schemaPath:"#/properties/points/items/properties/largest/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
}
if(data16.cp !== undefined){
let data17 = data16.cp;
if(Array.isArray(data17)){
const len2 = data17.length;
for(let i2=0; i2<len2; i2++){
let data18 = data17[i2];
if(data18 && typeof data18 == "object" && !Array.isArray(data18)){
if(data18.input === undefined){
const err42 = {instancePath:instancePath+"/points/" + i1+"/largest/cp/" + i2,schemaPath:"#/$defs/contributors/items/required",keyword:"required",params:{missingProperty: "input"},message:"must have required property '"+"input"+"'"};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
if(data18.contribution === undefined){
const err43 = {instancePath:instancePath+"/points/" + i1+"/largest/cp/" + i2,schemaPath:"#/$defs/contributors/items/required",keyword:"required",params:{missingProperty: "contribution"},message:"must have required property '"+"contribution"+"'"};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
for(const key4 in data18){
if(!((key4 === "input") || (key4 === "contribution"))){
const err44 = {instancePath:instancePath+"/points/" + i1+"/largest/cp/" + i2,schemaPath:"#/$defs/contributors/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
}
if(data18.input !== undefined){
if(typeof data18.input !== "string"){
const err45 = {instancePath:instancePath+"/points/" + i1+"/largest/cp/" + i2+"/input",schemaPath:"#/$defs/contributors/items/properties/input/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
}
if(data18.contribution !== undefined){
let data20 = data18.contribution;
if(typeof data20 == "number"){
if(data20 < 0 || isNaN(data20)){
const err46 = {instancePath:instancePath+"/points/" + i1+"/largest/cp/" + i2+"/contribution",schemaPath:"#/$defs/contributors/items/properties/contribution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
}
else {
const err47 = {instancePath:instancePath+"/points/" + i1+"/largest/cp/" + i2+"/contribution",schemaPath:"#/$defs/contributors/items/properties/contribution/type",keyword:"type",params:{type: "number"},message:"must be number"};
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
else {
const err48 = {instancePath:instancePath+"/points/" + i1+"/largest/cp/" + i2,schemaPath:"#/$defs/contributors/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
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
const err49 = {instancePath:instancePath+"/points/" + i1+"/largest/cp",schemaPath:"#/$defs/contributors/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
}
if(data16.s !== undefined){
let data21 = data16.s;
if(Array.isArray(data21)){
const len3 = data21.length;
for(let i3=0; i3<len3; i3++){
let data22 = data21[i3];
if(data22 && typeof data22 == "object" && !Array.isArray(data22)){
if(data22.input === undefined){
const err50 = {instancePath:instancePath+"/points/" + i1+"/largest/s/" + i3,schemaPath:"#/$defs/contributors/items/required",keyword:"required",params:{missingProperty: "input"},message:"must have required property '"+"input"+"'"};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
if(data22.contribution === undefined){
const err51 = {instancePath:instancePath+"/points/" + i1+"/largest/s/" + i3,schemaPath:"#/$defs/contributors/items/required",keyword:"required",params:{missingProperty: "contribution"},message:"must have required property '"+"contribution"+"'"};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
for(const key5 in data22){
if(!((key5 === "input") || (key5 === "contribution"))){
const err52 = {instancePath:instancePath+"/points/" + i1+"/largest/s/" + i3,schemaPath:"#/$defs/contributors/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key5},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
}
if(data22.input !== undefined){
if(typeof data22.input !== "string"){
const err53 = {instancePath:instancePath+"/points/" + i1+"/largest/s/" + i3+"/input",schemaPath:"#/$defs/contributors/items/properties/input/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
}
if(data22.contribution !== undefined){
let data24 = data22.contribution;
if(typeof data24 == "number"){
if(data24 < 0 || isNaN(data24)){
const err54 = {instancePath:instancePath+"/points/" + i1+"/largest/s/" + i3+"/contribution",schemaPath:"#/$defs/contributors/items/properties/contribution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
}
else {
const err55 = {instancePath:instancePath+"/points/" + i1+"/largest/s/" + i3+"/contribution",schemaPath:"#/$defs/contributors/items/properties/contribution/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err55];
}
else {
vErrors.push(err55);
}
errors++;
}
}
}
else {
const err56 = {instancePath:instancePath+"/points/" + i1+"/largest/s/" + i3,schemaPath:"#/$defs/contributors/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
}
}
else {
const err57 = {instancePath:instancePath+"/points/" + i1+"/largest/s",schemaPath:"#/$defs/contributors/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
}
if(data16.h_minus_h298 !== undefined){
let data25 = data16.h_minus_h298;
if(Array.isArray(data25)){
const len4 = data25.length;
for(let i4=0; i4<len4; i4++){
let data26 = data25[i4];
if(data26 && typeof data26 == "object" && !Array.isArray(data26)){
if(data26.input === undefined){
const err58 = {instancePath:instancePath+"/points/" + i1+"/largest/h_minus_h298/" + i4,schemaPath:"#/$defs/contributors/items/required",keyword:"required",params:{missingProperty: "input"},message:"must have required property '"+"input"+"'"};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
if(data26.contribution === undefined){
const err59 = {instancePath:instancePath+"/points/" + i1+"/largest/h_minus_h298/" + i4,schemaPath:"#/$defs/contributors/items/required",keyword:"required",params:{missingProperty: "contribution"},message:"must have required property '"+"contribution"+"'"};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
for(const key6 in data26){
if(!((key6 === "input") || (key6 === "contribution"))){
const err60 = {instancePath:instancePath+"/points/" + i1+"/largest/h_minus_h298/" + i4,schemaPath:"#/$defs/contributors/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key6},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err60];
}
else {
vErrors.push(err60);
}
errors++;
}
}
if(data26.input !== undefined){
if(typeof data26.input !== "string"){
const err61 = {instancePath:instancePath+"/points/" + i1+"/largest/h_minus_h298/" + i4+"/input",schemaPath:"#/$defs/contributors/items/properties/input/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
}
if(data26.contribution !== undefined){
let data28 = data26.contribution;
if(typeof data28 == "number"){
if(data28 < 0 || isNaN(data28)){
const err62 = {instancePath:instancePath+"/points/" + i1+"/largest/h_minus_h298/" + i4+"/contribution",schemaPath:"#/$defs/contributors/items/properties/contribution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err63 = {instancePath:instancePath+"/points/" + i1+"/largest/h_minus_h298/" + i4+"/contribution",schemaPath:"#/$defs/contributors/items/properties/contribution/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
}
}
else {
const err64 = {instancePath:instancePath+"/points/" + i1+"/largest/h_minus_h298/" + i4,schemaPath:"#/$defs/contributors/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
}
}
else {
const err65 = {instancePath:instancePath+"/points/" + i1+"/largest/h_minus_h298",schemaPath:"#/$defs/contributors/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
}
if(data16.h !== undefined){
let data29 = data16.h;
if(Array.isArray(data29)){
const len5 = data29.length;
for(let i5=0; i5<len5; i5++){
let data30 = data29[i5];
if(data30 && typeof data30 == "object" && !Array.isArray(data30)){
if(data30.input === undefined){
const err66 = {instancePath:instancePath+"/points/" + i1+"/largest/h/" + i5,schemaPath:"#/$defs/contributors/items/required",keyword:"required",params:{missingProperty: "input"},message:"must have required property '"+"input"+"'"};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
if(data30.contribution === undefined){
const err67 = {instancePath:instancePath+"/points/" + i1+"/largest/h/" + i5,schemaPath:"#/$defs/contributors/items/required",keyword:"required",params:{missingProperty: "contribution"},message:"must have required property '"+"contribution"+"'"};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
for(const key7 in data30){
if(!((key7 === "input") || (key7 === "contribution"))){
const err68 = {instancePath:instancePath+"/points/" + i1+"/largest/h/" + i5,schemaPath:"#/$defs/contributors/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key7},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
}
if(data30.input !== undefined){
if(typeof data30.input !== "string"){
const err69 = {instancePath:instancePath+"/points/" + i1+"/largest/h/" + i5+"/input",schemaPath:"#/$defs/contributors/items/properties/input/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
}
if(data30.contribution !== undefined){
let data32 = data30.contribution;
if(typeof data32 == "number"){
if(data32 < 0 || isNaN(data32)){
const err70 = {instancePath:instancePath+"/points/" + i1+"/largest/h/" + i5+"/contribution",schemaPath:"#/$defs/contributors/items/properties/contribution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
}
else {
const err71 = {instancePath:instancePath+"/points/" + i1+"/largest/h/" + i5+"/contribution",schemaPath:"#/$defs/contributors/items/properties/contribution/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
}
}
else {
const err72 = {instancePath:instancePath+"/points/" + i1+"/largest/h/" + i5,schemaPath:"#/$defs/contributors/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
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
const err73 = {instancePath:instancePath+"/points/" + i1+"/largest/h",schemaPath:"#/$defs/contributors/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
}
}
else {
const err74 = {instancePath:instancePath+"/points/" + i1+"/largest",schemaPath:"#/properties/points/items/properties/largest/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
}
}
else {
const err75 = {instancePath:instancePath+"/points/" + i1,schemaPath:"#/properties/points/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
}
}
else {
const err76 = {instancePath:instancePath+"/points",schemaPath:"#/properties/points/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
}
if(data.monte_carlo !== undefined){
let data33 = data.monte_carlo;
if(Array.isArray(data33)){
const len6 = data33.length;
for(let i6=0; i6<len6; i6++){
let data34 = data33[i6];
if(data34 && typeof data34 == "object" && !Array.isArray(data34)){
if(data34.t_k === undefined){
const err77 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/required",keyword:"required",params:{missingProperty: "t_k"},message:"must have required property '"+"t_k"+"'"};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
if(data34.samples === undefined){
const err78 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/required",keyword:"required",params:{missingProperty: "samples"},message:"must have required property '"+"samples"+"'"};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
if(data34.seed === undefined){
const err79 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/required",keyword:"required",params:{missingProperty: "seed"},message:"must have required property '"+"seed"+"'"};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
if(data34.u_cp_j_per_mol_k === undefined){
const err80 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/required",keyword:"required",params:{missingProperty: "u_cp_j_per_mol_k"},message:"must have required property '"+"u_cp_j_per_mol_k"+"'"};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
if(data34.u_s_j_per_mol_k === undefined){
const err81 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/required",keyword:"required",params:{missingProperty: "u_s_j_per_mol_k"},message:"must have required property '"+"u_s_j_per_mol_k"+"'"};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
if(data34.u_h_minus_h298_kj_per_mol === undefined){
const err82 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/required",keyword:"required",params:{missingProperty: "u_h_minus_h298_kj_per_mol"},message:"must have required property '"+"u_h_minus_h298_kj_per_mol"+"'"};
if(vErrors === null){
vErrors = [err82];
}
else {
vErrors.push(err82);
}
errors++;
}
if(data34.u_h_kj_per_mol === undefined){
const err83 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/required",keyword:"required",params:{missingProperty: "u_h_kj_per_mol"},message:"must have required property '"+"u_h_kj_per_mol"+"'"};
if(vErrors === null){
vErrors = [err83];
}
else {
vErrors.push(err83);
}
errors++;
}
for(const key8 in data34){
if(!(((((((key8 === "t_k") || (key8 === "samples")) || (key8 === "seed")) || (key8 === "u_cp_j_per_mol_k")) || (key8 === "u_s_j_per_mol_k")) || (key8 === "u_h_minus_h298_kj_per_mol")) || (key8 === "u_h_kj_per_mol"))){
const err84 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key8},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err84];
}
else {
vErrors.push(err84);
}
errors++;
}
}
if(data34.t_k !== undefined){
if(!(typeof data34.t_k == "number")){
const err85 = {instancePath:instancePath+"/monte_carlo/" + i6+"/t_k",schemaPath:"#/properties/monte_carlo/items/properties/t_k/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err85];
}
else {
vErrors.push(err85);
}
errors++;
}
}
if(data34.samples !== undefined){
let data36 = data34.samples;
if(!((typeof data36 == "number") && (!(data36 % 1) && !isNaN(data36)))){
const err86 = {instancePath:instancePath+"/monte_carlo/" + i6+"/samples",schemaPath:"#/properties/monte_carlo/items/properties/samples/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err86];
}
else {
vErrors.push(err86);
}
errors++;
}
if(typeof data36 == "number"){
if(data36 < 2 || isNaN(data36)){
const err87 = {instancePath:instancePath+"/monte_carlo/" + i6+"/samples",schemaPath:"#/properties/monte_carlo/items/properties/samples/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2"};
if(vErrors === null){
vErrors = [err87];
}
else {
vErrors.push(err87);
}
errors++;
}
}
}
if(data34.seed !== undefined){
let data37 = data34.seed;
if(!((typeof data37 == "number") && (!(data37 % 1) && !isNaN(data37)))){
const err88 = {instancePath:instancePath+"/monte_carlo/" + i6+"/seed",schemaPath:"#/properties/monte_carlo/items/properties/seed/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err88];
}
else {
vErrors.push(err88);
}
errors++;
}
}
if(data34.u_cp_j_per_mol_k !== undefined){
let data38 = data34.u_cp_j_per_mol_k;
if(typeof data38 == "number"){
if(data38 < 0 || isNaN(data38)){
const err89 = {instancePath:instancePath+"/monte_carlo/" + i6+"/u_cp_j_per_mol_k",schemaPath:"#/properties/monte_carlo/items/properties/u_cp_j_per_mol_k/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err89];
}
else {
vErrors.push(err89);
}
errors++;
}
}
else {
const err90 = {instancePath:instancePath+"/monte_carlo/" + i6+"/u_cp_j_per_mol_k",schemaPath:"#/properties/monte_carlo/items/properties/u_cp_j_per_mol_k/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err90];
}
else {
vErrors.push(err90);
}
errors++;
}
}
if(data34.u_s_j_per_mol_k !== undefined){
let data39 = data34.u_s_j_per_mol_k;
if(typeof data39 == "number"){
if(data39 < 0 || isNaN(data39)){
const err91 = {instancePath:instancePath+"/monte_carlo/" + i6+"/u_s_j_per_mol_k",schemaPath:"#/properties/monte_carlo/items/properties/u_s_j_per_mol_k/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err92 = {instancePath:instancePath+"/monte_carlo/" + i6+"/u_s_j_per_mol_k",schemaPath:"#/properties/monte_carlo/items/properties/u_s_j_per_mol_k/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err92];
}
else {
vErrors.push(err92);
}
errors++;
}
}
if(data34.u_h_minus_h298_kj_per_mol !== undefined){
let data40 = data34.u_h_minus_h298_kj_per_mol;
if(typeof data40 == "number"){
if(data40 < 0 || isNaN(data40)){
const err93 = {instancePath:instancePath+"/monte_carlo/" + i6+"/u_h_minus_h298_kj_per_mol",schemaPath:"#/properties/monte_carlo/items/properties/u_h_minus_h298_kj_per_mol/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err94 = {instancePath:instancePath+"/monte_carlo/" + i6+"/u_h_minus_h298_kj_per_mol",schemaPath:"#/properties/monte_carlo/items/properties/u_h_minus_h298_kj_per_mol/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err94];
}
else {
vErrors.push(err94);
}
errors++;
}
}
if(data34.u_h_kj_per_mol !== undefined){
let data41 = data34.u_h_kj_per_mol;
if(typeof data41 == "number"){
if(data41 < 0 || isNaN(data41)){
const err95 = {instancePath:instancePath+"/monte_carlo/" + i6+"/u_h_kj_per_mol",schemaPath:"#/properties/monte_carlo/items/properties/u_h_kj_per_mol/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err96 = {instancePath:instancePath+"/monte_carlo/" + i6+"/u_h_kj_per_mol",schemaPath:"#/properties/monte_carlo/items/properties/u_h_kj_per_mol/type",keyword:"type",params:{type: "number"},message:"must be number"};
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
const err97 = {instancePath:instancePath+"/monte_carlo/" + i6,schemaPath:"#/properties/monte_carlo/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err97];
}
else {
vErrors.push(err97);
}
errors++;
}
}
}
else {
const err98 = {instancePath:instancePath+"/monte_carlo",schemaPath:"#/properties/monte_carlo/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err98];
}
else {
vErrors.push(err98);
}
errors++;
}
}
}
else {
const err99 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err99];
}
else {
vErrors.push(err99);
}
errors++;
}
validate5.errors = vErrors;
return errors === 0;
}
validate5.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

const pattern3 = new RegExp("^sha256:[0-9a-f]{64}$", "u");

function validate8(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate8.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.name === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'"};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.file === undefined){
const err1 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "file"},message:"must have required property '"+"file"+"'"};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(data.composition === undefined){
const err2 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "composition"},message:"must have required property '"+"composition"+"'"};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data.charge === undefined){
const err3 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "charge"},message:"must have required property '"+"charge"+"'"};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if(data.phase === undefined){
const err4 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "phase"},message:"must have required property '"+"phase"+"'"};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if(data.molar_mass_g_per_mol === undefined){
const err5 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "molar_mass_g_per_mol"},message:"must have required property '"+"molar_mass_g_per_mol"+"'"};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if(data.temperature_ranges === undefined){
const err6 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "temperature_ranges"},message:"must have required property '"+"temperature_ranges"+"'"};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
if(data.coefficients === undefined){
const err7 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "coefficients"},message:"must have required property '"+"coefficients"+"'"};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
if(data.at_298_15 === undefined){
const err8 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "at_298_15"},message:"must have required property '"+"at_298_15"+"'"};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
if(data.fit_metrics === undefined){
const err9 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "fit_metrics"},message:"must have required property '"+"fit_metrics"+"'"};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
if(data.model === undefined){
const err10 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "model"},message:"must have required property '"+"model"+"'"};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
if(data.input_hash === undefined){
const err11 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "input_hash"},message:"must have required property '"+"input_hash"+"'"};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
if(data.sources === undefined){
const err12 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "sources"},message:"must have required property '"+"sources"+"'"};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
for(const key0 in data){
if(!(func0.call(schema2.properties, key0))){
const err13 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
if(data.name !== undefined){
let data0 = data.name;
if(typeof data0 === "string"){
if(func1(data0) > 16){
const err14 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/maxLength",keyword:"maxLength",params:{limit: 16},message:"must NOT have more than 16 characters"};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
if(func1(data0) < 1){
const err15 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters"};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
else {
const err16 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
}
if(data.file !== undefined){
if(typeof data.file !== "string"){
const err17 = {instancePath:instancePath+"/file",schemaPath:"#/properties/file/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
if(data.composition !== undefined){
let data2 = data.composition;
if(data2 && typeof data2 == "object" && !Array.isArray(data2)){
if(Object.keys(data2).length < 1){
const err18 = {instancePath:instancePath+"/composition",schemaPath:"#/properties/composition/minProperties",keyword:"minProperties",params:{limit: 1},message:"must NOT have fewer than 1 properties"};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
for(const key1 in data2){
let data3 = data2[key1];
if(!((typeof data3 == "number") && (!(data3 % 1) && !isNaN(data3)))){
const err19 = {instancePath:instancePath+"/composition/" + key1.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/properties/composition/additionalProperties/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
if(typeof data3 == "number"){
if(data3 < 1 || isNaN(data3)){
const err20 = {instancePath:instancePath+"/composition/" + key1.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/properties/composition/additionalProperties/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1"};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
}
}
else {
const err21 = {instancePath:instancePath+"/composition",schemaPath:"#/properties/composition/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
if(data.charge !== undefined){
let data4 = data.charge;
if(!((typeof data4 == "number") && (!(data4 % 1) && !isNaN(data4)))){
const err22 = {instancePath:instancePath+"/charge",schemaPath:"#/properties/charge/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
if(data.phase !== undefined){
if("G" !== data.phase){
const err23 = {instancePath:instancePath+"/phase",schemaPath:"#/properties/phase/const",keyword:"const",params:{allowedValue: "G"},message:"must be equal to constant"};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
if(data.molar_mass_g_per_mol !== undefined){
let data6 = data.molar_mass_g_per_mol;
if(typeof data6 == "number"){
if(data6 <= 0 || isNaN(data6)){
const err24 = {instancePath:instancePath+"/molar_mass_g_per_mol",schemaPath:"#/properties/molar_mass_g_per_mol/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
}
else {
const err25 = {instancePath:instancePath+"/molar_mass_g_per_mol",schemaPath:"#/properties/molar_mass_g_per_mol/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
}
if(data.temperature_ranges !== undefined){
let data7 = data.temperature_ranges;
if(data7 && typeof data7 == "object" && !Array.isArray(data7)){
if(data7.low === undefined){
const err26 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/required",keyword:"required",params:{missingProperty: "low"},message:"must have required property '"+"low"+"'"};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
if(data7.mid === undefined){
const err27 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/required",keyword:"required",params:{missingProperty: "mid"},message:"must have required property '"+"mid"+"'"};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
if(data7.high === undefined){
const err28 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/required",keyword:"required",params:{missingProperty: "high"},message:"must have required property '"+"high"+"'"};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
for(const key2 in data7){
if(!(((key2 === "low") || (key2 === "mid")) || (key2 === "high"))){
const err29 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
}
if(data7.low !== undefined){
if(!(typeof data7.low == "number")){
const err30 = {instancePath:instancePath+"/temperature_ranges/low",schemaPath:"#/properties/temperature_ranges/properties/low/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
if(data7.mid !== undefined){
if(!(typeof data7.mid == "number")){
const err31 = {instancePath:instancePath+"/temperature_ranges/mid",schemaPath:"#/properties/temperature_ranges/properties/mid/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
}
if(data7.high !== undefined){
if(!(typeof data7.high == "number")){
const err32 = {instancePath:instancePath+"/temperature_ranges/high",schemaPath:"#/properties/temperature_ranges/properties/high/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
}
}
else {
const err33 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
}
if(data.coefficients !== undefined){
let data11 = data.coefficients;
if(data11 && typeof data11 == "object" && !Array.isArray(data11)){
if(data11.low === undefined){
const err34 = {instancePath:instancePath+"/coefficients",schemaPath:"#/properties/coefficients/required",keyword:"required",params:{missingProperty: "low"},message:"must have required property '"+"low"+"'"};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
if(data11.high === undefined){
const err35 = {instancePath:instancePath+"/coefficients",schemaPath:"#/properties/coefficients/required",keyword:"required",params:{missingProperty: "high"},message:"must have required property '"+"high"+"'"};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
for(const key3 in data11){
if(!((key3 === "low") || (key3 === "high"))){
const err36 = {instancePath:instancePath+"/coefficients",schemaPath:"#/properties/coefficients/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
if(data11.low !== undefined){
let data12 = data11.low;
if(Array.isArray(data12)){
if(data12.length > 7){
const err37 = {instancePath:instancePath+"/coefficients/low",schemaPath:"#/$defs/coefficients/maxItems",keyword:"maxItems",params:{limit: 7},message:"must NOT have more than 7 items"};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
if(data12.length < 7){
const err38 = {instancePath:instancePath+"/coefficients/low",schemaPath:"#/$defs/coefficients/minItems",keyword:"minItems",params:{limit: 7},message:"must NOT have fewer than 7 items"};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
const len0 = data12.length;
for(let i0=0; i0<len0; i0++){
if(!(typeof data12[i0] == "number")){
const err39 = {instancePath:instancePath+"/coefficients/low/" + i0,schemaPath:"#/$defs/coefficients/items/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
}
}
else {
const err40 = {instancePath:instancePath+"/coefficients/low",schemaPath:"#/$defs/coefficients/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
}
if(data11.high !== undefined){
let data14 = data11.high;
if(Array.isArray(data14)){
if(data14.length > 7){
const err41 = {instancePath:instancePath+"/coefficients/high",schemaPath:"#/$defs/coefficients/maxItems",keyword:"maxItems",params:{limit: 7},message:"must NOT have more than 7 items"};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
if(data14.length < 7){
const err42 = {instancePath:instancePath+"/coefficients/high",schemaPath:"#/$defs/coefficients/minItems",keyword:"minItems",params:{limit: 7},message:"must NOT have fewer than 7 items"};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
const len1 = data14.length;
for(let i1=0; i1<len1; i1++){
if(!(typeof data14[i1] == "number")){
const err43 = {instancePath:instancePath+"/coefficients/high/" + i1,schemaPath:"#/$defs/coefficients/items/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
}
}
else {
const err44 = {instancePath:instancePath+"/coefficients/high",schemaPath:"#/$defs/coefficients/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
}
}
else {
const err45 = {instancePath:instancePath+"/coefficients",schemaPath:"#/properties/coefficients/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
}
if(data.at_298_15 !== undefined){
let data16 = data.at_298_15;
if(data16 && typeof data16 == "object" && !Array.isArray(data16)){
if(data16.enthalpy_of_formation_kj_per_mol === undefined){
const err46 = {instancePath:instancePath+"/at_298_15",schemaPath:"#/properties/at_298_15/required",keyword:"required",params:{missingProperty: "enthalpy_of_formation_kj_per_mol"},message:"must have required property '"+"enthalpy_of_formation_kj_per_mol"+"'"};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
if(data16.entropy_j_per_mol_k === undefined){
const err47 = {instancePath:instancePath+"/at_298_15",schemaPath:"#/properties/at_298_15/required",keyword:"required",params:{missingProperty: "entropy_j_per_mol_k"},message:"must have required property '"+"entropy_j_per_mol_k"+"'"};
if(vErrors === null){
vErrors = [err47];
}
else {
vErrors.push(err47);
}
errors++;
}
if(data16.heat_capacity_j_per_mol_k === undefined){
const err48 = {instancePath:instancePath+"/at_298_15",schemaPath:"#/properties/at_298_15/required",keyword:"required",params:{missingProperty: "heat_capacity_j_per_mol_k"},message:"must have required property '"+"heat_capacity_j_per_mol_k"+"'"};
if(vErrors === null){
vErrors = [err48];
}
else {
vErrors.push(err48);
}
errors++;
}
if(data16.h298_minus_h0_kj_per_mol === undefined){
const err49 = {instancePath:instancePath+"/at_298_15",schemaPath:"#/properties/at_298_15/required",keyword:"required",params:{missingProperty: "h298_minus_h0_kj_per_mol"},message:"must have required property '"+"h298_minus_h0_kj_per_mol"+"'"};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
for(const key4 in data16){
if(!((((key4 === "enthalpy_of_formation_kj_per_mol") || (key4 === "entropy_j_per_mol_k")) || (key4 === "heat_capacity_j_per_mol_k")) || (key4 === "h298_minus_h0_kj_per_mol"))){
const err50 = {instancePath:instancePath+"/at_298_15",schemaPath:"#/properties/at_298_15/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
}
if(data16.enthalpy_of_formation_kj_per_mol !== undefined){
if(!(typeof data16.enthalpy_of_formation_kj_per_mol == "number")){
const err51 = {instancePath:instancePath+"/at_298_15/enthalpy_of_formation_kj_per_mol",schemaPath:"#/properties/at_298_15/properties/enthalpy_of_formation_kj_per_mol/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
}
if(data16.entropy_j_per_mol_k !== undefined){
if(!(typeof data16.entropy_j_per_mol_k == "number")){
const err52 = {instancePath:instancePath+"/at_298_15/entropy_j_per_mol_k",schemaPath:"#/properties/at_298_15/properties/entropy_j_per_mol_k/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
}
if(data16.heat_capacity_j_per_mol_k !== undefined){
if(!(typeof data16.heat_capacity_j_per_mol_k == "number")){
const err53 = {instancePath:instancePath+"/at_298_15/heat_capacity_j_per_mol_k",schemaPath:"#/properties/at_298_15/properties/heat_capacity_j_per_mol_k/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
}
if(data16.h298_minus_h0_kj_per_mol !== undefined){
if(!(typeof data16.h298_minus_h0_kj_per_mol == "number")){
const err54 = {instancePath:instancePath+"/at_298_15/h298_minus_h0_kj_per_mol",schemaPath:"#/properties/at_298_15/properties/h298_minus_h0_kj_per_mol/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
}
}
else {
const err55 = {instancePath:instancePath+"/at_298_15",schemaPath:"#/properties/at_298_15/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err55];
}
else {
vErrors.push(err55);
}
errors++;
}
}
if(data.fit_metrics !== undefined){
let data21 = data.fit_metrics;
if(data21 && typeof data21 == "object" && !Array.isArray(data21)){
if(data21.low === undefined){
const err56 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/required",keyword:"required",params:{missingProperty: "low"},message:"must have required property '"+"low"+"'"};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
if(data21.high === undefined){
const err57 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/required",keyword:"required",params:{missingProperty: "high"},message:"must have required property '"+"high"+"'"};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
if(data21.continuity === undefined){
const err58 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/required",keyword:"required",params:{missingProperty: "continuity"},message:"must have required property '"+"continuity"+"'"};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
if(data21.anchor === undefined){
const err59 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/required",keyword:"required",params:{missingProperty: "anchor"},message:"must have required property '"+"anchor"+"'"};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
for(const key5 in data21){
if(!((((key5 === "low") || (key5 === "high")) || (key5 === "continuity")) || (key5 === "anchor"))){
const err60 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key5},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err60];
}
else {
vErrors.push(err60);
}
errors++;
}
}
if(data21.low !== undefined){
if(!(validate2(data21.low, {instancePath:instancePath+"/fit_metrics/low",parentData:data21,parentDataProperty:"low",rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate2.errors : vErrors.concat(validate2.errors);
errors = vErrors.length;
}
}
if(data21.high !== undefined){
if(!(validate2(data21.high, {instancePath:instancePath+"/fit_metrics/high",parentData:data21,parentDataProperty:"high",rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate2.errors : vErrors.concat(validate2.errors);
errors = vErrors.length;
}
}
if(data21.continuity !== undefined){
let data24 = data21.continuity;
if(data24 && typeof data24 == "object" && !Array.isArray(data24)){
if(data24.cp === undefined){
const err61 = {instancePath:instancePath+"/fit_metrics/continuity",schemaPath:"#/properties/fit_metrics/properties/continuity/required",keyword:"required",params:{missingProperty: "cp"},message:"must have required property '"+"cp"+"'"};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
if(data24.dcp === undefined){
const err62 = {instancePath:instancePath+"/fit_metrics/continuity",schemaPath:"#/properties/fit_metrics/properties/continuity/required",keyword:"required",params:{missingProperty: "dcp"},message:"must have required property '"+"dcp"+"'"};
if(vErrors === null){
vErrors = [err62];
}
else {
vErrors.push(err62);
}
errors++;
}
if(data24.d2cp === undefined){
const err63 = {instancePath:instancePath+"/fit_metrics/continuity",schemaPath:"#/properties/fit_metrics/properties/continuity/required",keyword:"required",params:{missingProperty: "d2cp"},message:"must have required property '"+"d2cp"+"'"};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
if(data24.h === undefined){
const err64 = {instancePath:instancePath+"/fit_metrics/continuity",schemaPath:"#/properties/fit_metrics/properties/continuity/required",keyword:"required",params:{missingProperty: "h"},message:"must have required property '"+"h"+"'"};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
if(data24.s === undefined){
const err65 = {instancePath:instancePath+"/fit_metrics/continuity",schemaPath:"#/properties/fit_metrics/properties/continuity/required",keyword:"required",params:{missingProperty: "s"},message:"must have required property '"+"s"+"'"};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
for(const key6 in data24){
if(!(((((key6 === "cp") || (key6 === "dcp")) || (key6 === "d2cp")) || (key6 === "h")) || (key6 === "s"))){
const err66 = {instancePath:instancePath+"/fit_metrics/continuity",schemaPath:"#/properties/fit_metrics/properties/continuity/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key6},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
}
if(data24.cp !== undefined){
if(!(typeof data24.cp == "number")){
const err67 = {instancePath:instancePath+"/fit_metrics/continuity/cp",schemaPath:"#/properties/fit_metrics/properties/continuity/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
}
if(data24.dcp !== undefined){
if(!(typeof data24.dcp == "number")){
const err68 = {instancePath:instancePath+"/fit_metrics/continuity/dcp",schemaPath:"#/properties/fit_metrics/properties/continuity/properties/dcp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
}
if(data24.d2cp !== undefined){
if(!(typeof data24.d2cp == "number")){
const err69 = {instancePath:instancePath+"/fit_metrics/continuity/d2cp",schemaPath:"#/properties/fit_metrics/properties/continuity/properties/d2cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
}
if(data24.h !== undefined){
if(!(typeof data24.h == "number")){
const err70 = {instancePath:instancePath+"/fit_metrics/continuity/h",schemaPath:"#/properties/fit_metrics/properties/continuity/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
}
if(data24.s !== undefined){
if(!(typeof data24.s == "number")){
const err71 = {instancePath:instancePath+"/fit_metrics/continuity/s",schemaPath:"#/properties/fit_metrics/properties/continuity/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
}
}
else {
const err72 = {instancePath:instancePath+"/fit_metrics/continuity",schemaPath:"#/properties/fit_metrics/properties/continuity/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err72];
}
else {
vErrors.push(err72);
}
errors++;
}
}
if(data21.anchor !== undefined){
let data30 = data21.anchor;
if(data30 && typeof data30 == "object" && !Array.isArray(data30)){
if(data30.h === undefined){
const err73 = {instancePath:instancePath+"/fit_metrics/anchor",schemaPath:"#/properties/fit_metrics/properties/anchor/required",keyword:"required",params:{missingProperty: "h"},message:"must have required property '"+"h"+"'"};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
if(data30.s === undefined){
const err74 = {instancePath:instancePath+"/fit_metrics/anchor",schemaPath:"#/properties/fit_metrics/properties/anchor/required",keyword:"required",params:{missingProperty: "s"},message:"must have required property '"+"s"+"'"};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
for(const key7 in data30){
if(!((key7 === "h") || (key7 === "s"))){
const err75 = {instancePath:instancePath+"/fit_metrics/anchor",schemaPath:"#/properties/fit_metrics/properties/anchor/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key7},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
}
if(data30.h !== undefined){
if(!(typeof data30.h == "number")){
const err76 = {instancePath:instancePath+"/fit_metrics/anchor/h",schemaPath:"#/properties/fit_metrics/properties/anchor/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
}
if(data30.s !== undefined){
if(!(typeof data30.s == "number")){
const err77 = {instancePath:instancePath+"/fit_metrics/anchor/s",schemaPath:"#/properties/fit_metrics/properties/anchor/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
}
}
else {
const err78 = {instancePath:instancePath+"/fit_metrics/anchor",schemaPath:"#/properties/fit_metrics/properties/anchor/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
}
}
else {
const err79 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
}
if(data.model !== undefined){
let data33 = data.model;
if(data33 && typeof data33 == "object" && !Array.isArray(data33)){
if(data33.structure === undefined){
const err80 = {instancePath:instancePath+"/model",schemaPath:"#/properties/model/required",keyword:"required",params:{missingProperty: "structure"},message:"must have required property '"+"structure"+"'"};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
if(data33.contributions === undefined){
const err81 = {instancePath:instancePath+"/model",schemaPath:"#/properties/model/required",keyword:"required",params:{missingProperty: "contributions"},message:"must have required property '"+"contributions"+"'"};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
if(data33.options === undefined){
const err82 = {instancePath:instancePath+"/model",schemaPath:"#/properties/model/required",keyword:"required",params:{missingProperty: "options"},message:"must have required property '"+"options"+"'"};
if(vErrors === null){
vErrors = [err82];
}
else {
vErrors.push(err82);
}
errors++;
}
if(data33.notes === undefined){
const err83 = {instancePath:instancePath+"/model",schemaPath:"#/properties/model/required",keyword:"required",params:{missingProperty: "notes"},message:"must have required property '"+"notes"+"'"};
if(vErrors === null){
vErrors = [err83];
}
else {
vErrors.push(err83);
}
errors++;
}
for(const key8 in data33){
if(!((((key8 === "structure") || (key8 === "contributions")) || (key8 === "options")) || (key8 === "notes"))){
const err84 = {instancePath:instancePath+"/model",schemaPath:"#/properties/model/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key8},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err84];
}
else {
vErrors.push(err84);
}
errors++;
}
}
if(data33.structure !== undefined){
let data34 = data33.structure;
if(!((((data34 === "atom") || (data34 === "diatomic")) || (data34 === "linear")) || (data34 === "nonlinear"))){
const err85 = {instancePath:instancePath+"/model/structure",schemaPath:"#/properties/model/properties/structure/enum",keyword:"enum",params:{allowedValues: schema2.properties.model.properties.structure.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err85];
}
else {
vErrors.push(err85);
}
errors++;
}
}
if(data33.contributions !== undefined){
let data35 = data33.contributions;
if(Array.isArray(data35)){
const len2 = data35.length;
for(let i2=0; i2<len2; i2++){
if(typeof data35[i2] !== "string"){
const err86 = {instancePath:instancePath+"/model/contributions/" + i2,schemaPath:"#/properties/model/properties/contributions/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err86];
}
else {
vErrors.push(err86);
}
errors++;
}
}
}
else {
const err87 = {instancePath:instancePath+"/model/contributions",schemaPath:"#/properties/model/properties/contributions/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err87];
}
else {
vErrors.push(err87);
}
errors++;
}
}
if(data33.options !== undefined){
let data37 = data33.options;
if(data37 && typeof data37 == "object" && !Array.isArray(data37)){
for(const key9 in data37){
let data38 = data37[key9];
if(((typeof data38 !== "string") && (!(typeof data38 == "number"))) && (typeof data38 !== "boolean")){
const err88 = {instancePath:instancePath+"/model/options/" + key9.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/properties/model/properties/options/additionalProperties/type",keyword:"type",params:{type: schema2.properties.model.properties.options.additionalProperties.type},message:"must be string,number,boolean"};
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
const err89 = {instancePath:instancePath+"/model/options",schemaPath:"#/properties/model/properties/options/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err89];
}
else {
vErrors.push(err89);
}
errors++;
}
}
if(data33.notes !== undefined){
let data39 = data33.notes;
if(Array.isArray(data39)){
const len3 = data39.length;
for(let i3=0; i3<len3; i3++){
if(typeof data39[i3] !== "string"){
const err90 = {instancePath:instancePath+"/model/notes/" + i3,schemaPath:"#/properties/model/properties/notes/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err90];
}
else {
vErrors.push(err90);
}
errors++;
}
}
}
else {
const err91 = {instancePath:instancePath+"/model/notes",schemaPath:"#/properties/model/properties/notes/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err91];
}
else {
vErrors.push(err91);
}
errors++;
}
}
}
else {
const err92 = {instancePath:instancePath+"/model",schemaPath:"#/properties/model/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err92];
}
else {
vErrors.push(err92);
}
errors++;
}
}
if(data.input_hash !== undefined){
let data41 = data.input_hash;
if(typeof data41 === "string"){
if(!pattern3.test(data41)){
const err93 = {instancePath:instancePath+"/input_hash",schemaPath:"#/properties/input_hash/pattern",keyword:"pattern",params:{pattern: "^sha256:[0-9a-f]{64}$"},message:"must match pattern \""+"^sha256:[0-9a-f]{64}$"+"\""};
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
const err94 = {instancePath:instancePath+"/input_hash",schemaPath:"#/properties/input_hash/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err94];
}
else {
vErrors.push(err94);
}
errors++;
}
}
if(data.input !== undefined){
let data42 = data.input;
if(!(data42 && typeof data42 == "object" && !Array.isArray(data42))){
const err95 = {instancePath:instancePath+"/input",schemaPath:"#/properties/input/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err95];
}
else {
vErrors.push(err95);
}
errors++;
}
}
if(data.sources !== undefined){
let data43 = data.sources;
if(Array.isArray(data43)){
if(data43.length < 1){
const err96 = {instancePath:instancePath+"/sources",schemaPath:"#/properties/sources/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items"};
if(vErrors === null){
vErrors = [err96];
}
else {
vErrors.push(err96);
}
errors++;
}
const len4 = data43.length;
for(let i4=0; i4<len4; i4++){
if(typeof data43[i4] !== "string"){
const err97 = {instancePath:instancePath+"/sources/" + i4,schemaPath:"#/properties/sources/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err97];
}
else {
vErrors.push(err97);
}
errors++;
}
}
}
else {
const err98 = {instancePath:instancePath+"/sources",schemaPath:"#/properties/sources/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err98];
}
else {
vErrors.push(err98);
}
errors++;
}
}
if(data.uncertainty !== undefined){
if(!(validate5(data.uncertainty, {instancePath:instancePath+"/uncertainty",parentData:data,parentDataProperty:"uncertainty",rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate5.errors : vErrors.concat(validate5.errors);
errors = vErrors.length;
}
}
}
else {
const err99 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err99];
}
else {
vErrors.push(err99);
}
errors++;
}
validate8.errors = vErrors;
return errors === 0;
}
validate8.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

export const validateDatabaseEnvelope = validate12;
const schema17 = {"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://qforge.invalid/schemas/database.schema.json-envelope","title":"qforge database (thermo.json)","description":"A built thermochemistry database: NASA 7-coefficient polynomials of ideal-gas species with the data they were fitted to. Coefficients are dimensionless with T in K (Cp/R = a1 + a2 T + a3 T^2 + a4 T^3 + a5 T^4, H/RT = ... + a6/T, S/R = a1 ln T + ... + a7; McBride, Gordon & Reno 1993, NASA TM-4513); H is the absolute standard enthalpy anchored on the enthalpy of formation at 298.15 K.","type":"object","additionalProperties":false,"required":["format","tool","constants_edition","standard_pressure","title","caution","build_settings","species"],"properties":{"format":{"const":"qforge-database/2"},"tool":{"type":"object","additionalProperties":false,"required":["name","version"],"properties":{"name":{"const":"qforge"},"version":{"type":"string"}}},"constants_edition":{"type":"string","description":"Edition of the physical constants, e.g. CODATA 2018."},"standard_pressure":{"type":"object","additionalProperties":false,"required":["label","pascal"],"properties":{"label":{"enum":["1 bar","1 atm"]},"pascal":{"type":"number","exclusiveMinimum":0}}},"title":{"type":"string"},"caution":{"type":"string","minLength":20},"build_settings":{"$ref":"settings.schema.json","description":"The database settings with every default filled in."},"species":{"type":"array","maxItems":0},"partial":{"description":"Present only in a partial database (build --keep-going with failures): the species left out and the species files with errors. A database without this member holds every species of its inputs.","type":"object","additionalProperties":false,"required":["partial","left_out","files_with_errors"],"properties":{"partial":{"const":true},"left_out":{"type":"array","items":{"type":"string"}},"files_with_errors":{"type":"array","items":{"type":"string"}}}}},"$defs":{"finite":{"type":"number"},"coefficients":{"type":"array","items":{"type":"number"},"minItems":7,"maxItems":7},"triple":{"type":"object","additionalProperties":false,"required":["cp","h","s"],"properties":{"cp":{"type":"number"},"h":{"type":"number"},"s":{"type":"number"}}},"rangeMetrics":{"type":"object","additionalProperties":false,"required":["points","max_abs","rms","t_at_max"],"properties":{"points":{"type":"integer","minimum":0},"max_abs":{"$ref":"#/$defs/triple"},"rms":{"$ref":"#/$defs/triple"},"t_at_max":{"$ref":"#/$defs/triple"}}},"species":{"type":"object","additionalProperties":false,"required":["name","file","composition","charge","phase","molar_mass_g_per_mol","temperature_ranges","coefficients","at_298_15","fit_metrics","model","input_hash","sources"],"properties":{"name":{"type":"string","minLength":1,"maxLength":16},"file":{"type":"string","description":"Species file, relative to the database folder."},"composition":{"type":"object","additionalProperties":{"type":"integer","minimum":1},"minProperties":1},"charge":{"type":"integer"},"phase":{"const":"G"},"molar_mass_g_per_mol":{"type":"number","exclusiveMinimum":0},"temperature_ranges":{"type":"object","additionalProperties":false,"required":["low","mid","high"],"properties":{"low":{"type":"number"},"mid":{"type":"number"},"high":{"type":"number"}}},"coefficients":{"type":"object","additionalProperties":false,"required":["low","high"],"properties":{"low":{"$ref":"#/$defs/coefficients","description":"a1..a7 for [low, mid]"},"high":{"$ref":"#/$defs/coefficients","description":"a1..a7 for [mid, high]"}}},"at_298_15":{"type":"object","additionalProperties":false,"required":["enthalpy_of_formation_kj_per_mol","entropy_j_per_mol_k","heat_capacity_j_per_mol_k","h298_minus_h0_kj_per_mol"],"properties":{"enthalpy_of_formation_kj_per_mol":{"type":"number"},"entropy_j_per_mol_k":{"type":"number"},"heat_capacity_j_per_mol_k":{"type":"number"},"h298_minus_h0_kj_per_mol":{"type":"number"}}},"fit_metrics":{"type":"object","additionalProperties":false,"required":["low","high","continuity","anchor"],"description":"Errors of the fit against the computed points, dimensionless (Cp/R, H/RT, S/R).","properties":{"low":{"$ref":"#/$defs/rangeMetrics"},"high":{"$ref":"#/$defs/rangeMetrics"},"continuity":{"type":"object","additionalProperties":false,"required":["cp","dcp","d2cp","h","s"],"properties":{"cp":{"type":"number"},"dcp":{"type":"number"},"d2cp":{"type":"number"},"h":{"type":"number"},"s":{"type":"number"}}},"anchor":{"type":"object","additionalProperties":false,"required":["h","s"],"properties":{"h":{"type":"number"},"s":{"type":"number"}}}}},"model":{"type":"object","additionalProperties":false,"required":["structure","contributions","options","notes"],"properties":{"structure":{"enum":["atom","diatomic","linear","nonlinear"]},"contributions":{"type":"array","items":{"type":"string"}},"options":{"type":"object","additionalProperties":{"type":["string","number","boolean"]}},"notes":{"type":"array","items":{"type":"string"}}}},"input_hash":{"type":"string","pattern":"^sha256:[0-9a-f]{64}$"},"input":{"type":"object","description":"The species' normalised input (internal units: cm-1 for spectroscopic energies, J/mol for enthalpies, K, g/mol; keys sorted) that input_hash hashes. Keys are qforge's internal model field names (camelCase), not output keys. Recorded so that `qforge diff` can name the input fields that changed; absent in databases written before it was recorded."},"sources":{"type":"array","items":{"type":"string"},"minItems":1},"uncertainty":{"$ref":"#/$defs/uncertainty"}}},"contributors":{"type":"array","description":"The largest contributions |sensitivity| x u, largest first (at most three), in the unit of the quantity.","items":{"type":"object","additionalProperties":false,"required":["input","contribution"],"properties":{"input":{"type":"string"},"contribution":{"type":"number","minimum":0}}}},"uncertainty":{"type":"object","description":"Standard uncertainties propagated linearly from the declared input uncertainties (independent inputs; the vibration scale factor moves all vibrations together). Model errors are not included. A species that declares none has declared = false and zeros.","additionalProperties":false,"required":["declared","method","inputs","points"],"properties":{"declared":{"type":"boolean","description":"Whether the species declares any input uncertainty."},"method":{"type":"string"},"inputs":{"type":"array","items":{"type":"object","additionalProperties":false,"required":["name","value","u","unit","sensitivity"],"properties":{"name":{"type":"string"},"value":{"type":"number"},"u":{"type":"number","exclusiveMinimum":0},"unit":{"type":"string"},"sensitivity":{"enum":["analytic","central-difference"]}}}},"points":{"type":"array","items":{"type":"object","additionalProperties":false,"required":["t_k","u_cp_j_per_mol_k","u_s_j_per_mol_k","u_h_minus_h298_kj_per_mol","u_h_kj_per_mol","largest"],"properties":{"t_k":{"type":"number"},"u_cp_j_per_mol_k":{"type":"number","minimum":0},"u_s_j_per_mol_k":{"type":"number","minimum":0},"u_h_minus_h298_kj_per_mol":{"type":"number","minimum":0},"u_h_kj_per_mol":{"type":"number","minimum":0},"largest":{"type":"object","additionalProperties":false,"required":["cp","s","h_minus_h298","h"],"properties":{"cp":{"$ref":"#/$defs/contributors"},"s":{"$ref":"#/$defs/contributors"},"h_minus_h298":{"$ref":"#/$defs/contributors"},"h":{"$ref":"#/$defs/contributors"}}}}}},"monte_carlo":{"type":"array","description":"Sampled check (build --uncertainty-samples N): sample standard deviations of the same quantities.","items":{"type":"object","additionalProperties":false,"required":["t_k","samples","seed","u_cp_j_per_mol_k","u_s_j_per_mol_k","u_h_minus_h298_kj_per_mol","u_h_kj_per_mol"],"properties":{"t_k":{"type":"number"},"samples":{"type":"integer","minimum":2},"seed":{"type":"integer"},"u_cp_j_per_mol_k":{"type":"number","minimum":0},"u_s_j_per_mol_k":{"type":"number","minimum":0},"u_h_minus_h298_kj_per_mol":{"type":"number","minimum":0},"u_h_kj_per_mol":{"type":"number","minimum":0}}}}}}}};
const schema1 = {"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://qforge.invalid/schemas/settings.schema.json","title":"qforge database settings (qforge.yaml)","description":"Settings of one database folder, read from qforge.yaml at its root. Every key is optional and has the documented default; unknown keys are errors.","type":"object","additionalProperties":false,"properties":{"title":{"description":"Database title, written into thermo.json and the comment header of nasa7.txt. Default: 'qforge database'.","type":"string","minLength":1,"maxLength":200,"default":"qforge database"},"record_identifier":{"description":"Text of the date/identifier field (columns 19-24) of every 80-column record. Never today's date, so outputs stay reproducible. 0-6 characters of [A-Za-z0-9 ._/-]. Default: 'QFORGE'.","type":"string","pattern":"^[A-Za-z0-9 ._/-]{0,6}$","default":"QFORGE","title":"0-6 characters of A-Z a-z 0-9 space . _ / -"},"temperature_ranges":{"description":"Fit ranges in K: [low, mid] and [mid, high]. A species file may override them. Default: 200 / 1000 / 6000.","type":"object","additionalProperties":false,"properties":{"low":{"type":"number","exclusiveMinimum":0,"default":200},"mid":{"type":"number","exclusiveMinimum":0,"default":1000},"high":{"type":"number","exclusiveMinimum":0,"maximum":20000,"default":6000}}},"standard_pressure":{"description":"Standard-state pressure of the ideal-gas properties: '1 bar' (IUPAC, NIST-JANAF 4th ed.) or '1 atm' (older tables). Default: '1 bar'.","enum":["1 bar","1 atm"],"default":"1 bar","title":"'1 bar' or '1 atm'"},"fit":{"description":"How the NASA 7-coefficient polynomials are fitted.","type":"object","additionalProperties":false,"properties":{"weights":{"description":"Relative weights of the Cp/R, H/RT and S/R residuals. Default: 1 each.","type":"object","additionalProperties":false,"properties":{"cp":{"type":"number","minimum":0,"default":1},"h":{"type":"number","minimum":0,"default":1},"s":{"type":"number","minimum":0,"default":1}}},"method":{"description":"How the coefficients are chosen: 'minimax' (default) minimises the largest error relative to the limits of 'tolerances' (the measure the check uses, so a species passes exactly when the optimum is at most 1), started from and never worse than least squares; 'least_squares' minimises the weighted sum of squared errors (weights above).","enum":["minimax","least_squares"],"default":"minimax"},"continuity_order":{"description":"Highest derivative of Cp made continuous at the midpoint (H and S always are): 1 = Cp and dCp/dT, 2 = also d2Cp/dT2. Default: 1.","enum":[1,2],"default":1},"optimise_mid":{"description":"false keeps the midpoint at temperature_ranges.mid for every species; an object lets the fit choose the midpoint per species in [min, max] on the given step (K), clipped to 100 K inside the species' own range, minimising the worst error relative to the limits (minimax) or the worst weighted error (least_squares). A species that sets temperature_ranges.mid keeps that midpoint. Default: {min: 700, max: 2500, step: 100}.","default":{"min":700,"max":2500,"step":100},"oneOf":[{"const":false},{"type":"object","additionalProperties":false,"required":["min","max"],"properties":{"min":{"type":"number","exclusiveMinimum":0},"max":{"type":"number","exclusiveMinimum":0},"step":{"type":"number","exclusiveMinimum":0,"default":100}}}],"title":"false, or {min, max, step?} in K"},"sampling_step":{"description":"Spacing (K) of the grid of computed points the fit uses; the range ends, the midpoint and 298.15 K are always included. Default: 10.","type":"number","minimum":0.5,"maximum":500,"default":10},"nodes":{"description":"Which computed points of the sampling grid the fit is made from; the fit check always judges every sampling point. 'all': every one. A mapping: `count` target temperatures over the fit range spaced `uniform` (evenly in T), `geometric` (evenly in ln T, denser at low T) or `chebyshev` (Chebyshev-Lobatto points, denser at both ends), each moved to the nearest sampling point, plus the range ends, 298.15 K and every midpoint candidate (more points are filled in where a range would be too sparsely covered); `exchange: true` then adds the sampling points where the fit's error relative to its limit has a local maximum and fits again at the chosen midpoint (one Remez exchange step). Default: 'all'.","oneOf":[{"const":"all"},{"type":"object","additionalProperties":false,"properties":{"spacing":{"enum":["uniform","geometric","chebyshev"],"default":"geometric"},"count":{"type":"integer","minimum":2,"maximum":100000,"default":40},"exchange":{"type":"boolean","default":true}}}],"title":"'all', or {spacing?, count?, exchange?}","default":"all"}}},"tolerances":{"description":"Largest fit error accepted at each temperature (dimensionless): for q = cp, h, s the limit is max(q, relative_to_cp.q × Cp/R(T)), Cp/R the computed value. A species whose fit exceeds one fails. Defaults: cp 0.1 (|ΔCp/R|), h 0.02 (|ΔH/RT|), s 0.02 (|ΔS/R|); relative_to_cp cp 0.015, h 0.003, s 0.003. A species file may set the same keys for itself.","type":"object","additionalProperties":false,"properties":{"cp":{"type":"number","exclusiveMinimum":0,"default":0.1},"h":{"type":"number","exclusiveMinimum":0,"default":0.02},"s":{"type":"number","exclusiveMinimum":0,"default":0.02},"relative_to_cp":{"description":"Size-scaled part of the limits: multiples of the computed Cp/R at the same temperature. 0.003 in H/RT and S/R is the error a 0.3 % shift in temperature would cause. Defaults: cp 0.015, h 0.003, s 0.003.","type":"object","additionalProperties":false,"properties":{"cp":{"type":"number","minimum":0,"default":0.015},"h":{"type":"number","minimum":0,"default":0.003},"s":{"type":"number","minimum":0,"default":0.003}}}}},"outputs":{"description":"Which database files a build writes (summary.json is always written). Default: all true except report.","type":"object","additionalProperties":false,"properties":{"thermo_json":{"type":"boolean","default":true},"nasa7":{"type":"boolean","default":true},"tables":{"type":"boolean","default":true},"report":{"description":"Also write report.html: overview and per-species charts of the build (same as build --report). Default: false.","type":"boolean","default":false}}},"tables":{"description":"Temperature grid (K) of tables/<name>.csv: from, to, step, plus extra temperatures; clipped to each species' fitted range. Default: 200 to 6000 step 100, plus 298.15.","type":"object","additionalProperties":false,"properties":{"from":{"type":"number","exclusiveMinimum":0,"default":200},"to":{"type":"number","exclusiveMinimum":0,"default":6000},"step":{"type":"number","minimum":1,"default":100},"extra":{"type":"array","items":{"type":"number","exclusiveMinimum":0},"maxItems":1000,"default":[298.15]}}},"references":{"description":"Reference data `qforge compare` uses when no --reference is given: files relative to the database folder, the largest accepted deviations, and known deviations (species/temperature windows with a wider, reasoned limit). Default: no files; cp 0.5 J/(mol K), s 0.5 J/(mol K), h 0.5 kJ/mol; no known deviations.","type":"object","additionalProperties":false,"properties":{"files":{"type":"array","items":{"type":"string","minLength":1},"default":[]},"tolerances":{"type":"object","additionalProperties":false,"properties":{"cp":{"description":"J/(mol K)","type":"number","exclusiveMinimum":0,"default":0.5},"s":{"description":"J/(mol K)","type":"number","exclusiveMinimum":0,"default":0.5},"h":{"description":"H-H298, kJ/mol","type":"number","exclusiveMinimum":0,"default":0.5}}},"known_deviations":{"description":"Recorded, reasoned exceptions to references.tolerances: inside its temperature window, a value of the named species whose deviation exceeds the normal tolerance but not the widened one is reported as 'known' (not a breach; compare still exits 0). Each entry must give a reason. compare warns when an entry names a species absent from the build, covers no compared value, or is no longer needed (every value it covers is within the normal tolerance). `qforge compare --strict` ignores every entry. Entries for the same species may not overlap in temperature for the same quantity. Default: none.","type":"array","maxItems":1000,"default":[],"items":{"type":"object","additionalProperties":false,"required":["species","tolerances","reason"],"properties":{"species":{"description":"Species record name, exactly as in the build (e.g. 'H2').","type":"string","minLength":1},"from":{"description":"Lowest temperature (K, inclusive) the entry covers. Default: no lower limit.","type":"number","minimum":0},"to":{"description":"Highest temperature (K, inclusive) the entry covers. Default: no upper limit.","type":"number","exclusiveMinimum":0},"tolerances":{"description":"Widened largest |deviation| per quantity inside the window; each must exceed the normal references.tolerances value. Quantities not given keep the normal tolerance. At least one.","type":"object","additionalProperties":false,"minProperties":1,"properties":{"cp":{"description":"J/(mol K)","type":"number","exclusiveMinimum":0},"s":{"description":"J/(mol K)","type":"number","exclusiveMinimum":0},"h":{"description":"H-H298, kJ/mol","type":"number","exclusiveMinimum":0}},"title":"a mapping with any of cp, s (J/(mol K)), h (kJ/mol)"},"reason":{"description":"Why the deviation is accepted (the model limit, where it is documented). Printed by compare. At least 10 characters.","type":"string","minLength":10,"pattern":"\\S"}}}}}},"strict":{"description":"Treat every warning of `check` and `build` as an error (as --strict does), except the accepted ones. Default false.","type":"boolean","default":false},"accepted_warnings":{"description":"Warnings accepted in writing for the whole database or one species: code (as printed in [brackets]), optional species, reason. An accepted warning is neither printed nor made an error by strict mode; an entry that matches no warning is warned about (stale-accepted-warning).","type":"array","items":{"type":"object","additionalProperties":false,"required":["code","reason"],"properties":{"code":{"type":"string","pattern":"^[a-z0-9]+(-[a-z0-9]+)*$","title":"a diagnostic code in lower kebab-case"},"species":{"type":"string","minLength":1},"reason":{"type":"string","minLength":10,"title":"why the warning is accepted (at least 10 characters)"}}},"default":[]}}};
const pattern0 = new RegExp("^[A-Za-z0-9 ._/-]{0,6}$", "u");
const pattern1 = new RegExp("\\S", "u");
const pattern2 = new RegExp("^[a-z0-9]+(-[a-z0-9]+)*$", "u");

function validate12(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
/*# sourceURL="https://qforge.invalid/schemas/database.schema.json-envelope" */;
let vErrors = null;
let errors = 0;
const evaluated0 = validate12.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.format === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "format"},message:"must have required property '"+"format"+"'"};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.tool === undefined){
const err1 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "tool"},message:"must have required property '"+"tool"+"'"};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(data.constants_edition === undefined){
const err2 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "constants_edition"},message:"must have required property '"+"constants_edition"+"'"};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data.standard_pressure === undefined){
const err3 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "standard_pressure"},message:"must have required property '"+"standard_pressure"+"'"};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if(data.title === undefined){
const err4 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "title"},message:"must have required property '"+"title"+"'"};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if(data.caution === undefined){
const err5 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "caution"},message:"must have required property '"+"caution"+"'"};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if(data.build_settings === undefined){
const err6 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "build_settings"},message:"must have required property '"+"build_settings"+"'"};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
if(data.species === undefined){
const err7 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "species"},message:"must have required property '"+"species"+"'"};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
for(const key0 in data){
if(!(func0.call(schema17.properties, key0))){
const err8 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
}
if(data.format !== undefined){
if("qforge-database/2" !== data.format){
const err9 = {instancePath:instancePath+"/format",schemaPath:"#/properties/format/const",keyword:"const",params:{allowedValue: "qforge-database/2"},message:"must be equal to constant"};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
if(data.tool !== undefined){
let data1 = data.tool;
if(data1 && typeof data1 == "object" && !Array.isArray(data1)){
if(data1.name === undefined){
const err10 = {instancePath:instancePath+"/tool",schemaPath:"#/properties/tool/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'"};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
if(data1.version === undefined){
const err11 = {instancePath:instancePath+"/tool",schemaPath:"#/properties/tool/required",keyword:"required",params:{missingProperty: "version"},message:"must have required property '"+"version"+"'"};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
for(const key1 in data1){
if(!((key1 === "name") || (key1 === "version"))){
const err12 = {instancePath:instancePath+"/tool",schemaPath:"#/properties/tool/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
if(data1.name !== undefined){
if("qforge" !== data1.name){
const err13 = {instancePath:instancePath+"/tool/name",schemaPath:"#/properties/tool/properties/name/const",keyword:"const",params:{allowedValue: "qforge"},message:"must be equal to constant"};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
if(data1.version !== undefined){
if(typeof data1.version !== "string"){
const err14 = {instancePath:instancePath+"/tool/version",schemaPath:"#/properties/tool/properties/version/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
}
else {
const err15 = {instancePath:instancePath+"/tool",schemaPath:"#/properties/tool/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
if(data.constants_edition !== undefined){
if(typeof data.constants_edition !== "string"){
const err16 = {instancePath:instancePath+"/constants_edition",schemaPath:"#/properties/constants_edition/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
}
if(data.standard_pressure !== undefined){
let data5 = data.standard_pressure;
if(data5 && typeof data5 == "object" && !Array.isArray(data5)){
if(data5.label === undefined){
const err17 = {instancePath:instancePath+"/standard_pressure",schemaPath:"#/properties/standard_pressure/required",keyword:"required",params:{missingProperty: "label"},message:"must have required property '"+"label"+"'"};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
if(data5.pascal === undefined){
const err18 = {instancePath:instancePath+"/standard_pressure",schemaPath:"#/properties/standard_pressure/required",keyword:"required",params:{missingProperty: "pascal"},message:"must have required property '"+"pascal"+"'"};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
for(const key2 in data5){
if(!((key2 === "label") || (key2 === "pascal"))){
const err19 = {instancePath:instancePath+"/standard_pressure",schemaPath:"#/properties/standard_pressure/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data5.label !== undefined){
let data6 = data5.label;
if(!((data6 === "1 bar") || (data6 === "1 atm"))){
const err20 = {instancePath:instancePath+"/standard_pressure/label",schemaPath:"#/properties/standard_pressure/properties/label/enum",keyword:"enum",params:{allowedValues: schema17.properties.standard_pressure.properties.label.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
if(data5.pascal !== undefined){
let data7 = data5.pascal;
if(typeof data7 == "number"){
if(data7 <= 0 || isNaN(data7)){
const err21 = {instancePath:instancePath+"/standard_pressure/pascal",schemaPath:"#/properties/standard_pressure/properties/pascal/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
else {
const err22 = {instancePath:instancePath+"/standard_pressure/pascal",schemaPath:"#/properties/standard_pressure/properties/pascal/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
}
else {
const err23 = {instancePath:instancePath+"/standard_pressure",schemaPath:"#/properties/standard_pressure/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
if(data.title !== undefined){
if(typeof data.title !== "string"){
const err24 = {instancePath:instancePath+"/title",schemaPath:"#/properties/title/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
}
if(data.caution !== undefined){
let data9 = data.caution;
if(typeof data9 === "string"){
if(func1(data9) < 20){
const err25 = {instancePath:instancePath+"/caution",schemaPath:"#/properties/caution/minLength",keyword:"minLength",params:{limit: 20},message:"must NOT have fewer than 20 characters"};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
}
else {
const err26 = {instancePath:instancePath+"/caution",schemaPath:"#/properties/caution/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
if(data.build_settings !== undefined){
let data10 = data.build_settings;
if(data10 && typeof data10 == "object" && !Array.isArray(data10)){
for(const key3 in data10){
if(!(func0.call(schema1.properties, key3))){
const err27 = {instancePath:instancePath+"/build_settings",schemaPath:"settings.schema.json/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
}
if(data10.title !== undefined){
let data11 = data10.title;
if(typeof data11 === "string"){
if(func1(data11) > 200){
const err28 = {instancePath:instancePath+"/build_settings/title",schemaPath:"settings.schema.json/properties/title/maxLength",keyword:"maxLength",params:{limit: 200},message:"must NOT have more than 200 characters"};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
if(func1(data11) < 1){
const err29 = {instancePath:instancePath+"/build_settings/title",schemaPath:"settings.schema.json/properties/title/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters"};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
}
else {
const err30 = {instancePath:instancePath+"/build_settings/title",schemaPath:"settings.schema.json/properties/title/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
if(data10.record_identifier !== undefined){
let data12 = data10.record_identifier;
if(typeof data12 === "string"){
if(!pattern0.test(data12)){
const err31 = {instancePath:instancePath+"/build_settings/record_identifier",schemaPath:"settings.schema.json/properties/record_identifier/pattern",keyword:"pattern",params:{pattern: "^[A-Za-z0-9 ._/-]{0,6}$"},message:"must match pattern \""+"^[A-Za-z0-9 ._/-]{0,6}$"+"\""};
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
const err32 = {instancePath:instancePath+"/build_settings/record_identifier",schemaPath:"settings.schema.json/properties/record_identifier/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
}
if(data10.temperature_ranges !== undefined){
let data13 = data10.temperature_ranges;
if(data13 && typeof data13 == "object" && !Array.isArray(data13)){
for(const key4 in data13){
if(!(((key4 === "low") || (key4 === "mid")) || (key4 === "high"))){
const err33 = {instancePath:instancePath+"/build_settings/temperature_ranges",schemaPath:"settings.schema.json/properties/temperature_ranges/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
}
if(data13.low !== undefined){
let data14 = data13.low;
if(typeof data14 == "number"){
if(data14 <= 0 || isNaN(data14)){
const err34 = {instancePath:instancePath+"/build_settings/temperature_ranges/low",schemaPath:"settings.schema.json/properties/temperature_ranges/properties/low/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
}
else {
const err35 = {instancePath:instancePath+"/build_settings/temperature_ranges/low",schemaPath:"settings.schema.json/properties/temperature_ranges/properties/low/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
}
if(data13.mid !== undefined){
let data15 = data13.mid;
if(typeof data15 == "number"){
if(data15 <= 0 || isNaN(data15)){
const err36 = {instancePath:instancePath+"/build_settings/temperature_ranges/mid",schemaPath:"settings.schema.json/properties/temperature_ranges/properties/mid/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
else {
const err37 = {instancePath:instancePath+"/build_settings/temperature_ranges/mid",schemaPath:"settings.schema.json/properties/temperature_ranges/properties/mid/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
}
if(data13.high !== undefined){
let data16 = data13.high;
if(typeof data16 == "number"){
if(data16 > 20000 || isNaN(data16)){
const err38 = {instancePath:instancePath+"/build_settings/temperature_ranges/high",schemaPath:"settings.schema.json/properties/temperature_ranges/properties/high/maximum",keyword:"maximum",params:{comparison: "<=", limit: 20000},message:"must be <= 20000"};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
if(data16 <= 0 || isNaN(data16)){
const err39 = {instancePath:instancePath+"/build_settings/temperature_ranges/high",schemaPath:"settings.schema.json/properties/temperature_ranges/properties/high/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
}
else {
const err40 = {instancePath:instancePath+"/build_settings/temperature_ranges/high",schemaPath:"settings.schema.json/properties/temperature_ranges/properties/high/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
}
}
else {
const err41 = {instancePath:instancePath+"/build_settings/temperature_ranges",schemaPath:"settings.schema.json/properties/temperature_ranges/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
}
if(data10.standard_pressure !== undefined){
let data17 = data10.standard_pressure;
if(!((data17 === "1 bar") || (data17 === "1 atm"))){
const err42 = {instancePath:instancePath+"/build_settings/standard_pressure",schemaPath:"settings.schema.json/properties/standard_pressure/enum",keyword:"enum",params:{allowedValues: schema1.properties.standard_pressure.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
}
if(data10.fit !== undefined){
let data18 = data10.fit;
if(data18 && typeof data18 == "object" && !Array.isArray(data18)){
for(const key5 in data18){
if(!((((((key5 === "weights") || (key5 === "method")) || (key5 === "continuity_order")) || (key5 === "optimise_mid")) || (key5 === "sampling_step")) || (key5 === "nodes"))){
const err43 = {instancePath:instancePath+"/build_settings/fit",schemaPath:"settings.schema.json/properties/fit/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key5},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
}
if(data18.weights !== undefined){
let data19 = data18.weights;
if(data19 && typeof data19 == "object" && !Array.isArray(data19)){
for(const key6 in data19){
if(!(((key6 === "cp") || (key6 === "h")) || (key6 === "s"))){
const err44 = {instancePath:instancePath+"/build_settings/fit/weights",schemaPath:"settings.schema.json/properties/fit/properties/weights/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key6},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
}
if(data19.cp !== undefined){
let data20 = data19.cp;
if(typeof data20 == "number"){
if(data20 < 0 || isNaN(data20)){
const err45 = {instancePath:instancePath+"/build_settings/fit/weights/cp",schemaPath:"settings.schema.json/properties/fit/properties/weights/properties/cp/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
}
else {
const err46 = {instancePath:instancePath+"/build_settings/fit/weights/cp",schemaPath:"settings.schema.json/properties/fit/properties/weights/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
}
if(data19.h !== undefined){
let data21 = data19.h;
if(typeof data21 == "number"){
if(data21 < 0 || isNaN(data21)){
const err47 = {instancePath:instancePath+"/build_settings/fit/weights/h",schemaPath:"settings.schema.json/properties/fit/properties/weights/properties/h/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err47];
}
else {
vErrors.push(err47);
}
errors++;
}
}
else {
const err48 = {instancePath:instancePath+"/build_settings/fit/weights/h",schemaPath:"settings.schema.json/properties/fit/properties/weights/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err48];
}
else {
vErrors.push(err48);
}
errors++;
}
}
if(data19.s !== undefined){
let data22 = data19.s;
if(typeof data22 == "number"){
if(data22 < 0 || isNaN(data22)){
const err49 = {instancePath:instancePath+"/build_settings/fit/weights/s",schemaPath:"settings.schema.json/properties/fit/properties/weights/properties/s/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
}
else {
const err50 = {instancePath:instancePath+"/build_settings/fit/weights/s",schemaPath:"settings.schema.json/properties/fit/properties/weights/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
}
}
else {
const err51 = {instancePath:instancePath+"/build_settings/fit/weights",schemaPath:"settings.schema.json/properties/fit/properties/weights/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
}
if(data18.method !== undefined){
let data23 = data18.method;
if(!((data23 === "minimax") || (data23 === "least_squares"))){
const err52 = {instancePath:instancePath+"/build_settings/fit/method",schemaPath:"settings.schema.json/properties/fit/properties/method/enum",keyword:"enum",params:{allowedValues: schema1.properties.fit.properties.method.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
}
if(data18.continuity_order !== undefined){
let data24 = data18.continuity_order;
if(!((data24 === 1) || (data24 === 2))){
const err53 = {instancePath:instancePath+"/build_settings/fit/continuity_order",schemaPath:"settings.schema.json/properties/fit/properties/continuity_order/enum",keyword:"enum",params:{allowedValues: schema1.properties.fit.properties.continuity_order.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
}
if(data18.optimise_mid !== undefined){
let data25 = data18.optimise_mid;
const _errs54 = errors;
let valid8 = false;
let passing0 = null;
const _errs55 = errors;
if(false !== data25){
const err54 = {instancePath:instancePath+"/build_settings/fit/optimise_mid",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/0/const",keyword:"const",params:{allowedValue: false},message:"must be equal to constant"};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
var _valid0 = _errs55 === errors;
if(_valid0){
valid8 = true;
passing0 = 0;
}
const _errs56 = errors;
if(data25 && typeof data25 == "object" && !Array.isArray(data25)){
if(data25.min === undefined){
const err55 = {instancePath:instancePath+"/build_settings/fit/optimise_mid",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/required",keyword:"required",params:{missingProperty: "min"},message:"must have required property '"+"min"+"'"};
if(vErrors === null){
vErrors = [err55];
}
else {
vErrors.push(err55);
}
errors++;
}
if(data25.max === undefined){
const err56 = {instancePath:instancePath+"/build_settings/fit/optimise_mid",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/required",keyword:"required",params:{missingProperty: "max"},message:"must have required property '"+"max"+"'"};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
for(const key7 in data25){
if(!(((key7 === "min") || (key7 === "max")) || (key7 === "step"))){
const err57 = {instancePath:instancePath+"/build_settings/fit/optimise_mid",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key7},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
}
if(data25.min !== undefined){
let data26 = data25.min;
if(typeof data26 == "number"){
if(data26 <= 0 || isNaN(data26)){
const err58 = {instancePath:instancePath+"/build_settings/fit/optimise_mid/min",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/properties/min/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
}
else {
const err59 = {instancePath:instancePath+"/build_settings/fit/optimise_mid/min",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/properties/min/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
}
if(data25.max !== undefined){
let data27 = data25.max;
if(typeof data27 == "number"){
if(data27 <= 0 || isNaN(data27)){
const err60 = {instancePath:instancePath+"/build_settings/fit/optimise_mid/max",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/properties/max/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
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
const err61 = {instancePath:instancePath+"/build_settings/fit/optimise_mid/max",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/properties/max/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
}
if(data25.step !== undefined){
let data28 = data25.step;
if(typeof data28 == "number"){
if(data28 <= 0 || isNaN(data28)){
const err62 = {instancePath:instancePath+"/build_settings/fit/optimise_mid/step",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/properties/step/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
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
const err63 = {instancePath:instancePath+"/build_settings/fit/optimise_mid/step",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/properties/step/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
}
}
else {
const err64 = {instancePath:instancePath+"/build_settings/fit/optimise_mid",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf/1/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
var _valid0 = _errs56 === errors;
if(_valid0 && valid8){
valid8 = false;
passing0 = [passing0, 1];
}
else {
if(_valid0){
valid8 = true;
passing0 = 1;
}
}
if(!valid8){
const err65 = {instancePath:instancePath+"/build_settings/fit/optimise_mid",schemaPath:"settings.schema.json/properties/fit/properties/optimise_mid/oneOf",keyword:"oneOf",params:{passingSchemas: passing0},message:"must match exactly one schema in oneOf"};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
else {
errors = _errs54;
if(vErrors !== null){
if(_errs54){
vErrors.length = _errs54;
}
else {
vErrors = null;
}
}
}
}
if(data18.sampling_step !== undefined){
let data29 = data18.sampling_step;
if(typeof data29 == "number"){
if(data29 > 500 || isNaN(data29)){
const err66 = {instancePath:instancePath+"/build_settings/fit/sampling_step",schemaPath:"settings.schema.json/properties/fit/properties/sampling_step/maximum",keyword:"maximum",params:{comparison: "<=", limit: 500},message:"must be <= 500"};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
if(data29 < 0.5 || isNaN(data29)){
const err67 = {instancePath:instancePath+"/build_settings/fit/sampling_step",schemaPath:"settings.schema.json/properties/fit/properties/sampling_step/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0.5},message:"must be >= 0.5"};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
}
else {
const err68 = {instancePath:instancePath+"/build_settings/fit/sampling_step",schemaPath:"settings.schema.json/properties/fit/properties/sampling_step/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
}
if(data18.nodes !== undefined){
let data30 = data18.nodes;
const _errs68 = errors;
let valid10 = false;
let passing1 = null;
const _errs69 = errors;
if("all" !== data30){
const err69 = {instancePath:instancePath+"/build_settings/fit/nodes",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf/0/const",keyword:"const",params:{allowedValue: "all"},message:"must be equal to constant"};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
var _valid1 = _errs69 === errors;
if(_valid1){
valid10 = true;
passing1 = 0;
}
const _errs70 = errors;
if(data30 && typeof data30 == "object" && !Array.isArray(data30)){
for(const key8 in data30){
if(!(((key8 === "spacing") || (key8 === "count")) || (key8 === "exchange"))){
const err70 = {instancePath:instancePath+"/build_settings/fit/nodes",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf/1/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key8},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
}
if(data30.spacing !== undefined){
let data31 = data30.spacing;
if(!(((data31 === "uniform") || (data31 === "geometric")) || (data31 === "chebyshev"))){
const err71 = {instancePath:instancePath+"/build_settings/fit/nodes/spacing",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf/1/properties/spacing/enum",keyword:"enum",params:{allowedValues: schema1.properties.fit.properties.nodes.oneOf[1].properties.spacing.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
}
if(data30.count !== undefined){
let data32 = data30.count;
if(!((typeof data32 == "number") && (!(data32 % 1) && !isNaN(data32)))){
const err72 = {instancePath:instancePath+"/build_settings/fit/nodes/count",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf/1/properties/count/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err72];
}
else {
vErrors.push(err72);
}
errors++;
}
if(typeof data32 == "number"){
if(data32 > 100000 || isNaN(data32)){
const err73 = {instancePath:instancePath+"/build_settings/fit/nodes/count",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf/1/properties/count/maximum",keyword:"maximum",params:{comparison: "<=", limit: 100000},message:"must be <= 100000"};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
if(data32 < 2 || isNaN(data32)){
const err74 = {instancePath:instancePath+"/build_settings/fit/nodes/count",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf/1/properties/count/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2"};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
}
}
if(data30.exchange !== undefined){
if(typeof data30.exchange !== "boolean"){
const err75 = {instancePath:instancePath+"/build_settings/fit/nodes/exchange",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf/1/properties/exchange/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
}
}
else {
const err76 = {instancePath:instancePath+"/build_settings/fit/nodes",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf/1/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
var _valid1 = _errs70 === errors;
if(_valid1 && valid10){
valid10 = false;
passing1 = [passing1, 1];
}
else {
if(_valid1){
valid10 = true;
passing1 = 1;
}
}
if(!valid10){
const err77 = {instancePath:instancePath+"/build_settings/fit/nodes",schemaPath:"settings.schema.json/properties/fit/properties/nodes/oneOf",keyword:"oneOf",params:{passingSchemas: passing1},message:"must match exactly one schema in oneOf"};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
else {
errors = _errs68;
if(vErrors !== null){
if(_errs68){
vErrors.length = _errs68;
}
else {
vErrors = null;
}
}
}
}
}
else {
const err78 = {instancePath:instancePath+"/build_settings/fit",schemaPath:"settings.schema.json/properties/fit/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
}
if(data10.tolerances !== undefined){
let data34 = data10.tolerances;
if(data34 && typeof data34 == "object" && !Array.isArray(data34)){
for(const key9 in data34){
if(!((((key9 === "cp") || (key9 === "h")) || (key9 === "s")) || (key9 === "relative_to_cp"))){
const err79 = {instancePath:instancePath+"/build_settings/tolerances",schemaPath:"settings.schema.json/properties/tolerances/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key9},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
}
if(data34.cp !== undefined){
let data35 = data34.cp;
if(typeof data35 == "number"){
if(data35 <= 0 || isNaN(data35)){
const err80 = {instancePath:instancePath+"/build_settings/tolerances/cp",schemaPath:"settings.schema.json/properties/tolerances/properties/cp/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
}
else {
const err81 = {instancePath:instancePath+"/build_settings/tolerances/cp",schemaPath:"settings.schema.json/properties/tolerances/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
}
if(data34.h !== undefined){
let data36 = data34.h;
if(typeof data36 == "number"){
if(data36 <= 0 || isNaN(data36)){
const err82 = {instancePath:instancePath+"/build_settings/tolerances/h",schemaPath:"settings.schema.json/properties/tolerances/properties/h/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
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
const err83 = {instancePath:instancePath+"/build_settings/tolerances/h",schemaPath:"settings.schema.json/properties/tolerances/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err83];
}
else {
vErrors.push(err83);
}
errors++;
}
}
if(data34.s !== undefined){
let data37 = data34.s;
if(typeof data37 == "number"){
if(data37 <= 0 || isNaN(data37)){
const err84 = {instancePath:instancePath+"/build_settings/tolerances/s",schemaPath:"settings.schema.json/properties/tolerances/properties/s/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err84];
}
else {
vErrors.push(err84);
}
errors++;
}
}
else {
const err85 = {instancePath:instancePath+"/build_settings/tolerances/s",schemaPath:"settings.schema.json/properties/tolerances/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err85];
}
else {
vErrors.push(err85);
}
errors++;
}
}
if(data34.relative_to_cp !== undefined){
let data38 = data34.relative_to_cp;
if(data38 && typeof data38 == "object" && !Array.isArray(data38)){
for(const key10 in data38){
if(!(((key10 === "cp") || (key10 === "h")) || (key10 === "s"))){
const err86 = {instancePath:instancePath+"/build_settings/tolerances/relative_to_cp",schemaPath:"settings.schema.json/properties/tolerances/properties/relative_to_cp/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key10},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err86];
}
else {
vErrors.push(err86);
}
errors++;
}
}
if(data38.cp !== undefined){
let data39 = data38.cp;
if(typeof data39 == "number"){
if(data39 < 0 || isNaN(data39)){
const err87 = {instancePath:instancePath+"/build_settings/tolerances/relative_to_cp/cp",schemaPath:"settings.schema.json/properties/tolerances/properties/relative_to_cp/properties/cp/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err88 = {instancePath:instancePath+"/build_settings/tolerances/relative_to_cp/cp",schemaPath:"settings.schema.json/properties/tolerances/properties/relative_to_cp/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err88];
}
else {
vErrors.push(err88);
}
errors++;
}
}
if(data38.h !== undefined){
let data40 = data38.h;
if(typeof data40 == "number"){
if(data40 < 0 || isNaN(data40)){
const err89 = {instancePath:instancePath+"/build_settings/tolerances/relative_to_cp/h",schemaPath:"settings.schema.json/properties/tolerances/properties/relative_to_cp/properties/h/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err89];
}
else {
vErrors.push(err89);
}
errors++;
}
}
else {
const err90 = {instancePath:instancePath+"/build_settings/tolerances/relative_to_cp/h",schemaPath:"settings.schema.json/properties/tolerances/properties/relative_to_cp/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err90];
}
else {
vErrors.push(err90);
}
errors++;
}
}
if(data38.s !== undefined){
let data41 = data38.s;
if(typeof data41 == "number"){
if(data41 < 0 || isNaN(data41)){
const err91 = {instancePath:instancePath+"/build_settings/tolerances/relative_to_cp/s",schemaPath:"settings.schema.json/properties/tolerances/properties/relative_to_cp/properties/s/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err92 = {instancePath:instancePath+"/build_settings/tolerances/relative_to_cp/s",schemaPath:"settings.schema.json/properties/tolerances/properties/relative_to_cp/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err92];
}
else {
vErrors.push(err92);
}
errors++;
}
}
}
else {
const err93 = {instancePath:instancePath+"/build_settings/tolerances/relative_to_cp",schemaPath:"settings.schema.json/properties/tolerances/properties/relative_to_cp/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err93];
}
else {
vErrors.push(err93);
}
errors++;
}
}
}
else {
const err94 = {instancePath:instancePath+"/build_settings/tolerances",schemaPath:"settings.schema.json/properties/tolerances/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err94];
}
else {
vErrors.push(err94);
}
errors++;
}
}
if(data10.outputs !== undefined){
let data42 = data10.outputs;
if(data42 && typeof data42 == "object" && !Array.isArray(data42)){
for(const key11 in data42){
if(!((((key11 === "thermo_json") || (key11 === "nasa7")) || (key11 === "tables")) || (key11 === "report"))){
const err95 = {instancePath:instancePath+"/build_settings/outputs",schemaPath:"settings.schema.json/properties/outputs/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key11},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err95];
}
else {
vErrors.push(err95);
}
errors++;
}
}
if(data42.thermo_json !== undefined){
if(typeof data42.thermo_json !== "boolean"){
const err96 = {instancePath:instancePath+"/build_settings/outputs/thermo_json",schemaPath:"settings.schema.json/properties/outputs/properties/thermo_json/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err96];
}
else {
vErrors.push(err96);
}
errors++;
}
}
if(data42.nasa7 !== undefined){
if(typeof data42.nasa7 !== "boolean"){
const err97 = {instancePath:instancePath+"/build_settings/outputs/nasa7",schemaPath:"settings.schema.json/properties/outputs/properties/nasa7/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err97];
}
else {
vErrors.push(err97);
}
errors++;
}
}
if(data42.tables !== undefined){
if(typeof data42.tables !== "boolean"){
const err98 = {instancePath:instancePath+"/build_settings/outputs/tables",schemaPath:"settings.schema.json/properties/outputs/properties/tables/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err98];
}
else {
vErrors.push(err98);
}
errors++;
}
}
if(data42.report !== undefined){
if(typeof data42.report !== "boolean"){
const err99 = {instancePath:instancePath+"/build_settings/outputs/report",schemaPath:"settings.schema.json/properties/outputs/properties/report/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err99];
}
else {
vErrors.push(err99);
}
errors++;
}
}
}
else {
const err100 = {instancePath:instancePath+"/build_settings/outputs",schemaPath:"settings.schema.json/properties/outputs/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err100];
}
else {
vErrors.push(err100);
}
errors++;
}
}
if(data10.tables !== undefined){
let data47 = data10.tables;
if(data47 && typeof data47 == "object" && !Array.isArray(data47)){
for(const key12 in data47){
if(!((((key12 === "from") || (key12 === "to")) || (key12 === "step")) || (key12 === "extra"))){
const err101 = {instancePath:instancePath+"/build_settings/tables",schemaPath:"settings.schema.json/properties/tables/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key12},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err101];
}
else {
vErrors.push(err101);
}
errors++;
}
}
if(data47.from !== undefined){
let data48 = data47.from;
if(typeof data48 == "number"){
if(data48 <= 0 || isNaN(data48)){
const err102 = {instancePath:instancePath+"/build_settings/tables/from",schemaPath:"settings.schema.json/properties/tables/properties/from/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err102];
}
else {
vErrors.push(err102);
}
errors++;
}
}
else {
const err103 = {instancePath:instancePath+"/build_settings/tables/from",schemaPath:"settings.schema.json/properties/tables/properties/from/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err103];
}
else {
vErrors.push(err103);
}
errors++;
}
}
if(data47.to !== undefined){
let data49 = data47.to;
if(typeof data49 == "number"){
if(data49 <= 0 || isNaN(data49)){
const err104 = {instancePath:instancePath+"/build_settings/tables/to",schemaPath:"settings.schema.json/properties/tables/properties/to/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err104];
}
else {
vErrors.push(err104);
}
errors++;
}
}
else {
const err105 = {instancePath:instancePath+"/build_settings/tables/to",schemaPath:"settings.schema.json/properties/tables/properties/to/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err105];
}
else {
vErrors.push(err105);
}
errors++;
}
}
if(data47.step !== undefined){
let data50 = data47.step;
if(typeof data50 == "number"){
if(data50 < 1 || isNaN(data50)){
const err106 = {instancePath:instancePath+"/build_settings/tables/step",schemaPath:"settings.schema.json/properties/tables/properties/step/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1"};
if(vErrors === null){
vErrors = [err106];
}
else {
vErrors.push(err106);
}
errors++;
}
}
else {
const err107 = {instancePath:instancePath+"/build_settings/tables/step",schemaPath:"settings.schema.json/properties/tables/properties/step/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err107];
}
else {
vErrors.push(err107);
}
errors++;
}
}
if(data47.extra !== undefined){
let data51 = data47.extra;
if(Array.isArray(data51)){
if(data51.length > 1000){
const err108 = {instancePath:instancePath+"/build_settings/tables/extra",schemaPath:"settings.schema.json/properties/tables/properties/extra/maxItems",keyword:"maxItems",params:{limit: 1000},message:"must NOT have more than 1000 items"};
if(vErrors === null){
vErrors = [err108];
}
else {
vErrors.push(err108);
}
errors++;
}
const len0 = data51.length;
for(let i0=0; i0<len0; i0++){
let data52 = data51[i0];
if(typeof data52 == "number"){
if(data52 <= 0 || isNaN(data52)){
const err109 = {instancePath:instancePath+"/build_settings/tables/extra/" + i0,schemaPath:"settings.schema.json/properties/tables/properties/extra/items/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err109];
}
else {
vErrors.push(err109);
}
errors++;
}
}
else {
const err110 = {instancePath:instancePath+"/build_settings/tables/extra/" + i0,schemaPath:"settings.schema.json/properties/tables/properties/extra/items/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err110];
}
else {
vErrors.push(err110);
}
errors++;
}
}
}
else {
const err111 = {instancePath:instancePath+"/build_settings/tables/extra",schemaPath:"settings.schema.json/properties/tables/properties/extra/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err111];
}
else {
vErrors.push(err111);
}
errors++;
}
}
}
else {
const err112 = {instancePath:instancePath+"/build_settings/tables",schemaPath:"settings.schema.json/properties/tables/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err112];
}
else {
vErrors.push(err112);
}
errors++;
}
}
if(data10.references !== undefined){
let data53 = data10.references;
if(data53 && typeof data53 == "object" && !Array.isArray(data53)){
for(const key13 in data53){
if(!(((key13 === "files") || (key13 === "tolerances")) || (key13 === "known_deviations"))){
const err113 = {instancePath:instancePath+"/build_settings/references",schemaPath:"settings.schema.json/properties/references/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key13},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err113];
}
else {
vErrors.push(err113);
}
errors++;
}
}
if(data53.files !== undefined){
let data54 = data53.files;
if(Array.isArray(data54)){
const len1 = data54.length;
for(let i1=0; i1<len1; i1++){
let data55 = data54[i1];
if(typeof data55 === "string"){
if(func1(data55) < 1){
const err114 = {instancePath:instancePath+"/build_settings/references/files/" + i1,schemaPath:"settings.schema.json/properties/references/properties/files/items/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters"};
if(vErrors === null){
vErrors = [err114];
}
else {
vErrors.push(err114);
}
errors++;
}
}
else {
const err115 = {instancePath:instancePath+"/build_settings/references/files/" + i1,schemaPath:"settings.schema.json/properties/references/properties/files/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err115];
}
else {
vErrors.push(err115);
}
errors++;
}
}
}
else {
const err116 = {instancePath:instancePath+"/build_settings/references/files",schemaPath:"settings.schema.json/properties/references/properties/files/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err116];
}
else {
vErrors.push(err116);
}
errors++;
}
}
if(data53.tolerances !== undefined){
let data56 = data53.tolerances;
if(data56 && typeof data56 == "object" && !Array.isArray(data56)){
for(const key14 in data56){
if(!(((key14 === "cp") || (key14 === "s")) || (key14 === "h"))){
const err117 = {instancePath:instancePath+"/build_settings/references/tolerances",schemaPath:"settings.schema.json/properties/references/properties/tolerances/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key14},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err117];
}
else {
vErrors.push(err117);
}
errors++;
}
}
if(data56.cp !== undefined){
let data57 = data56.cp;
if(typeof data57 == "number"){
if(data57 <= 0 || isNaN(data57)){
const err118 = {instancePath:instancePath+"/build_settings/references/tolerances/cp",schemaPath:"settings.schema.json/properties/references/properties/tolerances/properties/cp/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err118];
}
else {
vErrors.push(err118);
}
errors++;
}
}
else {
const err119 = {instancePath:instancePath+"/build_settings/references/tolerances/cp",schemaPath:"settings.schema.json/properties/references/properties/tolerances/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err119];
}
else {
vErrors.push(err119);
}
errors++;
}
}
if(data56.s !== undefined){
let data58 = data56.s;
if(typeof data58 == "number"){
if(data58 <= 0 || isNaN(data58)){
const err120 = {instancePath:instancePath+"/build_settings/references/tolerances/s",schemaPath:"settings.schema.json/properties/references/properties/tolerances/properties/s/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err120];
}
else {
vErrors.push(err120);
}
errors++;
}
}
else {
const err121 = {instancePath:instancePath+"/build_settings/references/tolerances/s",schemaPath:"settings.schema.json/properties/references/properties/tolerances/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err121];
}
else {
vErrors.push(err121);
}
errors++;
}
}
if(data56.h !== undefined){
let data59 = data56.h;
if(typeof data59 == "number"){
if(data59 <= 0 || isNaN(data59)){
const err122 = {instancePath:instancePath+"/build_settings/references/tolerances/h",schemaPath:"settings.schema.json/properties/references/properties/tolerances/properties/h/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err122];
}
else {
vErrors.push(err122);
}
errors++;
}
}
else {
const err123 = {instancePath:instancePath+"/build_settings/references/tolerances/h",schemaPath:"settings.schema.json/properties/references/properties/tolerances/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err123];
}
else {
vErrors.push(err123);
}
errors++;
}
}
}
else {
const err124 = {instancePath:instancePath+"/build_settings/references/tolerances",schemaPath:"settings.schema.json/properties/references/properties/tolerances/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err124];
}
else {
vErrors.push(err124);
}
errors++;
}
}
if(data53.known_deviations !== undefined){
let data60 = data53.known_deviations;
if(Array.isArray(data60)){
if(data60.length > 1000){
const err125 = {instancePath:instancePath+"/build_settings/references/known_deviations",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/maxItems",keyword:"maxItems",params:{limit: 1000},message:"must NOT have more than 1000 items"};
if(vErrors === null){
vErrors = [err125];
}
else {
vErrors.push(err125);
}
errors++;
}
const len2 = data60.length;
for(let i2=0; i2<len2; i2++){
let data61 = data60[i2];
if(data61 && typeof data61 == "object" && !Array.isArray(data61)){
if(data61.species === undefined){
const err126 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2,schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/required",keyword:"required",params:{missingProperty: "species"},message:"must have required property '"+"species"+"'"};
if(vErrors === null){
vErrors = [err126];
}
else {
vErrors.push(err126);
}
errors++;
}
if(data61.tolerances === undefined){
const err127 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2,schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/required",keyword:"required",params:{missingProperty: "tolerances"},message:"must have required property '"+"tolerances"+"'"};
if(vErrors === null){
vErrors = [err127];
}
else {
vErrors.push(err127);
}
errors++;
}
if(data61.reason === undefined){
const err128 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2,schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/required",keyword:"required",params:{missingProperty: "reason"},message:"must have required property '"+"reason"+"'"};
if(vErrors === null){
vErrors = [err128];
}
else {
vErrors.push(err128);
}
errors++;
}
for(const key15 in data61){
if(!(((((key15 === "species") || (key15 === "from")) || (key15 === "to")) || (key15 === "tolerances")) || (key15 === "reason"))){
const err129 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2,schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key15},message:"must NOT have additional properties"};
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
let data62 = data61.species;
if(typeof data62 === "string"){
if(func1(data62) < 1){
const err130 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/species",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/species/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters"};
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
const err131 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/species",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/species/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err131];
}
else {
vErrors.push(err131);
}
errors++;
}
}
if(data61.from !== undefined){
let data63 = data61.from;
if(typeof data63 == "number"){
if(data63 < 0 || isNaN(data63)){
const err132 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/from",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/from/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
const err133 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/from",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/from/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err133];
}
else {
vErrors.push(err133);
}
errors++;
}
}
if(data61.to !== undefined){
let data64 = data61.to;
if(typeof data64 == "number"){
if(data64 <= 0 || isNaN(data64)){
const err134 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/to",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/to/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err134];
}
else {
vErrors.push(err134);
}
errors++;
}
}
else {
const err135 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/to",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/to/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err135];
}
else {
vErrors.push(err135);
}
errors++;
}
}
if(data61.tolerances !== undefined){
let data65 = data61.tolerances;
if(data65 && typeof data65 == "object" && !Array.isArray(data65)){
if(Object.keys(data65).length < 1){
const err136 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/minProperties",keyword:"minProperties",params:{limit: 1},message:"must NOT have fewer than 1 properties"};
if(vErrors === null){
vErrors = [err136];
}
else {
vErrors.push(err136);
}
errors++;
}
for(const key16 in data65){
if(!(((key16 === "cp") || (key16 === "s")) || (key16 === "h"))){
const err137 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key16},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err137];
}
else {
vErrors.push(err137);
}
errors++;
}
}
if(data65.cp !== undefined){
let data66 = data65.cp;
if(typeof data66 == "number"){
if(data66 <= 0 || isNaN(data66)){
const err138 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances/cp",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/properties/cp/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err138];
}
else {
vErrors.push(err138);
}
errors++;
}
}
else {
const err139 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances/cp",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err139];
}
else {
vErrors.push(err139);
}
errors++;
}
}
if(data65.s !== undefined){
let data67 = data65.s;
if(typeof data67 == "number"){
if(data67 <= 0 || isNaN(data67)){
const err140 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances/s",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/properties/s/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err140];
}
else {
vErrors.push(err140);
}
errors++;
}
}
else {
const err141 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances/s",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err141];
}
else {
vErrors.push(err141);
}
errors++;
}
}
if(data65.h !== undefined){
let data68 = data65.h;
if(typeof data68 == "number"){
if(data68 <= 0 || isNaN(data68)){
const err142 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances/h",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/properties/h/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0"};
if(vErrors === null){
vErrors = [err142];
}
else {
vErrors.push(err142);
}
errors++;
}
}
else {
const err143 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances/h",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err143];
}
else {
vErrors.push(err143);
}
errors++;
}
}
}
else {
const err144 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/tolerances",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/tolerances/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err144];
}
else {
vErrors.push(err144);
}
errors++;
}
}
if(data61.reason !== undefined){
let data69 = data61.reason;
if(typeof data69 === "string"){
if(func1(data69) < 10){
const err145 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/reason",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/reason/minLength",keyword:"minLength",params:{limit: 10},message:"must NOT have fewer than 10 characters"};
if(vErrors === null){
vErrors = [err145];
}
else {
vErrors.push(err145);
}
errors++;
}
if(!pattern1.test(data69)){
const err146 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/reason",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/reason/pattern",keyword:"pattern",params:{pattern: "\\S"},message:"must match pattern \""+"\\S"+"\""};
if(vErrors === null){
vErrors = [err146];
}
else {
vErrors.push(err146);
}
errors++;
}
}
else {
const err147 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2+"/reason",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/properties/reason/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err147];
}
else {
vErrors.push(err147);
}
errors++;
}
}
}
else {
const err148 = {instancePath:instancePath+"/build_settings/references/known_deviations/" + i2,schemaPath:"settings.schema.json/properties/references/properties/known_deviations/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err148];
}
else {
vErrors.push(err148);
}
errors++;
}
}
}
else {
const err149 = {instancePath:instancePath+"/build_settings/references/known_deviations",schemaPath:"settings.schema.json/properties/references/properties/known_deviations/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err149];
}
else {
vErrors.push(err149);
}
errors++;
}
}
}
else {
const err150 = {instancePath:instancePath+"/build_settings/references",schemaPath:"settings.schema.json/properties/references/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err150];
}
else {
vErrors.push(err150);
}
errors++;
}
}
if(data10.strict !== undefined){
if(typeof data10.strict !== "boolean"){
const err151 = {instancePath:instancePath+"/build_settings/strict",schemaPath:"settings.schema.json/properties/strict/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err151];
}
else {
vErrors.push(err151);
}
errors++;
}
}
if(data10.accepted_warnings !== undefined){
let data71 = data10.accepted_warnings;
if(Array.isArray(data71)){
const len3 = data71.length;
for(let i3=0; i3<len3; i3++){
let data72 = data71[i3];
if(data72 && typeof data72 == "object" && !Array.isArray(data72)){
if(data72.code === undefined){
const err152 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3,schemaPath:"settings.schema.json/properties/accepted_warnings/items/required",keyword:"required",params:{missingProperty: "code"},message:"must have required property '"+"code"+"'"};
if(vErrors === null){
vErrors = [err152];
}
else {
vErrors.push(err152);
}
errors++;
}
if(data72.reason === undefined){
const err153 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3,schemaPath:"settings.schema.json/properties/accepted_warnings/items/required",keyword:"required",params:{missingProperty: "reason"},message:"must have required property '"+"reason"+"'"};
if(vErrors === null){
vErrors = [err153];
}
else {
vErrors.push(err153);
}
errors++;
}
for(const key17 in data72){
if(!(((key17 === "code") || (key17 === "species")) || (key17 === "reason"))){
const err154 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3,schemaPath:"settings.schema.json/properties/accepted_warnings/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key17},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err154];
}
else {
vErrors.push(err154);
}
errors++;
}
}
if(data72.code !== undefined){
let data73 = data72.code;
if(typeof data73 === "string"){
if(!pattern2.test(data73)){
const err155 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3+"/code",schemaPath:"settings.schema.json/properties/accepted_warnings/items/properties/code/pattern",keyword:"pattern",params:{pattern: "^[a-z0-9]+(-[a-z0-9]+)*$"},message:"must match pattern \""+"^[a-z0-9]+(-[a-z0-9]+)*$"+"\""};
if(vErrors === null){
vErrors = [err155];
}
else {
vErrors.push(err155);
}
errors++;
}
}
else {
const err156 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3+"/code",schemaPath:"settings.schema.json/properties/accepted_warnings/items/properties/code/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err156];
}
else {
vErrors.push(err156);
}
errors++;
}
}
if(data72.species !== undefined){
let data74 = data72.species;
if(typeof data74 === "string"){
if(func1(data74) < 1){
const err157 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3+"/species",schemaPath:"settings.schema.json/properties/accepted_warnings/items/properties/species/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters"};
if(vErrors === null){
vErrors = [err157];
}
else {
vErrors.push(err157);
}
errors++;
}
}
else {
const err158 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3+"/species",schemaPath:"settings.schema.json/properties/accepted_warnings/items/properties/species/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err158];
}
else {
vErrors.push(err158);
}
errors++;
}
}
if(data72.reason !== undefined){
let data75 = data72.reason;
if(typeof data75 === "string"){
if(func1(data75) < 10){
const err159 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3+"/reason",schemaPath:"settings.schema.json/properties/accepted_warnings/items/properties/reason/minLength",keyword:"minLength",params:{limit: 10},message:"must NOT have fewer than 10 characters"};
if(vErrors === null){
vErrors = [err159];
}
else {
vErrors.push(err159);
}
errors++;
}
}
else {
const err160 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3+"/reason",schemaPath:"settings.schema.json/properties/accepted_warnings/items/properties/reason/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err160];
}
else {
vErrors.push(err160);
}
errors++;
}
}
}
else {
const err161 = {instancePath:instancePath+"/build_settings/accepted_warnings/" + i3,schemaPath:"settings.schema.json/properties/accepted_warnings/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err161];
}
else {
vErrors.push(err161);
}
errors++;
}
}
}
else {
const err162 = {instancePath:instancePath+"/build_settings/accepted_warnings",schemaPath:"settings.schema.json/properties/accepted_warnings/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err162];
}
else {
vErrors.push(err162);
}
errors++;
}
}
}
else {
const err163 = {instancePath:instancePath+"/build_settings",schemaPath:"settings.schema.json/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err163];
}
else {
vErrors.push(err163);
}
errors++;
}
}
if(data.species !== undefined){
let data76 = data.species;
if(Array.isArray(data76)){
if(data76.length > 0){
const err164 = {instancePath:instancePath+"/species",schemaPath:"#/properties/species/maxItems",keyword:"maxItems",params:{limit: 0},message:"must NOT have more than 0 items"};
if(vErrors === null){
vErrors = [err164];
}
else {
vErrors.push(err164);
}
errors++;
}
}
else {
const err165 = {instancePath:instancePath+"/species",schemaPath:"#/properties/species/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err165];
}
else {
vErrors.push(err165);
}
errors++;
}
}
if(data.partial !== undefined){
let data77 = data.partial;
if(data77 && typeof data77 == "object" && !Array.isArray(data77)){
if(data77.partial === undefined){
const err166 = {instancePath:instancePath+"/partial",schemaPath:"#/properties/partial/required",keyword:"required",params:{missingProperty: "partial"},message:"must have required property '"+"partial"+"'"};
if(vErrors === null){
vErrors = [err166];
}
else {
vErrors.push(err166);
}
errors++;
}
if(data77.left_out === undefined){
const err167 = {instancePath:instancePath+"/partial",schemaPath:"#/properties/partial/required",keyword:"required",params:{missingProperty: "left_out"},message:"must have required property '"+"left_out"+"'"};
if(vErrors === null){
vErrors = [err167];
}
else {
vErrors.push(err167);
}
errors++;
}
if(data77.files_with_errors === undefined){
const err168 = {instancePath:instancePath+"/partial",schemaPath:"#/properties/partial/required",keyword:"required",params:{missingProperty: "files_with_errors"},message:"must have required property '"+"files_with_errors"+"'"};
if(vErrors === null){
vErrors = [err168];
}
else {
vErrors.push(err168);
}
errors++;
}
for(const key18 in data77){
if(!(((key18 === "partial") || (key18 === "left_out")) || (key18 === "files_with_errors"))){
const err169 = {instancePath:instancePath+"/partial",schemaPath:"#/properties/partial/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key18},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err169];
}
else {
vErrors.push(err169);
}
errors++;
}
}
if(data77.partial !== undefined){
if(true !== data77.partial){
const err170 = {instancePath:instancePath+"/partial/partial",schemaPath:"#/properties/partial/properties/partial/const",keyword:"const",params:{allowedValue: true},message:"must be equal to constant"};
if(vErrors === null){
vErrors = [err170];
}
else {
vErrors.push(err170);
}
errors++;
}
}
if(data77.left_out !== undefined){
let data79 = data77.left_out;
if(Array.isArray(data79)){
const len4 = data79.length;
for(let i4=0; i4<len4; i4++){
if(typeof data79[i4] !== "string"){
const err171 = {instancePath:instancePath+"/partial/left_out/" + i4,schemaPath:"#/properties/partial/properties/left_out/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err171];
}
else {
vErrors.push(err171);
}
errors++;
}
}
}
else {
const err172 = {instancePath:instancePath+"/partial/left_out",schemaPath:"#/properties/partial/properties/left_out/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err172];
}
else {
vErrors.push(err172);
}
errors++;
}
}
if(data77.files_with_errors !== undefined){
let data81 = data77.files_with_errors;
if(Array.isArray(data81)){
const len5 = data81.length;
for(let i5=0; i5<len5; i5++){
if(typeof data81[i5] !== "string"){
const err173 = {instancePath:instancePath+"/partial/files_with_errors/" + i5,schemaPath:"#/properties/partial/properties/files_with_errors/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err173];
}
else {
vErrors.push(err173);
}
errors++;
}
}
}
else {
const err174 = {instancePath:instancePath+"/partial/files_with_errors",schemaPath:"#/properties/partial/properties/files_with_errors/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err174];
}
else {
vErrors.push(err174);
}
errors++;
}
}
}
else {
const err175 = {instancePath:instancePath+"/partial",schemaPath:"#/properties/partial/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err175];
}
else {
vErrors.push(err175);
}
errors++;
}
}
}
else {
const err176 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err176];
}
else {
vErrors.push(err176);
}
errors++;
}
validate12.errors = vErrors;
return errors === 0;
}
validate12.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

export const validateSummaryEntry = validate13;
const schema19 = {"type":"object","additionalProperties":false,"required":["file","status","warnings","errors","cache","cache_hit","timings_ms"],"anyOf":[{"required":["name"]},{"required":["document"]}],"properties":{"name":{"type":"string","description":"Species name; absent only for a document without a usable name (then document says which one failed)."},"file":{"type":"string"},"document":{"type":"integer","minimum":1,"description":"1-based position of the species within its file; given for species that failed validation (they have no cache, timings or fit)."},"status":{"enum":["ok","failed"]},"warnings":{"type":"array","items":{"type":"string"}},"errors":{"type":"array","items":{"type":"string"}},"cache":{"type":"object","additionalProperties":false,"properties":{"samples":{"enum":["hit","miss","corrupt","off"]},"fit":{"enum":["hit","miss","corrupt","off"]},"table":{"enum":["hit","miss","corrupt","off"]},"result":{"enum":["hit","miss","corrupt","off"],"description":"The species' whole result (rendered outputs, diagnostics) from the no-change fast path; absent when the build did not look for it (no cache, or a report that needs the computed values)."}}},"cache_hit":{"type":"boolean","description":"True when nothing of this species was recomputed."},"fit_metrics":{"type":"object","description":"Largest errors over both ranges, dimensionless, and the midpoint used.","additionalProperties":false,"required":["max_abs_cp","max_abs_h","max_abs_s","t_mid"],"properties":{"max_abs_cp":{"type":"number"},"max_abs_h":{"type":"number"},"max_abs_s":{"type":"number"},"t_mid":{"type":"number"}}},"timings_ms":{"type":"object","additionalProperties":{"type":"number","minimum":0}}},"$id":"https://qforge.invalid/schemas/summary.schema.json-species"};

function validate13(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
/*# sourceURL="https://qforge.invalid/schemas/summary.schema.json-species" */;
let vErrors = null;
let errors = 0;
const evaluated0 = validate13.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
const _errs1 = errors;
let valid0 = false;
const _errs2 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.name === undefined){
const err0 = {instancePath,schemaPath:"#/anyOf/0/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'"};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
}
var _valid0 = _errs2 === errors;
valid0 = valid0 || _valid0;
const _errs3 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.document === undefined){
const err1 = {instancePath,schemaPath:"#/anyOf/1/required",keyword:"required",params:{missingProperty: "document"},message:"must have required property '"+"document"+"'"};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
var _valid0 = _errs3 === errors;
valid0 = valid0 || _valid0;
if(!valid0){
const err2 = {instancePath,schemaPath:"#/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf"};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
else {
errors = _errs1;
if(vErrors !== null){
if(_errs1){
vErrors.length = _errs1;
}
else {
vErrors = null;
}
}
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.file === undefined){
const err3 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "file"},message:"must have required property '"+"file"+"'"};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if(data.status === undefined){
const err4 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "status"},message:"must have required property '"+"status"+"'"};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if(data.warnings === undefined){
const err5 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "warnings"},message:"must have required property '"+"warnings"+"'"};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if(data.errors === undefined){
const err6 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "errors"},message:"must have required property '"+"errors"+"'"};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
if(data.cache === undefined){
const err7 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "cache"},message:"must have required property '"+"cache"+"'"};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
if(data.cache_hit === undefined){
const err8 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "cache_hit"},message:"must have required property '"+"cache_hit"+"'"};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
if(data.timings_ms === undefined){
const err9 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "timings_ms"},message:"must have required property '"+"timings_ms"+"'"};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
for(const key0 in data){
if(!(func0.call(schema19.properties, key0))){
const err10 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
if(data.name !== undefined){
if(typeof data.name !== "string"){
const err11 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
}
if(data.file !== undefined){
if(typeof data.file !== "string"){
const err12 = {instancePath:instancePath+"/file",schemaPath:"#/properties/file/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
if(data.document !== undefined){
let data2 = data.document;
if(!((typeof data2 == "number") && (!(data2 % 1) && !isNaN(data2)))){
const err13 = {instancePath:instancePath+"/document",schemaPath:"#/properties/document/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
if(typeof data2 == "number"){
if(data2 < 1 || isNaN(data2)){
const err14 = {instancePath:instancePath+"/document",schemaPath:"#/properties/document/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1"};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
}
if(data.status !== undefined){
let data3 = data.status;
if(!((data3 === "ok") || (data3 === "failed"))){
const err15 = {instancePath:instancePath+"/status",schemaPath:"#/properties/status/enum",keyword:"enum",params:{allowedValues: schema19.properties.status.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
if(data.warnings !== undefined){
let data4 = data.warnings;
if(Array.isArray(data4)){
const len0 = data4.length;
for(let i0=0; i0<len0; i0++){
if(typeof data4[i0] !== "string"){
const err16 = {instancePath:instancePath+"/warnings/" + i0,schemaPath:"#/properties/warnings/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
}
}
else {
const err17 = {instancePath:instancePath+"/warnings",schemaPath:"#/properties/warnings/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
if(data.errors !== undefined){
let data6 = data.errors;
if(Array.isArray(data6)){
const len1 = data6.length;
for(let i1=0; i1<len1; i1++){
if(typeof data6[i1] !== "string"){
const err18 = {instancePath:instancePath+"/errors/" + i1,schemaPath:"#/properties/errors/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
}
}
else {
const err19 = {instancePath:instancePath+"/errors",schemaPath:"#/properties/errors/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data.cache !== undefined){
let data8 = data.cache;
if(data8 && typeof data8 == "object" && !Array.isArray(data8)){
for(const key1 in data8){
if(!((((key1 === "samples") || (key1 === "fit")) || (key1 === "table")) || (key1 === "result"))){
const err20 = {instancePath:instancePath+"/cache",schemaPath:"#/properties/cache/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
if(data8.samples !== undefined){
let data9 = data8.samples;
if(!((((data9 === "hit") || (data9 === "miss")) || (data9 === "corrupt")) || (data9 === "off"))){
const err21 = {instancePath:instancePath+"/cache/samples",schemaPath:"#/properties/cache/properties/samples/enum",keyword:"enum",params:{allowedValues: schema19.properties.cache.properties.samples.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
if(data8.fit !== undefined){
let data10 = data8.fit;
if(!((((data10 === "hit") || (data10 === "miss")) || (data10 === "corrupt")) || (data10 === "off"))){
const err22 = {instancePath:instancePath+"/cache/fit",schemaPath:"#/properties/cache/properties/fit/enum",keyword:"enum",params:{allowedValues: schema19.properties.cache.properties.fit.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
if(data8.table !== undefined){
let data11 = data8.table;
if(!((((data11 === "hit") || (data11 === "miss")) || (data11 === "corrupt")) || (data11 === "off"))){
const err23 = {instancePath:instancePath+"/cache/table",schemaPath:"#/properties/cache/properties/table/enum",keyword:"enum",params:{allowedValues: schema19.properties.cache.properties.table.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
if(data8.result !== undefined){
let data12 = data8.result;
if(!((((data12 === "hit") || (data12 === "miss")) || (data12 === "corrupt")) || (data12 === "off"))){
const err24 = {instancePath:instancePath+"/cache/result",schemaPath:"#/properties/cache/properties/result/enum",keyword:"enum",params:{allowedValues: schema19.properties.cache.properties.result.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
}
}
else {
const err25 = {instancePath:instancePath+"/cache",schemaPath:"#/properties/cache/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
}
if(data.cache_hit !== undefined){
if(typeof data.cache_hit !== "boolean"){
const err26 = {instancePath:instancePath+"/cache_hit",schemaPath:"#/properties/cache_hit/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
if(data.fit_metrics !== undefined){
let data14 = data.fit_metrics;
if(data14 && typeof data14 == "object" && !Array.isArray(data14)){
if(data14.max_abs_cp === undefined){
const err27 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/required",keyword:"required",params:{missingProperty: "max_abs_cp"},message:"must have required property '"+"max_abs_cp"+"'"};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
if(data14.max_abs_h === undefined){
const err28 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/required",keyword:"required",params:{missingProperty: "max_abs_h"},message:"must have required property '"+"max_abs_h"+"'"};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
if(data14.max_abs_s === undefined){
const err29 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/required",keyword:"required",params:{missingProperty: "max_abs_s"},message:"must have required property '"+"max_abs_s"+"'"};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
if(data14.t_mid === undefined){
const err30 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/required",keyword:"required",params:{missingProperty: "t_mid"},message:"must have required property '"+"t_mid"+"'"};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
for(const key2 in data14){
if(!((((key2 === "max_abs_cp") || (key2 === "max_abs_h")) || (key2 === "max_abs_s")) || (key2 === "t_mid"))){
const err31 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
}
if(data14.max_abs_cp !== undefined){
if(!(typeof data14.max_abs_cp == "number")){
const err32 = {instancePath:instancePath+"/fit_metrics/max_abs_cp",schemaPath:"#/properties/fit_metrics/properties/max_abs_cp/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
}
if(data14.max_abs_h !== undefined){
if(!(typeof data14.max_abs_h == "number")){
const err33 = {instancePath:instancePath+"/fit_metrics/max_abs_h",schemaPath:"#/properties/fit_metrics/properties/max_abs_h/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
}
if(data14.max_abs_s !== undefined){
if(!(typeof data14.max_abs_s == "number")){
const err34 = {instancePath:instancePath+"/fit_metrics/max_abs_s",schemaPath:"#/properties/fit_metrics/properties/max_abs_s/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
}
if(data14.t_mid !== undefined){
if(!(typeof data14.t_mid == "number")){
const err35 = {instancePath:instancePath+"/fit_metrics/t_mid",schemaPath:"#/properties/fit_metrics/properties/t_mid/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
}
}
else {
const err36 = {instancePath:instancePath+"/fit_metrics",schemaPath:"#/properties/fit_metrics/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
if(data.timings_ms !== undefined){
let data19 = data.timings_ms;
if(data19 && typeof data19 == "object" && !Array.isArray(data19)){
for(const key3 in data19){
let data20 = data19[key3];
if(typeof data20 == "number"){
if(data20 < 0 || isNaN(data20)){
const err37 = {instancePath:instancePath+"/timings_ms/" + key3.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/properties/timings_ms/additionalProperties/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
}
else {
const err38 = {instancePath:instancePath+"/timings_ms/" + key3.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/properties/timings_ms/additionalProperties/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
}
}
else {
const err39 = {instancePath:instancePath+"/timings_ms",schemaPath:"#/properties/timings_ms/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
}
}
else {
const err40 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
validate13.errors = vErrors;
return errors === 0;
}
validate13.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

export const validateSummaryEnvelope = validate14;
const schema20 = {"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://qforge.invalid/schemas/summary.schema.json-envelope","title":"qforge build summary (summary.json)","description":"Report of one build: per species status, diagnostics, fit metrics, cache use and time per stage. Holds timings, so unlike thermo.json, nasa7.txt and tables/ it differs from run to run.","type":"object","additionalProperties":false,"required":["format","tool","database","status","written","counts","species","files","timings_ms"],"properties":{"format":{"const":"qforge-summary/1"},"tool":{"type":"object","additionalProperties":false,"required":["name","version"],"properties":{"name":{"const":"qforge"},"version":{"type":"string"}}},"code_fingerprint":{"type":"string","pattern":"^sha256:[0-9a-f]{64}$","description":"sha256 of the code that computed the numbers (src/ and pipeline/ module files), as mixed into every cache key; `qforge diff` reports a code or model change when it differs. Absent in summaries written before it was recorded."},"database":{"type":"string","description":"Database folder as given."},"status":{"enum":["ok","failed","partial"],"description":"partial: --keep-going wrote the good species only."},"written":{"type":"boolean","description":"Whether the outputs were written."},"outputs":{"type":"array","items":{"type":"string"}},"counts":{"type":"object","additionalProperties":false,"required":["species","ok","failed","cache_hits","files","files_failed"],"properties":{"species":{"type":"integer","minimum":0},"ok":{"type":"integer","minimum":0},"failed":{"type":"integer","minimum":0},"cache_hits":{"type":"integer","minimum":0},"files":{"type":"integer","minimum":0},"files_failed":{"type":"integer","minimum":0}}},"warnings":{"type":"array","items":{"type":"string"},"description":"Build-level warnings also printed on stderr: a cache that cannot be written (once), rejected cache entries (one per species and stage)."},"settings_diagnostics":{"type":"array","items":{"type":"string"}},"species":{"type":"array","maxItems":0},"files":{"type":"array","description":"Input files with problems not tied to one species (YAML syntax, limits, …).","items":{"type":"object","additionalProperties":false,"required":["file","errors","warnings"],"properties":{"file":{"type":"string"},"errors":{"type":"array","items":{"type":"string"}},"warnings":{"type":"array","items":{"type":"string"}}}}},"timings_ms":{"type":"object","additionalProperties":{"type":"number","minimum":0}},"reference_files":{"description":"The settings' references.files, each relative to the build folder (posix separators); qforge compare BUILD with no flags reads them.","type":"array","items":{"type":"string"}},"shard":{"description":"Present when the build was one shard (--shard I/N) of the database; qforge merge checks the shards against it.","type":"object","additionalProperties":false,"required":["index","count","database_species","database_names_sha256"],"properties":{"index":{"type":"integer","minimum":1},"count":{"type":"integer","minimum":1},"database_species":{"type":"integer","minimum":0},"database_names_sha256":{"type":"string","pattern":"^[0-9a-f]{64}$"}}}}};
const pattern9 = new RegExp("^[0-9a-f]{64}$", "u");

function validate14(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
/*# sourceURL="https://qforge.invalid/schemas/summary.schema.json-envelope" */;
let vErrors = null;
let errors = 0;
const evaluated0 = validate14.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.format === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "format"},message:"must have required property '"+"format"+"'"};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.tool === undefined){
const err1 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "tool"},message:"must have required property '"+"tool"+"'"};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(data.database === undefined){
const err2 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "database"},message:"must have required property '"+"database"+"'"};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data.status === undefined){
const err3 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "status"},message:"must have required property '"+"status"+"'"};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if(data.written === undefined){
const err4 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "written"},message:"must have required property '"+"written"+"'"};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if(data.counts === undefined){
const err5 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "counts"},message:"must have required property '"+"counts"+"'"};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if(data.species === undefined){
const err6 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "species"},message:"must have required property '"+"species"+"'"};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
if(data.files === undefined){
const err7 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "files"},message:"must have required property '"+"files"+"'"};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
if(data.timings_ms === undefined){
const err8 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "timings_ms"},message:"must have required property '"+"timings_ms"+"'"};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
for(const key0 in data){
if(!(func0.call(schema20.properties, key0))){
const err9 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
if(data.format !== undefined){
if("qforge-summary/1" !== data.format){
const err10 = {instancePath:instancePath+"/format",schemaPath:"#/properties/format/const",keyword:"const",params:{allowedValue: "qforge-summary/1"},message:"must be equal to constant"};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
if(data.tool !== undefined){
let data1 = data.tool;
if(data1 && typeof data1 == "object" && !Array.isArray(data1)){
if(data1.name === undefined){
const err11 = {instancePath:instancePath+"/tool",schemaPath:"#/properties/tool/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'"};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
if(data1.version === undefined){
const err12 = {instancePath:instancePath+"/tool",schemaPath:"#/properties/tool/required",keyword:"required",params:{missingProperty: "version"},message:"must have required property '"+"version"+"'"};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
for(const key1 in data1){
if(!((key1 === "name") || (key1 === "version"))){
const err13 = {instancePath:instancePath+"/tool",schemaPath:"#/properties/tool/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
if(data1.name !== undefined){
if("qforge" !== data1.name){
const err14 = {instancePath:instancePath+"/tool/name",schemaPath:"#/properties/tool/properties/name/const",keyword:"const",params:{allowedValue: "qforge"},message:"must be equal to constant"};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
if(data1.version !== undefined){
if(typeof data1.version !== "string"){
const err15 = {instancePath:instancePath+"/tool/version",schemaPath:"#/properties/tool/properties/version/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
}
else {
const err16 = {instancePath:instancePath+"/tool",schemaPath:"#/properties/tool/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
}
if(data.code_fingerprint !== undefined){
let data4 = data.code_fingerprint;
if(typeof data4 === "string"){
if(!pattern3.test(data4)){
const err17 = {instancePath:instancePath+"/code_fingerprint",schemaPath:"#/properties/code_fingerprint/pattern",keyword:"pattern",params:{pattern: "^sha256:[0-9a-f]{64}$"},message:"must match pattern \""+"^sha256:[0-9a-f]{64}$"+"\""};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
else {
const err18 = {instancePath:instancePath+"/code_fingerprint",schemaPath:"#/properties/code_fingerprint/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
}
if(data.database !== undefined){
if(typeof data.database !== "string"){
const err19 = {instancePath:instancePath+"/database",schemaPath:"#/properties/database/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data.status !== undefined){
let data6 = data.status;
if(!(((data6 === "ok") || (data6 === "failed")) || (data6 === "partial"))){
const err20 = {instancePath:instancePath+"/status",schemaPath:"#/properties/status/enum",keyword:"enum",params:{allowedValues: schema20.properties.status.enum},message:"must be equal to one of the allowed values"};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
if(data.written !== undefined){
if(typeof data.written !== "boolean"){
const err21 = {instancePath:instancePath+"/written",schemaPath:"#/properties/written/type",keyword:"type",params:{type: "boolean"},message:"must be boolean"};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
if(data.outputs !== undefined){
let data8 = data.outputs;
if(Array.isArray(data8)){
const len0 = data8.length;
for(let i0=0; i0<len0; i0++){
if(typeof data8[i0] !== "string"){
const err22 = {instancePath:instancePath+"/outputs/" + i0,schemaPath:"#/properties/outputs/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
}
else {
const err23 = {instancePath:instancePath+"/outputs",schemaPath:"#/properties/outputs/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
if(data.counts !== undefined){
let data10 = data.counts;
if(data10 && typeof data10 == "object" && !Array.isArray(data10)){
if(data10.species === undefined){
const err24 = {instancePath:instancePath+"/counts",schemaPath:"#/properties/counts/required",keyword:"required",params:{missingProperty: "species"},message:"must have required property '"+"species"+"'"};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
if(data10.ok === undefined){
const err25 = {instancePath:instancePath+"/counts",schemaPath:"#/properties/counts/required",keyword:"required",params:{missingProperty: "ok"},message:"must have required property '"+"ok"+"'"};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
if(data10.failed === undefined){
const err26 = {instancePath:instancePath+"/counts",schemaPath:"#/properties/counts/required",keyword:"required",params:{missingProperty: "failed"},message:"must have required property '"+"failed"+"'"};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
if(data10.cache_hits === undefined){
const err27 = {instancePath:instancePath+"/counts",schemaPath:"#/properties/counts/required",keyword:"required",params:{missingProperty: "cache_hits"},message:"must have required property '"+"cache_hits"+"'"};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
if(data10.files === undefined){
const err28 = {instancePath:instancePath+"/counts",schemaPath:"#/properties/counts/required",keyword:"required",params:{missingProperty: "files"},message:"must have required property '"+"files"+"'"};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
if(data10.files_failed === undefined){
const err29 = {instancePath:instancePath+"/counts",schemaPath:"#/properties/counts/required",keyword:"required",params:{missingProperty: "files_failed"},message:"must have required property '"+"files_failed"+"'"};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
for(const key2 in data10){
if(!((((((key2 === "species") || (key2 === "ok")) || (key2 === "failed")) || (key2 === "cache_hits")) || (key2 === "files")) || (key2 === "files_failed"))){
const err30 = {instancePath:instancePath+"/counts",schemaPath:"#/properties/counts/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
if(data10.species !== undefined){
let data11 = data10.species;
if(!((typeof data11 == "number") && (!(data11 % 1) && !isNaN(data11)))){
const err31 = {instancePath:instancePath+"/counts/species",schemaPath:"#/properties/counts/properties/species/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
if(typeof data11 == "number"){
if(data11 < 0 || isNaN(data11)){
const err32 = {instancePath:instancePath+"/counts/species",schemaPath:"#/properties/counts/properties/species/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
}
}
if(data10.ok !== undefined){
let data12 = data10.ok;
if(!((typeof data12 == "number") && (!(data12 % 1) && !isNaN(data12)))){
const err33 = {instancePath:instancePath+"/counts/ok",schemaPath:"#/properties/counts/properties/ok/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
if(typeof data12 == "number"){
if(data12 < 0 || isNaN(data12)){
const err34 = {instancePath:instancePath+"/counts/ok",schemaPath:"#/properties/counts/properties/ok/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
}
}
if(data10.failed !== undefined){
let data13 = data10.failed;
if(!((typeof data13 == "number") && (!(data13 % 1) && !isNaN(data13)))){
const err35 = {instancePath:instancePath+"/counts/failed",schemaPath:"#/properties/counts/properties/failed/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
if(typeof data13 == "number"){
if(data13 < 0 || isNaN(data13)){
const err36 = {instancePath:instancePath+"/counts/failed",schemaPath:"#/properties/counts/properties/failed/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
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
if(data10.cache_hits !== undefined){
let data14 = data10.cache_hits;
if(!((typeof data14 == "number") && (!(data14 % 1) && !isNaN(data14)))){
const err37 = {instancePath:instancePath+"/counts/cache_hits",schemaPath:"#/properties/counts/properties/cache_hits/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
if(typeof data14 == "number"){
if(data14 < 0 || isNaN(data14)){
const err38 = {instancePath:instancePath+"/counts/cache_hits",schemaPath:"#/properties/counts/properties/cache_hits/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
}
}
if(data10.files !== undefined){
let data15 = data10.files;
if(!((typeof data15 == "number") && (!(data15 % 1) && !isNaN(data15)))){
const err39 = {instancePath:instancePath+"/counts/files",schemaPath:"#/properties/counts/properties/files/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
if(typeof data15 == "number"){
if(data15 < 0 || isNaN(data15)){
const err40 = {instancePath:instancePath+"/counts/files",schemaPath:"#/properties/counts/properties/files/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
}
}
if(data10.files_failed !== undefined){
let data16 = data10.files_failed;
if(!((typeof data16 == "number") && (!(data16 % 1) && !isNaN(data16)))){
const err41 = {instancePath:instancePath+"/counts/files_failed",schemaPath:"#/properties/counts/properties/files_failed/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
if(typeof data16 == "number"){
if(data16 < 0 || isNaN(data16)){
const err42 = {instancePath:instancePath+"/counts/files_failed",schemaPath:"#/properties/counts/properties/files_failed/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
}
}
}
else {
const err43 = {instancePath:instancePath+"/counts",schemaPath:"#/properties/counts/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
}
if(data.warnings !== undefined){
let data17 = data.warnings;
if(Array.isArray(data17)){
const len1 = data17.length;
for(let i1=0; i1<len1; i1++){
if(typeof data17[i1] !== "string"){
const err44 = {instancePath:instancePath+"/warnings/" + i1,schemaPath:"#/properties/warnings/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
}
}
else {
const err45 = {instancePath:instancePath+"/warnings",schemaPath:"#/properties/warnings/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
}
if(data.settings_diagnostics !== undefined){
let data19 = data.settings_diagnostics;
if(Array.isArray(data19)){
const len2 = data19.length;
for(let i2=0; i2<len2; i2++){
if(typeof data19[i2] !== "string"){
const err46 = {instancePath:instancePath+"/settings_diagnostics/" + i2,schemaPath:"#/properties/settings_diagnostics/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
}
}
else {
const err47 = {instancePath:instancePath+"/settings_diagnostics",schemaPath:"#/properties/settings_diagnostics/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err47];
}
else {
vErrors.push(err47);
}
errors++;
}
}
if(data.species !== undefined){
let data21 = data.species;
if(Array.isArray(data21)){
if(data21.length > 0){
const err48 = {instancePath:instancePath+"/species",schemaPath:"#/properties/species/maxItems",keyword:"maxItems",params:{limit: 0},message:"must NOT have more than 0 items"};
if(vErrors === null){
vErrors = [err48];
}
else {
vErrors.push(err48);
}
errors++;
}
}
else {
const err49 = {instancePath:instancePath+"/species",schemaPath:"#/properties/species/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
}
if(data.files !== undefined){
let data22 = data.files;
if(Array.isArray(data22)){
const len3 = data22.length;
for(let i3=0; i3<len3; i3++){
let data23 = data22[i3];
if(data23 && typeof data23 == "object" && !Array.isArray(data23)){
if(data23.file === undefined){
const err50 = {instancePath:instancePath+"/files/" + i3,schemaPath:"#/properties/files/items/required",keyword:"required",params:{missingProperty: "file"},message:"must have required property '"+"file"+"'"};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
if(data23.errors === undefined){
const err51 = {instancePath:instancePath+"/files/" + i3,schemaPath:"#/properties/files/items/required",keyword:"required",params:{missingProperty: "errors"},message:"must have required property '"+"errors"+"'"};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
if(data23.warnings === undefined){
const err52 = {instancePath:instancePath+"/files/" + i3,schemaPath:"#/properties/files/items/required",keyword:"required",params:{missingProperty: "warnings"},message:"must have required property '"+"warnings"+"'"};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
for(const key3 in data23){
if(!(((key3 === "file") || (key3 === "errors")) || (key3 === "warnings"))){
const err53 = {instancePath:instancePath+"/files/" + i3,schemaPath:"#/properties/files/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
}
if(data23.file !== undefined){
if(typeof data23.file !== "string"){
const err54 = {instancePath:instancePath+"/files/" + i3+"/file",schemaPath:"#/properties/files/items/properties/file/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
}
if(data23.errors !== undefined){
let data25 = data23.errors;
if(Array.isArray(data25)){
const len4 = data25.length;
for(let i4=0; i4<len4; i4++){
if(typeof data25[i4] !== "string"){
const err55 = {instancePath:instancePath+"/files/" + i3+"/errors/" + i4,schemaPath:"#/properties/files/items/properties/errors/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err55];
}
else {
vErrors.push(err55);
}
errors++;
}
}
}
else {
const err56 = {instancePath:instancePath+"/files/" + i3+"/errors",schemaPath:"#/properties/files/items/properties/errors/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
}
if(data23.warnings !== undefined){
let data27 = data23.warnings;
if(Array.isArray(data27)){
const len5 = data27.length;
for(let i5=0; i5<len5; i5++){
if(typeof data27[i5] !== "string"){
const err57 = {instancePath:instancePath+"/files/" + i3+"/warnings/" + i5,schemaPath:"#/properties/files/items/properties/warnings/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
}
}
else {
const err58 = {instancePath:instancePath+"/files/" + i3+"/warnings",schemaPath:"#/properties/files/items/properties/warnings/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
}
}
else {
const err59 = {instancePath:instancePath+"/files/" + i3,schemaPath:"#/properties/files/items/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
}
}
else {
const err60 = {instancePath:instancePath+"/files",schemaPath:"#/properties/files/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err60];
}
else {
vErrors.push(err60);
}
errors++;
}
}
if(data.timings_ms !== undefined){
let data29 = data.timings_ms;
if(data29 && typeof data29 == "object" && !Array.isArray(data29)){
for(const key4 in data29){
let data30 = data29[key4];
if(typeof data30 == "number"){
if(data30 < 0 || isNaN(data30)){
const err61 = {instancePath:instancePath+"/timings_ms/" + key4.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/properties/timings_ms/additionalProperties/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
}
else {
const err62 = {instancePath:instancePath+"/timings_ms/" + key4.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/properties/timings_ms/additionalProperties/type",keyword:"type",params:{type: "number"},message:"must be number"};
if(vErrors === null){
vErrors = [err62];
}
else {
vErrors.push(err62);
}
errors++;
}
}
}
else {
const err63 = {instancePath:instancePath+"/timings_ms",schemaPath:"#/properties/timings_ms/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
}
if(data.reference_files !== undefined){
let data31 = data.reference_files;
if(Array.isArray(data31)){
const len6 = data31.length;
for(let i6=0; i6<len6; i6++){
if(typeof data31[i6] !== "string"){
const err64 = {instancePath:instancePath+"/reference_files/" + i6,schemaPath:"#/properties/reference_files/items/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
}
}
else {
const err65 = {instancePath:instancePath+"/reference_files",schemaPath:"#/properties/reference_files/type",keyword:"type",params:{type: "array"},message:"must be array"};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
}
if(data.shard !== undefined){
let data33 = data.shard;
if(data33 && typeof data33 == "object" && !Array.isArray(data33)){
if(data33.index === undefined){
const err66 = {instancePath:instancePath+"/shard",schemaPath:"#/properties/shard/required",keyword:"required",params:{missingProperty: "index"},message:"must have required property '"+"index"+"'"};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
if(data33.count === undefined){
const err67 = {instancePath:instancePath+"/shard",schemaPath:"#/properties/shard/required",keyword:"required",params:{missingProperty: "count"},message:"must have required property '"+"count"+"'"};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
if(data33.database_species === undefined){
const err68 = {instancePath:instancePath+"/shard",schemaPath:"#/properties/shard/required",keyword:"required",params:{missingProperty: "database_species"},message:"must have required property '"+"database_species"+"'"};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
if(data33.database_names_sha256 === undefined){
const err69 = {instancePath:instancePath+"/shard",schemaPath:"#/properties/shard/required",keyword:"required",params:{missingProperty: "database_names_sha256"},message:"must have required property '"+"database_names_sha256"+"'"};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
for(const key5 in data33){
if(!((((key5 === "index") || (key5 === "count")) || (key5 === "database_species")) || (key5 === "database_names_sha256"))){
const err70 = {instancePath:instancePath+"/shard",schemaPath:"#/properties/shard/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key5},message:"must NOT have additional properties"};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
}
if(data33.index !== undefined){
let data34 = data33.index;
if(!((typeof data34 == "number") && (!(data34 % 1) && !isNaN(data34)))){
const err71 = {instancePath:instancePath+"/shard/index",schemaPath:"#/properties/shard/properties/index/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
if(typeof data34 == "number"){
if(data34 < 1 || isNaN(data34)){
const err72 = {instancePath:instancePath+"/shard/index",schemaPath:"#/properties/shard/properties/index/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1"};
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
if(data33.count !== undefined){
let data35 = data33.count;
if(!((typeof data35 == "number") && (!(data35 % 1) && !isNaN(data35)))){
const err73 = {instancePath:instancePath+"/shard/count",schemaPath:"#/properties/shard/properties/count/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
if(typeof data35 == "number"){
if(data35 < 1 || isNaN(data35)){
const err74 = {instancePath:instancePath+"/shard/count",schemaPath:"#/properties/shard/properties/count/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1"};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
}
}
if(data33.database_species !== undefined){
let data36 = data33.database_species;
if(!((typeof data36 == "number") && (!(data36 % 1) && !isNaN(data36)))){
const err75 = {instancePath:instancePath+"/shard/database_species",schemaPath:"#/properties/shard/properties/database_species/type",keyword:"type",params:{type: "integer"},message:"must be integer"};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
if(typeof data36 == "number"){
if(data36 < 0 || isNaN(data36)){
const err76 = {instancePath:instancePath+"/shard/database_species",schemaPath:"#/properties/shard/properties/database_species/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0"};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
}
}
if(data33.database_names_sha256 !== undefined){
let data37 = data33.database_names_sha256;
if(typeof data37 === "string"){
if(!pattern9.test(data37)){
const err77 = {instancePath:instancePath+"/shard/database_names_sha256",schemaPath:"#/properties/shard/properties/database_names_sha256/pattern",keyword:"pattern",params:{pattern: "^[0-9a-f]{64}$"},message:"must match pattern \""+"^[0-9a-f]{64}$"+"\""};
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
const err78 = {instancePath:instancePath+"/shard/database_names_sha256",schemaPath:"#/properties/shard/properties/database_names_sha256/type",keyword:"type",params:{type: "string"},message:"must be string"};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
}
}
else {
const err79 = {instancePath:instancePath+"/shard",schemaPath:"#/properties/shard/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
}
}
else {
const err80 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object"};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
validate14.errors = vErrors;
return errors === 0;
}
validate14.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

