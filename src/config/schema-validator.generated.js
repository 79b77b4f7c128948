// GENERATED FILE, do not edit. The validator of src/config/bellgate.schema.json, written by ajv
// standalone code generation (options: allErrors, verbose, strict, inlineRefs: false).
// Regenerate after changing the schema: npm run gen:config-validator
// (= node test/gen-config-validator.mjs); test/config/validator-fresh.test.ts fails while it is stale.
/* eslint-disable */
export const validate = validate21;
export default validate21;
const schema6 = {"$schema":"http://json-schema.org/draft-07/schema#","title":"Bellgate configuration (.github/bellgate.yml)","description":"All keys are optional. Rules under metrics apply in order; a later match overrides an earlier one.","type":["object","null"],"additionalProperties":false,"properties":{"defaults":{"$ref":"#/definitions/settings"},"metrics":{"description":"Rules over metric names, applied in order.","type":["array","null"],"items":{"$ref":"#/definitions/rule"}},"groups":{"description":"Metrics that share a move of their own (instead of the timings' shared move): each member is judged on its own move beside the others'.","type":["array","null"],"items":{"$ref":"#/definitions/group"}},"family":{"description":"Control of the false alarms across the metrics of a run: holm (default) holds the chance of any false alarm in a run at the budget; none judges each metric by its cutoff.","enum":["none","bonferroni","holm","fdr"],"default":"holm","examples":["none"]},"budget":{"description":"The chance of any false alarm in a run that family control holds to, as a percent.","type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","default":"1%","examples":["1%"]},"unsettled":{"description":"What a run whose shared move is beyond what the history has shown does: pass (reported, asks for a re-run) or block (fails like a regression).","enum":["pass","block"],"default":"pass","examples":["block"]},"keep":{"description":"Newest runs kept in the history; trimming is the only deletion.","type":"integer","minimum":1,"default":500,"examples":[500]},"input-format":{"description":"Force the metric file format instead of detecting it from content.","enum":["json","jsonl","csv","openmetrics","gobench","junit"],"examples":["json"]},"limits":{"$ref":"#/definitions/limits"}},"definitions":{"settings":{"description":"Settings for every metric, before rules apply.","type":["object","null"],"additionalProperties":false,"properties":{"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"default":0.01,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"default":"higher","examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","default":"1%","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"default":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"default":60,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"default":8,"examples":[8]},"transform":{"description":"Scale the metric is judged on: auto (the log scale for metrics with a time unit, none for the rest), none or log.","enum":["auto","none","log"],"default":"auto","examples":["log"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"default":"median","examples":["min"]},"change-points":{"description":"Restart the baseline at a detected change of the metric's own level that lasts (a regime that comes and goes is not one).","type":"boolean","default":true,"examples":[false]},"shared-move":{"description":"A timing takes part in the run's shared move of the timings, and is judged on its own move beside it.","type":"boolean","default":true,"examples":[false]}}},"rule":{"type":"object","additionalProperties":false,"required":["match"],"properties":{"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["size/**"]},"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"examples":[8]},"transform":{"description":"Scale the metric is judged on: auto (the log scale for metrics with a time unit, none for the rest), none or log.","enum":["auto","none","log"],"examples":["log"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"examples":["min"]},"change-points":{"description":"Restart the baseline at a detected change of the metric's own level that lasts (a regime that comes and goes is not one).","type":"boolean","examples":[false]},"shared-move":{"description":"A timing takes part in the run's shared move of the timings, and is judged on its own move beside it.","type":"boolean","examples":[false]},"ignore":{"description":"Report matching metrics as ignored and never judge them.","type":"boolean","examples":[true]},"relative-to":{"description":"A metric of the same run (a calibration benchmark) whose move is the shared move of the matching metrics: they are judged on their own move beside it.","type":"string","minLength":1,"examples":["latency/calibrate"]}}},"group":{"type":"object","additionalProperties":false,"required":["name"],"properties":{"name":{"description":"Name of the group, unique in the file.","type":"string","minLength":1,"maxLength":200,"examples":["latency"]},"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"Members of the group (default: the name followed by /**). a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["latency/*"]}}},"limits":{"description":"Size limits for metric files.","type":["object","null"],"additionalProperties":false,"properties":{"max-file-bytes":{"description":"Largest metric file read, in bytes.","type":"integer","minimum":1,"default":67108864,"examples":[67108864]},"max-line-length":{"description":"Longest line in a metric file, in characters.","type":"integer","minimum":1,"default":1048576,"examples":[1048576]},"max-metrics":{"description":"Most metrics in one run.","type":"integer","minimum":1,"default":100000,"examples":[100000]}}}}};
const func2 = Object.prototype.hasOwnProperty;
const schema7 = {"description":"Settings for every metric, before rules apply.","type":["object","null"],"additionalProperties":false,"properties":{"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"default":0.01,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"default":"higher","examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","default":"1%","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"default":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"default":60,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"default":8,"examples":[8]},"transform":{"description":"Scale the metric is judged on: auto (the log scale for metrics with a time unit, none for the rest), none or log.","enum":["auto","none","log"],"default":"auto","examples":["log"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"default":"median","examples":["min"]},"change-points":{"description":"Restart the baseline at a detected change of the metric's own level that lasts (a regime that comes and goes is not one).","type":"boolean","default":true,"examples":[false]},"shared-move":{"description":"A timing takes part in the run's shared move of the timings, and is judged on its own move beside it.","type":"boolean","default":true,"examples":[false]}}};
const pattern0 = new RegExp("^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$", "u");

function validate22(data, {instancePath="", parentData, parentDataProperty, rootData=data}={}){
let vErrors = null;
let errors = 0;
if((!(data && typeof data == "object" && !Array.isArray(data))) && (data !== null)){
const err0 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: schema7.type},message:"must be object,null",schema:schema7.type,parentSchema:schema7,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data && typeof data == "object" && !Array.isArray(data)){
for(const key0 in data){
if(!(func2.call(schema7.properties, key0))){
const err1 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema7,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
if(data.cutoff !== undefined){
let data0 = data.cutoff;
if((typeof data0 == "number") && (isFinite(data0))){
if(data0 >= 1 || isNaN(data0)){
const err2 = {instancePath:instancePath+"/cutoff",schemaPath:"#/properties/cutoff/exclusiveMaximum",keyword:"exclusiveMaximum",params:{comparison: "<", limit: 1},message:"must be < 1",schema:1,parentSchema:schema7.properties.cutoff,data:data0};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data0 <= 0 || isNaN(data0)){
const err3 = {instancePath:instancePath+"/cutoff",schemaPath:"#/properties/cutoff/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema7.properties.cutoff,data:data0};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
}
else {
const err4 = {instancePath:instancePath+"/cutoff",schemaPath:"#/properties/cutoff/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema7.properties.cutoff.type,parentSchema:schema7.properties.cutoff,data:data0};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
if(data.worse !== undefined){
let data1 = data.worse;
if(!(((data1 === "higher") || (data1 === "lower")) || (data1 === "both"))){
const err5 = {instancePath:instancePath+"/worse",schemaPath:"#/properties/worse/enum",keyword:"enum",params:{allowedValues: schema7.properties.worse.enum},message:"must be equal to one of the allowed values",schema:schema7.properties.worse.enum,parentSchema:schema7.properties.worse,data:data1};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
if(data.tolerance !== undefined){
let data2 = data.tolerance;
const _errs6 = errors;
let valid1 = false;
const _errs7 = errors;
if((typeof data2 == "number") && (isFinite(data2))){
if(data2 < 0 || isNaN(data2)){
const err6 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf/0/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema7.properties.tolerance.anyOf[0],data:data2};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
else {
const err7 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf/0/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema7.properties.tolerance.anyOf[0].type,parentSchema:schema7.properties.tolerance.anyOf[0],data:data2};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
var _valid0 = _errs7 === errors;
valid1 = valid1 || _valid0;
if(!valid1){
const _errs9 = errors;
if(typeof data2 === "string"){
if(!pattern0.test(data2)){
const err8 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf/1/pattern",keyword:"pattern",params:{pattern: "^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"},message:"must match pattern \""+"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"+"\"",schema:"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$",parentSchema:schema7.properties.tolerance.anyOf[1],data:data2};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
}
else {
const err9 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf/1/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema7.properties.tolerance.anyOf[1].type,parentSchema:schema7.properties.tolerance.anyOf[1],data:data2};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
var _valid0 = _errs9 === errors;
valid1 = valid1 || _valid0;
}
if(!valid1){
const err10 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema7.properties.tolerance.anyOf,parentSchema:schema7.properties.tolerance,data:data2};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
else {
errors = _errs6;
if(vErrors !== null){
if(_errs6){
vErrors.length = _errs6;
}
else {
vErrors = null;
}
}
}
}
if(data.resolution !== undefined){
let data3 = data.resolution;
if((typeof data3 == "number") && (isFinite(data3))){
if(data3 < 0 || isNaN(data3)){
const err11 = {instancePath:instancePath+"/resolution",schemaPath:"#/properties/resolution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema7.properties.resolution,data:data3};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
}
else {
const err12 = {instancePath:instancePath+"/resolution",schemaPath:"#/properties/resolution/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema7.properties.resolution.type,parentSchema:schema7.properties.resolution,data:data3};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
if(data.window !== undefined){
let data4 = data.window;
if(!(((typeof data4 == "number") && (!(data4 % 1) && !isNaN(data4))) && (isFinite(data4)))){
const err13 = {instancePath:instancePath+"/window",schemaPath:"#/properties/window/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema7.properties.window.type,parentSchema:schema7.properties.window,data:data4};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
if((typeof data4 == "number") && (isFinite(data4))){
if(data4 < 2 || isNaN(data4)){
const err14 = {instancePath:instancePath+"/window",schemaPath:"#/properties/window/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema7.properties.window,data:data4};
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
if(data["min-runs"] !== undefined){
let data5 = data["min-runs"];
if(!(((typeof data5 == "number") && (!(data5 % 1) && !isNaN(data5))) && (isFinite(data5)))){
const err15 = {instancePath:instancePath+"/min-runs",schemaPath:"#/properties/min-runs/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema7.properties["min-runs"].type,parentSchema:schema7.properties["min-runs"],data:data5};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
if((typeof data5 == "number") && (isFinite(data5))){
if(data5 < 2 || isNaN(data5)){
const err16 = {instancePath:instancePath+"/min-runs",schemaPath:"#/properties/min-runs/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema7.properties["min-runs"],data:data5};
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
if(data.transform !== undefined){
let data6 = data.transform;
if(!(((data6 === "auto") || (data6 === "none")) || (data6 === "log"))){
const err17 = {instancePath:instancePath+"/transform",schemaPath:"#/properties/transform/enum",keyword:"enum",params:{allowedValues: schema7.properties.transform.enum},message:"must be equal to one of the allowed values",schema:schema7.properties.transform.enum,parentSchema:schema7.properties.transform,data:data6};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
if(data.aggregate !== undefined){
let data7 = data.aggregate;
if(!((((data7 === "median") || (data7 === "mean")) || (data7 === "min")) || (data7 === "max"))){
const err18 = {instancePath:instancePath+"/aggregate",schemaPath:"#/properties/aggregate/enum",keyword:"enum",params:{allowedValues: schema7.properties.aggregate.enum},message:"must be equal to one of the allowed values",schema:schema7.properties.aggregate.enum,parentSchema:schema7.properties.aggregate,data:data7};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
}
if(data["change-points"] !== undefined){
let data8 = data["change-points"];
if(typeof data8 !== "boolean"){
const err19 = {instancePath:instancePath+"/change-points",schemaPath:"#/properties/change-points/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema7.properties["change-points"].type,parentSchema:schema7.properties["change-points"],data:data8};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data["shared-move"] !== undefined){
let data9 = data["shared-move"];
if(typeof data9 !== "boolean"){
const err20 = {instancePath:instancePath+"/shared-move",schemaPath:"#/properties/shared-move/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema7.properties["shared-move"].type,parentSchema:schema7.properties["shared-move"],data:data9};
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
validate22.errors = vErrors;
return errors === 0;
}

const schema8 = {"type":"object","additionalProperties":false,"required":["match"],"properties":{"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["size/**"]},"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"examples":[8]},"transform":{"description":"Scale the metric is judged on: auto (the log scale for metrics with a time unit, none for the rest), none or log.","enum":["auto","none","log"],"examples":["log"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"examples":["min"]},"change-points":{"description":"Restart the baseline at a detected change of the metric's own level that lasts (a regime that comes and goes is not one).","type":"boolean","examples":[false]},"shared-move":{"description":"A timing takes part in the run's shared move of the timings, and is judged on its own move beside it.","type":"boolean","examples":[false]},"ignore":{"description":"Report matching metrics as ignored and never judge them.","type":"boolean","examples":[true]},"relative-to":{"description":"A metric of the same run (a calibration benchmark) whose move is the shared move of the matching metrics: they are judged on their own move beside it.","type":"string","minLength":1,"examples":["latency/calibrate"]}}};
const func5 = (function ucs2length(str) {
    const len = str.length;
    let length = 0;
    let pos = 0;
    let value;
    while (pos < len) {
        length++;
        value = str.charCodeAt(pos++);
        if (value >= 0xd800 && value <= 0xdbff && pos < len) {
            // high surrogate, and there is a next character
            value = str.charCodeAt(pos);
            if ((value & 0xfc00) === 0xdc00)
                pos++; // low surrogate
        }
    }
    return length;
});

function validate24(data, {instancePath="", parentData, parentDataProperty, rootData=data}={}){
let vErrors = null;
let errors = 0;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.match === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "match"},message:"must have required property '"+"match"+"'",schema:schema8.required,parentSchema:schema8,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
for(const key0 in data){
if(!(func2.call(schema8.properties, key0))){
const err1 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema8,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
if(data.match !== undefined){
let data0 = data.match;
const _errs3 = errors;
let valid1 = false;
const _errs4 = errors;
if(typeof data0 === "string"){
if(func5(data0) < 1){
const err2 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf/0/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema8.properties.match.anyOf[0],data:data0};
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
const err3 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf/0/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema8.properties.match.anyOf[0].type,parentSchema:schema8.properties.match.anyOf[0],data:data0};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
var _valid0 = _errs4 === errors;
valid1 = valid1 || _valid0;
if(!valid1){
const _errs6 = errors;
if(Array.isArray(data0)){
if(data0.length < 1){
const err4 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf/1/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema8.properties.match.anyOf[1],data:data0};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
const len0 = data0.length;
for(let i0=0; i0<len0; i0++){
let data1 = data0[i0];
if(typeof data1 === "string"){
if(func5(data1) < 1){
const err5 = {instancePath:instancePath+"/match/" + i0,schemaPath:"#/properties/match/anyOf/1/items/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema8.properties.match.anyOf[1].items,data:data1};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
else {
const err6 = {instancePath:instancePath+"/match/" + i0,schemaPath:"#/properties/match/anyOf/1/items/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema8.properties.match.anyOf[1].items.type,parentSchema:schema8.properties.match.anyOf[1].items,data:data1};
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
else {
const err7 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf/1/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema8.properties.match.anyOf[1].type,parentSchema:schema8.properties.match.anyOf[1],data:data0};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
var _valid0 = _errs6 === errors;
valid1 = valid1 || _valid0;
}
if(!valid1){
const err8 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema8.properties.match.anyOf,parentSchema:schema8.properties.match,data:data0};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
else {
errors = _errs3;
if(vErrors !== null){
if(_errs3){
vErrors.length = _errs3;
}
else {
vErrors = null;
}
}
}
}
if(data.cutoff !== undefined){
let data2 = data.cutoff;
if((typeof data2 == "number") && (isFinite(data2))){
if(data2 >= 1 || isNaN(data2)){
const err9 = {instancePath:instancePath+"/cutoff",schemaPath:"#/properties/cutoff/exclusiveMaximum",keyword:"exclusiveMaximum",params:{comparison: "<", limit: 1},message:"must be < 1",schema:1,parentSchema:schema8.properties.cutoff,data:data2};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
if(data2 <= 0 || isNaN(data2)){
const err10 = {instancePath:instancePath+"/cutoff",schemaPath:"#/properties/cutoff/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema8.properties.cutoff,data:data2};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
else {
const err11 = {instancePath:instancePath+"/cutoff",schemaPath:"#/properties/cutoff/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema8.properties.cutoff.type,parentSchema:schema8.properties.cutoff,data:data2};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
}
if(data.worse !== undefined){
let data3 = data.worse;
if(!(((data3 === "higher") || (data3 === "lower")) || (data3 === "both"))){
const err12 = {instancePath:instancePath+"/worse",schemaPath:"#/properties/worse/enum",keyword:"enum",params:{allowedValues: schema8.properties.worse.enum},message:"must be equal to one of the allowed values",schema:schema8.properties.worse.enum,parentSchema:schema8.properties.worse,data:data3};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
if(data.tolerance !== undefined){
let data4 = data.tolerance;
const _errs14 = errors;
let valid4 = false;
const _errs15 = errors;
if((typeof data4 == "number") && (isFinite(data4))){
if(data4 < 0 || isNaN(data4)){
const err13 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf/0/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema8.properties.tolerance.anyOf[0],data:data4};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
else {
const err14 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf/0/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema8.properties.tolerance.anyOf[0].type,parentSchema:schema8.properties.tolerance.anyOf[0],data:data4};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
var _valid1 = _errs15 === errors;
valid4 = valid4 || _valid1;
if(!valid4){
const _errs17 = errors;
if(typeof data4 === "string"){
if(!pattern0.test(data4)){
const err15 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf/1/pattern",keyword:"pattern",params:{pattern: "^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"},message:"must match pattern \""+"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"+"\"",schema:"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$",parentSchema:schema8.properties.tolerance.anyOf[1],data:data4};
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
const err16 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf/1/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema8.properties.tolerance.anyOf[1].type,parentSchema:schema8.properties.tolerance.anyOf[1],data:data4};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
var _valid1 = _errs17 === errors;
valid4 = valid4 || _valid1;
}
if(!valid4){
const err17 = {instancePath:instancePath+"/tolerance",schemaPath:"#/properties/tolerance/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema8.properties.tolerance.anyOf,parentSchema:schema8.properties.tolerance,data:data4};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
else {
errors = _errs14;
if(vErrors !== null){
if(_errs14){
vErrors.length = _errs14;
}
else {
vErrors = null;
}
}
}
}
if(data.resolution !== undefined){
let data5 = data.resolution;
if((typeof data5 == "number") && (isFinite(data5))){
if(data5 < 0 || isNaN(data5)){
const err18 = {instancePath:instancePath+"/resolution",schemaPath:"#/properties/resolution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema8.properties.resolution,data:data5};
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
const err19 = {instancePath:instancePath+"/resolution",schemaPath:"#/properties/resolution/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema8.properties.resolution.type,parentSchema:schema8.properties.resolution,data:data5};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data.window !== undefined){
let data6 = data.window;
if(!(((typeof data6 == "number") && (!(data6 % 1) && !isNaN(data6))) && (isFinite(data6)))){
const err20 = {instancePath:instancePath+"/window",schemaPath:"#/properties/window/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema8.properties.window.type,parentSchema:schema8.properties.window,data:data6};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
if((typeof data6 == "number") && (isFinite(data6))){
if(data6 < 2 || isNaN(data6)){
const err21 = {instancePath:instancePath+"/window",schemaPath:"#/properties/window/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema8.properties.window,data:data6};
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
if(data["min-runs"] !== undefined){
let data7 = data["min-runs"];
if(!(((typeof data7 == "number") && (!(data7 % 1) && !isNaN(data7))) && (isFinite(data7)))){
const err22 = {instancePath:instancePath+"/min-runs",schemaPath:"#/properties/min-runs/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema8.properties["min-runs"].type,parentSchema:schema8.properties["min-runs"],data:data7};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
if((typeof data7 == "number") && (isFinite(data7))){
if(data7 < 2 || isNaN(data7)){
const err23 = {instancePath:instancePath+"/min-runs",schemaPath:"#/properties/min-runs/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema8.properties["min-runs"],data:data7};
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
if(data.transform !== undefined){
let data8 = data.transform;
if(!(((data8 === "auto") || (data8 === "none")) || (data8 === "log"))){
const err24 = {instancePath:instancePath+"/transform",schemaPath:"#/properties/transform/enum",keyword:"enum",params:{allowedValues: schema8.properties.transform.enum},message:"must be equal to one of the allowed values",schema:schema8.properties.transform.enum,parentSchema:schema8.properties.transform,data:data8};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
}
if(data.aggregate !== undefined){
let data9 = data.aggregate;
if(!((((data9 === "median") || (data9 === "mean")) || (data9 === "min")) || (data9 === "max"))){
const err25 = {instancePath:instancePath+"/aggregate",schemaPath:"#/properties/aggregate/enum",keyword:"enum",params:{allowedValues: schema8.properties.aggregate.enum},message:"must be equal to one of the allowed values",schema:schema8.properties.aggregate.enum,parentSchema:schema8.properties.aggregate,data:data9};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
}
if(data["change-points"] !== undefined){
let data10 = data["change-points"];
if(typeof data10 !== "boolean"){
const err26 = {instancePath:instancePath+"/change-points",schemaPath:"#/properties/change-points/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema8.properties["change-points"].type,parentSchema:schema8.properties["change-points"],data:data10};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
if(data["shared-move"] !== undefined){
let data11 = data["shared-move"];
if(typeof data11 !== "boolean"){
const err27 = {instancePath:instancePath+"/shared-move",schemaPath:"#/properties/shared-move/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema8.properties["shared-move"].type,parentSchema:schema8.properties["shared-move"],data:data11};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
}
if(data.ignore !== undefined){
let data12 = data.ignore;
if(typeof data12 !== "boolean"){
const err28 = {instancePath:instancePath+"/ignore",schemaPath:"#/properties/ignore/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema8.properties.ignore.type,parentSchema:schema8.properties.ignore,data:data12};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
}
if(data["relative-to"] !== undefined){
let data13 = data["relative-to"];
if(typeof data13 === "string"){
if(func5(data13) < 1){
const err29 = {instancePath:instancePath+"/relative-to",schemaPath:"#/properties/relative-to/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema8.properties["relative-to"],data:data13};
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
const err30 = {instancePath:instancePath+"/relative-to",schemaPath:"#/properties/relative-to/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema8.properties["relative-to"].type,parentSchema:schema8.properties["relative-to"],data:data13};
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
const err31 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema8.type,parentSchema:schema8,data};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
validate24.errors = vErrors;
return errors === 0;
}

const schema9 = {"type":"object","additionalProperties":false,"required":["name"],"properties":{"name":{"description":"Name of the group, unique in the file.","type":"string","minLength":1,"maxLength":200,"examples":["latency"]},"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"Members of the group (default: the name followed by /**). a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["latency/*"]}}};

function validate26(data, {instancePath="", parentData, parentDataProperty, rootData=data}={}){
let vErrors = null;
let errors = 0;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.name === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'",schema:schema9.required,parentSchema:schema9,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
for(const key0 in data){
if(!((key0 === "name") || (key0 === "match"))){
const err1 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema9,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
if(data.name !== undefined){
let data0 = data.name;
if(typeof data0 === "string"){
if(func5(data0) > 200){
const err2 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/maxLength",keyword:"maxLength",params:{limit: 200},message:"must NOT have more than 200 characters",schema:200,parentSchema:schema9.properties.name,data:data0};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(func5(data0) < 1){
const err3 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema9.properties.name,data:data0};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
}
else {
const err4 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema9.properties.name.type,parentSchema:schema9.properties.name,data:data0};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
if(data.match !== undefined){
let data1 = data.match;
const _errs5 = errors;
let valid1 = false;
const _errs6 = errors;
if(typeof data1 === "string"){
if(func5(data1) < 1){
const err5 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf/0/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema9.properties.match.anyOf[0],data:data1};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
else {
const err6 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf/0/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema9.properties.match.anyOf[0].type,parentSchema:schema9.properties.match.anyOf[0],data:data1};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
var _valid0 = _errs6 === errors;
valid1 = valid1 || _valid0;
if(!valid1){
const _errs8 = errors;
if(Array.isArray(data1)){
if(data1.length < 1){
const err7 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf/1/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema9.properties.match.anyOf[1],data:data1};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
const len0 = data1.length;
for(let i0=0; i0<len0; i0++){
let data2 = data1[i0];
if(typeof data2 === "string"){
if(func5(data2) < 1){
const err8 = {instancePath:instancePath+"/match/" + i0,schemaPath:"#/properties/match/anyOf/1/items/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema9.properties.match.anyOf[1].items,data:data2};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
}
else {
const err9 = {instancePath:instancePath+"/match/" + i0,schemaPath:"#/properties/match/anyOf/1/items/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema9.properties.match.anyOf[1].items.type,parentSchema:schema9.properties.match.anyOf[1].items,data:data2};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
}
else {
const err10 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf/1/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema9.properties.match.anyOf[1].type,parentSchema:schema9.properties.match.anyOf[1],data:data1};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
var _valid0 = _errs8 === errors;
valid1 = valid1 || _valid0;
}
if(!valid1){
const err11 = {instancePath:instancePath+"/match",schemaPath:"#/properties/match/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema9.properties.match.anyOf,parentSchema:schema9.properties.match,data:data1};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
else {
errors = _errs5;
if(vErrors !== null){
if(_errs5){
vErrors.length = _errs5;
}
else {
vErrors = null;
}
}
}
}
}
else {
const err12 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema9.type,parentSchema:schema9,data};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
validate26.errors = vErrors;
return errors === 0;
}

const schema10 = {"description":"Size limits for metric files.","type":["object","null"],"additionalProperties":false,"properties":{"max-file-bytes":{"description":"Largest metric file read, in bytes.","type":"integer","minimum":1,"default":67108864,"examples":[67108864]},"max-line-length":{"description":"Longest line in a metric file, in characters.","type":"integer","minimum":1,"default":1048576,"examples":[1048576]},"max-metrics":{"description":"Most metrics in one run.","type":"integer","minimum":1,"default":100000,"examples":[100000]}}};

function validate28(data, {instancePath="", parentData, parentDataProperty, rootData=data}={}){
let vErrors = null;
let errors = 0;
if((!(data && typeof data == "object" && !Array.isArray(data))) && (data !== null)){
const err0 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: schema10.type},message:"must be object,null",schema:schema10.type,parentSchema:schema10,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data && typeof data == "object" && !Array.isArray(data)){
for(const key0 in data){
if(!(((key0 === "max-file-bytes") || (key0 === "max-line-length")) || (key0 === "max-metrics"))){
const err1 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema10,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
if(data["max-file-bytes"] !== undefined){
let data0 = data["max-file-bytes"];
if(!(((typeof data0 == "number") && (!(data0 % 1) && !isNaN(data0))) && (isFinite(data0)))){
const err2 = {instancePath:instancePath+"/max-file-bytes",schemaPath:"#/properties/max-file-bytes/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema10.properties["max-file-bytes"].type,parentSchema:schema10.properties["max-file-bytes"],data:data0};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if((typeof data0 == "number") && (isFinite(data0))){
if(data0 < 1 || isNaN(data0)){
const err3 = {instancePath:instancePath+"/max-file-bytes",schemaPath:"#/properties/max-file-bytes/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema10.properties["max-file-bytes"],data:data0};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
}
}
if(data["max-line-length"] !== undefined){
let data1 = data["max-line-length"];
if(!(((typeof data1 == "number") && (!(data1 % 1) && !isNaN(data1))) && (isFinite(data1)))){
const err4 = {instancePath:instancePath+"/max-line-length",schemaPath:"#/properties/max-line-length/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema10.properties["max-line-length"].type,parentSchema:schema10.properties["max-line-length"],data:data1};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if((typeof data1 == "number") && (isFinite(data1))){
if(data1 < 1 || isNaN(data1)){
const err5 = {instancePath:instancePath+"/max-line-length",schemaPath:"#/properties/max-line-length/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema10.properties["max-line-length"],data:data1};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
}
if(data["max-metrics"] !== undefined){
let data2 = data["max-metrics"];
if(!(((typeof data2 == "number") && (!(data2 % 1) && !isNaN(data2))) && (isFinite(data2)))){
const err6 = {instancePath:instancePath+"/max-metrics",schemaPath:"#/properties/max-metrics/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema10.properties["max-metrics"].type,parentSchema:schema10.properties["max-metrics"],data:data2};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
if((typeof data2 == "number") && (isFinite(data2))){
if(data2 < 1 || isNaN(data2)){
const err7 = {instancePath:instancePath+"/max-metrics",schemaPath:"#/properties/max-metrics/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema10.properties["max-metrics"],data:data2};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
}
}
validate28.errors = vErrors;
return errors === 0;
}


function validate21(data, {instancePath="", parentData, parentDataProperty, rootData=data}={}){
let vErrors = null;
let errors = 0;
if((!(data && typeof data == "object" && !Array.isArray(data))) && (data !== null)){
const err0 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: schema6.type},message:"must be object,null",schema:schema6.type,parentSchema:schema6,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data && typeof data == "object" && !Array.isArray(data)){
for(const key0 in data){
if(!(func2.call(schema6.properties, key0))){
const err1 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema6,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
if(data.defaults !== undefined){
if(!(validate22(data.defaults, {instancePath:instancePath+"/defaults",parentData:data,parentDataProperty:"defaults",rootData}))){
vErrors = vErrors === null ? validate22.errors : vErrors.concat(validate22.errors);
errors = vErrors.length;
}
}
if(data.metrics !== undefined){
let data1 = data.metrics;
if((!(Array.isArray(data1))) && (data1 !== null)){
const err2 = {instancePath:instancePath+"/metrics",schemaPath:"#/properties/metrics/type",keyword:"type",params:{type: schema6.properties.metrics.type},message:"must be array,null",schema:schema6.properties.metrics.type,parentSchema:schema6.properties.metrics,data:data1};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(Array.isArray(data1)){
const len0 = data1.length;
for(let i0=0; i0<len0; i0++){
if(!(validate24(data1[i0], {instancePath:instancePath+"/metrics/" + i0,parentData:data1,parentDataProperty:i0,rootData}))){
vErrors = vErrors === null ? validate24.errors : vErrors.concat(validate24.errors);
errors = vErrors.length;
}
}
}
}
if(data.groups !== undefined){
let data3 = data.groups;
if((!(Array.isArray(data3))) && (data3 !== null)){
const err3 = {instancePath:instancePath+"/groups",schemaPath:"#/properties/groups/type",keyword:"type",params:{type: schema6.properties.groups.type},message:"must be array,null",schema:schema6.properties.groups.type,parentSchema:schema6.properties.groups,data:data3};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if(Array.isArray(data3)){
const len1 = data3.length;
for(let i1=0; i1<len1; i1++){
if(!(validate26(data3[i1], {instancePath:instancePath+"/groups/" + i1,parentData:data3,parentDataProperty:i1,rootData}))){
vErrors = vErrors === null ? validate26.errors : vErrors.concat(validate26.errors);
errors = vErrors.length;
}
}
}
}
if(data.family !== undefined){
let data5 = data.family;
if(!((((data5 === "none") || (data5 === "bonferroni")) || (data5 === "holm")) || (data5 === "fdr"))){
const err4 = {instancePath:instancePath+"/family",schemaPath:"#/properties/family/enum",keyword:"enum",params:{allowedValues: schema6.properties.family.enum},message:"must be equal to one of the allowed values",schema:schema6.properties.family.enum,parentSchema:schema6.properties.family,data:data5};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
if(data.budget !== undefined){
let data6 = data.budget;
if(typeof data6 === "string"){
if(!pattern0.test(data6)){
const err5 = {instancePath:instancePath+"/budget",schemaPath:"#/properties/budget/pattern",keyword:"pattern",params:{pattern: "^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"},message:"must match pattern \""+"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"+"\"",schema:"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$",parentSchema:schema6.properties.budget,data:data6};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
else {
const err6 = {instancePath:instancePath+"/budget",schemaPath:"#/properties/budget/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema6.properties.budget.type,parentSchema:schema6.properties.budget,data:data6};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
if(data.unsettled !== undefined){
let data7 = data.unsettled;
if(!((data7 === "pass") || (data7 === "block"))){
const err7 = {instancePath:instancePath+"/unsettled",schemaPath:"#/properties/unsettled/enum",keyword:"enum",params:{allowedValues: schema6.properties.unsettled.enum},message:"must be equal to one of the allowed values",schema:schema6.properties.unsettled.enum,parentSchema:schema6.properties.unsettled,data:data7};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
if(data.keep !== undefined){
let data8 = data.keep;
if(!(((typeof data8 == "number") && (!(data8 % 1) && !isNaN(data8))) && (isFinite(data8)))){
const err8 = {instancePath:instancePath+"/keep",schemaPath:"#/properties/keep/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema6.properties.keep.type,parentSchema:schema6.properties.keep,data:data8};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
if((typeof data8 == "number") && (isFinite(data8))){
if(data8 < 1 || isNaN(data8)){
const err9 = {instancePath:instancePath+"/keep",schemaPath:"#/properties/keep/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema6.properties.keep,data:data8};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
}
if(data["input-format"] !== undefined){
let data9 = data["input-format"];
if(!((((((data9 === "json") || (data9 === "jsonl")) || (data9 === "csv")) || (data9 === "openmetrics")) || (data9 === "gobench")) || (data9 === "junit"))){
const err10 = {instancePath:instancePath+"/input-format",schemaPath:"#/properties/input-format/enum",keyword:"enum",params:{allowedValues: schema6.properties["input-format"].enum},message:"must be equal to one of the allowed values",schema:schema6.properties["input-format"].enum,parentSchema:schema6.properties["input-format"],data:data9};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
if(data.limits !== undefined){
if(!(validate28(data.limits, {instancePath:instancePath+"/limits",parentData:data,parentDataProperty:"limits",rootData}))){
vErrors = vErrors === null ? validate28.errors : vErrors.concat(validate28.errors);
errors = vErrors.length;
}
}
}
validate21.errors = vErrors;
return errors === 0;
}
