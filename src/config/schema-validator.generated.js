// GENERATED FILE, do not edit. The validator of src/config/bellgate.schema.json, written by ajv
// standalone code generation (options: allErrors, verbose, strict).
// Regenerate after changing the schema: npm run gen:config-validator
// (= node test/gen-config-validator.mjs); test/config/validator-fresh.test.ts fails while it is stale.
/* eslint-disable */
export const validate = validate10;
export default validate10;
const schema11 = {"$schema":"http://json-schema.org/draft-07/schema#","title":"Bellgate configuration (.github/bellgate.yml)","description":"All keys are optional. Rules under metrics apply in order; a later match overrides an earlier one.","type":["object","null"],"additionalProperties":false,"properties":{"defaults":{"$ref":"#/definitions/settings"},"metrics":{"description":"Rules over metric names, applied in order.","type":["array","null"],"items":{"$ref":"#/definitions/rule"}},"groups":{"description":"Metrics that share a move of their own (instead of the timings' shared move): each member is judged on its own move beside the others'.","type":["array","null"],"items":{"$ref":"#/definitions/group"}},"family":{"description":"Control of the false alarms across the metrics of a run: holm (default) holds the chance of any false alarm in a run at the budget; none judges each metric by its cutoff.","enum":["none","bonferroni","holm","fdr"],"default":"holm","examples":["none"]},"budget":{"description":"The chance of any false alarm in a run that family control holds to, as a percent.","type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","default":"1%","examples":["1%"]},"unsettled":{"description":"What a run whose shared move is beyond what the history has shown does: pass (reported, asks for a re-run) or block (fails like a regression).","enum":["pass","block"],"default":"pass","examples":["block"]},"keep":{"description":"Newest runs kept in the history; trimming is the only deletion.","type":"integer","minimum":1,"default":4000,"examples":[4000]},"input-format":{"description":"Force the metric file format instead of detecting it from content.","enum":["json","jsonl","csv","openmetrics","gobench","junit"],"examples":["json"]},"limits":{"$ref":"#/definitions/limits"}},"definitions":{"settings":{"description":"Settings for every metric, before rules apply.","type":["object","null"],"additionalProperties":false,"properties":{"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"default":0.01,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"default":"higher","examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","default":"1%","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"default":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"default":60,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"default":8,"examples":[8]},"transform":{"description":"Scale the metric is judged on: auto (the log scale for metrics with a time unit, none for the rest), none or log.","enum":["auto","none","log"],"default":"auto","examples":["log"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value (auto: min for a time unit, else median).","enum":["auto","median","mean","min","max"],"default":"auto","examples":["min"]},"change-points":{"description":"Restart the baseline at a detected change of the metric's own level that lasts (a regime that comes and goes is not one).","type":"boolean","default":true,"examples":[false]},"shared-move":{"description":"A timing takes part in the run's shared move of the timings, and is judged on its own move beside it.","type":"boolean","default":true,"examples":[false]}}},"rule":{"type":"object","additionalProperties":false,"required":["match"],"properties":{"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["size/**"]},"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"examples":[8]},"transform":{"description":"Scale the metric is judged on: auto (the log scale for metrics with a time unit, none for the rest), none or log.","enum":["auto","none","log"],"examples":["log"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value (auto: min for a time unit, else median).","enum":["auto","median","mean","min","max"],"examples":["min"]},"change-points":{"description":"Restart the baseline at a detected change of the metric's own level that lasts (a regime that comes and goes is not one).","type":"boolean","examples":[false]},"shared-move":{"description":"A timing takes part in the run's shared move of the timings, and is judged on its own move beside it.","type":"boolean","examples":[false]},"ignore":{"description":"Report matching metrics as ignored and never judge them.","type":"boolean","examples":[true]},"relative-to":{"description":"A metric of the same run (a calibration benchmark) whose move is the shared move of the matching metrics: they are judged on their own move beside it.","type":"string","minLength":1,"examples":["latency/calibrate"]}}},"group":{"type":"object","additionalProperties":false,"required":["name"],"properties":{"name":{"description":"Name of the group, unique in the file.","type":"string","minLength":1,"maxLength":200,"examples":["latency"]},"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"Members of the group (default: the name followed by /**). a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["latency/*"]}}},"limits":{"description":"Size limits for metric files.","type":["object","null"],"additionalProperties":false,"properties":{"max-file-bytes":{"description":"Largest metric file read, in bytes.","type":"integer","minimum":1,"default":67108864,"examples":[67108864]},"max-line-length":{"description":"Longest line in a metric file, in characters.","type":"integer","minimum":1,"default":1048576,"examples":[1048576]},"max-metrics":{"description":"Most metrics in one run.","type":"integer","minimum":1,"default":100000,"examples":[100000]},"max-samples":{"description":"Most samples (values of metrics, before repeated values are aggregated) in one run.","type":"integer","minimum":1,"default":250000,"examples":[250000]}}}}};
const schema12 = {"description":"Settings for every metric, before rules apply.","type":["object","null"],"additionalProperties":false,"properties":{"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"default":0.01,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"default":"higher","examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","default":"1%","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"default":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"default":60,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"default":8,"examples":[8]},"transform":{"description":"Scale the metric is judged on: auto (the log scale for metrics with a time unit, none for the rest), none or log.","enum":["auto","none","log"],"default":"auto","examples":["log"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value (auto: min for a time unit, else median).","enum":["auto","median","mean","min","max"],"default":"auto","examples":["min"]},"change-points":{"description":"Restart the baseline at a detected change of the metric's own level that lasts (a regime that comes and goes is not one).","type":"boolean","default":true,"examples":[false]},"shared-move":{"description":"A timing takes part in the run's shared move of the timings, and is judged on its own move beside it.","type":"boolean","default":true,"examples":[false]}}};
const schema13 = {"type":"object","additionalProperties":false,"required":["match"],"properties":{"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["size/**"]},"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"examples":[8]},"transform":{"description":"Scale the metric is judged on: auto (the log scale for metrics with a time unit, none for the rest), none or log.","enum":["auto","none","log"],"examples":["log"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value (auto: min for a time unit, else median).","enum":["auto","median","mean","min","max"],"examples":["min"]},"change-points":{"description":"Restart the baseline at a detected change of the metric's own level that lasts (a regime that comes and goes is not one).","type":"boolean","examples":[false]},"shared-move":{"description":"A timing takes part in the run's shared move of the timings, and is judged on its own move beside it.","type":"boolean","examples":[false]},"ignore":{"description":"Report matching metrics as ignored and never judge them.","type":"boolean","examples":[true]},"relative-to":{"description":"A metric of the same run (a calibration benchmark) whose move is the shared move of the matching metrics: they are judged on their own move beside it.","type":"string","minLength":1,"examples":["latency/calibrate"]}}};
const schema14 = {"type":"object","additionalProperties":false,"required":["name"],"properties":{"name":{"description":"Name of the group, unique in the file.","type":"string","minLength":1,"maxLength":200,"examples":["latency"]},"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"Members of the group (default: the name followed by /**). a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["latency/*"]}}};
const schema15 = {"description":"Size limits for metric files.","type":["object","null"],"additionalProperties":false,"properties":{"max-file-bytes":{"description":"Largest metric file read, in bytes.","type":"integer","minimum":1,"default":67108864,"examples":[67108864]},"max-line-length":{"description":"Longest line in a metric file, in characters.","type":"integer","minimum":1,"default":1048576,"examples":[1048576]},"max-metrics":{"description":"Most metrics in one run.","type":"integer","minimum":1,"default":100000,"examples":[100000]},"max-samples":{"description":"Most samples (values of metrics, before repeated values are aggregated) in one run.","type":"integer","minimum":1,"default":250000,"examples":[250000]}}};
const func2 = Object.prototype.hasOwnProperty;
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
const pattern0 = new RegExp("^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$", "u");

function validate10(data, {instancePath="", parentData, parentDataProperty, rootData=data}={}){
let vErrors = null;
let errors = 0;
if((!(data && typeof data == "object" && !Array.isArray(data))) && (data !== null)){
const err0 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: schema11.type},message:"must be object,null",schema:schema11.type,parentSchema:schema11,data};
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
if(!(func2.call(schema11.properties, key0))){
const err1 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema11,data};
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
let data0 = data.defaults;
if((!(data0 && typeof data0 == "object" && !Array.isArray(data0))) && (data0 !== null)){
const err2 = {instancePath:instancePath+"/defaults",schemaPath:"#/definitions/settings/type",keyword:"type",params:{type: schema12.type},message:"must be object,null",schema:schema12.type,parentSchema:schema12,data:data0};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data0 && typeof data0 == "object" && !Array.isArray(data0)){
for(const key1 in data0){
if(!(func2.call(schema12.properties, key1))){
const err3 = {instancePath:instancePath+"/defaults",schemaPath:"#/definitions/settings/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema12,data:data0};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
}
if(data0.cutoff !== undefined){
let data1 = data0.cutoff;
if((typeof data1 == "number") && (isFinite(data1))){
if(data1 >= 1 || isNaN(data1)){
const err4 = {instancePath:instancePath+"/defaults/cutoff",schemaPath:"#/definitions/settings/properties/cutoff/exclusiveMaximum",keyword:"exclusiveMaximum",params:{comparison: "<", limit: 1},message:"must be < 1",schema:1,parentSchema:schema12.properties.cutoff,data:data1};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if(data1 <= 0 || isNaN(data1)){
const err5 = {instancePath:instancePath+"/defaults/cutoff",schemaPath:"#/definitions/settings/properties/cutoff/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema12.properties.cutoff,data:data1};
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
const err6 = {instancePath:instancePath+"/defaults/cutoff",schemaPath:"#/definitions/settings/properties/cutoff/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema12.properties.cutoff.type,parentSchema:schema12.properties.cutoff,data:data1};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
if(data0.worse !== undefined){
let data2 = data0.worse;
if(!(((data2 === "higher") || (data2 === "lower")) || (data2 === "both"))){
const err7 = {instancePath:instancePath+"/defaults/worse",schemaPath:"#/definitions/settings/properties/worse/enum",keyword:"enum",params:{allowedValues: schema12.properties.worse.enum},message:"must be equal to one of the allowed values",schema:schema12.properties.worse.enum,parentSchema:schema12.properties.worse,data:data2};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
if(data0.tolerance !== undefined){
let data3 = data0.tolerance;
const _errs10 = errors;
let valid3 = false;
const _errs11 = errors;
if((typeof data3 == "number") && (isFinite(data3))){
if(data3 < 0 || isNaN(data3)){
const err8 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/definitions/settings/properties/tolerance/anyOf/0/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema12.properties.tolerance.anyOf[0],data:data3};
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
const err9 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/definitions/settings/properties/tolerance/anyOf/0/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema12.properties.tolerance.anyOf[0].type,parentSchema:schema12.properties.tolerance.anyOf[0],data:data3};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
var _valid0 = _errs11 === errors;
valid3 = valid3 || _valid0;
if(!valid3){
const _errs13 = errors;
if(typeof data3 === "string"){
if(!pattern0.test(data3)){
const err10 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/definitions/settings/properties/tolerance/anyOf/1/pattern",keyword:"pattern",params:{pattern: "^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"},message:"must match pattern \""+"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"+"\"",schema:"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$",parentSchema:schema12.properties.tolerance.anyOf[1],data:data3};
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
const err11 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/definitions/settings/properties/tolerance/anyOf/1/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema12.properties.tolerance.anyOf[1].type,parentSchema:schema12.properties.tolerance.anyOf[1],data:data3};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
var _valid0 = _errs13 === errors;
valid3 = valid3 || _valid0;
}
if(!valid3){
const err12 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/definitions/settings/properties/tolerance/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema12.properties.tolerance.anyOf,parentSchema:schema12.properties.tolerance,data:data3};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
else {
errors = _errs10;
if(vErrors !== null){
if(_errs10){
vErrors.length = _errs10;
}
else {
vErrors = null;
}
}
}
}
if(data0.resolution !== undefined){
let data4 = data0.resolution;
if((typeof data4 == "number") && (isFinite(data4))){
if(data4 < 0 || isNaN(data4)){
const err13 = {instancePath:instancePath+"/defaults/resolution",schemaPath:"#/definitions/settings/properties/resolution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema12.properties.resolution,data:data4};
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
const err14 = {instancePath:instancePath+"/defaults/resolution",schemaPath:"#/definitions/settings/properties/resolution/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema12.properties.resolution.type,parentSchema:schema12.properties.resolution,data:data4};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
if(data0.window !== undefined){
let data5 = data0.window;
if(!(((typeof data5 == "number") && (!(data5 % 1) && !isNaN(data5))) && (isFinite(data5)))){
const err15 = {instancePath:instancePath+"/defaults/window",schemaPath:"#/definitions/settings/properties/window/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema12.properties.window.type,parentSchema:schema12.properties.window,data:data5};
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
const err16 = {instancePath:instancePath+"/defaults/window",schemaPath:"#/definitions/settings/properties/window/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema12.properties.window,data:data5};
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
if(data0["min-runs"] !== undefined){
let data6 = data0["min-runs"];
if(!(((typeof data6 == "number") && (!(data6 % 1) && !isNaN(data6))) && (isFinite(data6)))){
const err17 = {instancePath:instancePath+"/defaults/min-runs",schemaPath:"#/definitions/settings/properties/min-runs/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema12.properties["min-runs"].type,parentSchema:schema12.properties["min-runs"],data:data6};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
if((typeof data6 == "number") && (isFinite(data6))){
if(data6 < 2 || isNaN(data6)){
const err18 = {instancePath:instancePath+"/defaults/min-runs",schemaPath:"#/definitions/settings/properties/min-runs/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema12.properties["min-runs"],data:data6};
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
if(data0.transform !== undefined){
let data7 = data0.transform;
if(!(((data7 === "auto") || (data7 === "none")) || (data7 === "log"))){
const err19 = {instancePath:instancePath+"/defaults/transform",schemaPath:"#/definitions/settings/properties/transform/enum",keyword:"enum",params:{allowedValues: schema12.properties.transform.enum},message:"must be equal to one of the allowed values",schema:schema12.properties.transform.enum,parentSchema:schema12.properties.transform,data:data7};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data0.aggregate !== undefined){
let data8 = data0.aggregate;
if(!(((((data8 === "auto") || (data8 === "median")) || (data8 === "mean")) || (data8 === "min")) || (data8 === "max"))){
const err20 = {instancePath:instancePath+"/defaults/aggregate",schemaPath:"#/definitions/settings/properties/aggregate/enum",keyword:"enum",params:{allowedValues: schema12.properties.aggregate.enum},message:"must be equal to one of the allowed values",schema:schema12.properties.aggregate.enum,parentSchema:schema12.properties.aggregate,data:data8};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
if(data0["change-points"] !== undefined){
let data9 = data0["change-points"];
if(typeof data9 !== "boolean"){
const err21 = {instancePath:instancePath+"/defaults/change-points",schemaPath:"#/definitions/settings/properties/change-points/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema12.properties["change-points"].type,parentSchema:schema12.properties["change-points"],data:data9};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
if(data0["shared-move"] !== undefined){
let data10 = data0["shared-move"];
if(typeof data10 !== "boolean"){
const err22 = {instancePath:instancePath+"/defaults/shared-move",schemaPath:"#/definitions/settings/properties/shared-move/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema12.properties["shared-move"].type,parentSchema:schema12.properties["shared-move"],data:data10};
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
}
if(data.metrics !== undefined){
let data11 = data.metrics;
if((!(Array.isArray(data11))) && (data11 !== null)){
const err23 = {instancePath:instancePath+"/metrics",schemaPath:"#/properties/metrics/type",keyword:"type",params:{type: schema11.properties.metrics.type},message:"must be array,null",schema:schema11.properties.metrics.type,parentSchema:schema11.properties.metrics,data:data11};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
if(Array.isArray(data11)){
const len0 = data11.length;
for(let i0=0; i0<len0; i0++){
let data12 = data11[i0];
if(data12 && typeof data12 == "object" && !Array.isArray(data12)){
if(data12.match === undefined){
const err24 = {instancePath:instancePath+"/metrics/" + i0,schemaPath:"#/definitions/rule/required",keyword:"required",params:{missingProperty: "match"},message:"must have required property '"+"match"+"'",schema:schema13.required,parentSchema:schema13,data:data12};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
for(const key2 in data12){
if(!(func2.call(schema13.properties, key2))){
const err25 = {instancePath:instancePath+"/metrics/" + i0,schemaPath:"#/definitions/rule/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties",schema:false,parentSchema:schema13,data:data12};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
}
if(data12.match !== undefined){
let data13 = data12.match;
const _errs34 = errors;
let valid8 = false;
const _errs35 = errors;
if(typeof data13 === "string"){
if(func5(data13) < 1){
const err26 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/definitions/rule/properties/match/anyOf/0/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema13.properties.match.anyOf[0],data:data13};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
else {
const err27 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/definitions/rule/properties/match/anyOf/0/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema13.properties.match.anyOf[0].type,parentSchema:schema13.properties.match.anyOf[0],data:data13};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
var _valid1 = _errs35 === errors;
valid8 = valid8 || _valid1;
if(!valid8){
const _errs37 = errors;
if(Array.isArray(data13)){
if(data13.length < 1){
const err28 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/definitions/rule/properties/match/anyOf/1/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema13.properties.match.anyOf[1],data:data13};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
const len1 = data13.length;
for(let i1=0; i1<len1; i1++){
let data14 = data13[i1];
if(typeof data14 === "string"){
if(func5(data14) < 1){
const err29 = {instancePath:instancePath+"/metrics/" + i0+"/match/" + i1,schemaPath:"#/definitions/rule/properties/match/anyOf/1/items/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema13.properties.match.anyOf[1].items,data:data14};
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
const err30 = {instancePath:instancePath+"/metrics/" + i0+"/match/" + i1,schemaPath:"#/definitions/rule/properties/match/anyOf/1/items/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema13.properties.match.anyOf[1].items.type,parentSchema:schema13.properties.match.anyOf[1].items,data:data14};
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
const err31 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/definitions/rule/properties/match/anyOf/1/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema13.properties.match.anyOf[1].type,parentSchema:schema13.properties.match.anyOf[1],data:data13};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
var _valid1 = _errs37 === errors;
valid8 = valid8 || _valid1;
}
if(!valid8){
const err32 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/definitions/rule/properties/match/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema13.properties.match.anyOf,parentSchema:schema13.properties.match,data:data13};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
else {
errors = _errs34;
if(vErrors !== null){
if(_errs34){
vErrors.length = _errs34;
}
else {
vErrors = null;
}
}
}
}
if(data12.cutoff !== undefined){
let data15 = data12.cutoff;
if((typeof data15 == "number") && (isFinite(data15))){
if(data15 >= 1 || isNaN(data15)){
const err33 = {instancePath:instancePath+"/metrics/" + i0+"/cutoff",schemaPath:"#/definitions/rule/properties/cutoff/exclusiveMaximum",keyword:"exclusiveMaximum",params:{comparison: "<", limit: 1},message:"must be < 1",schema:1,parentSchema:schema13.properties.cutoff,data:data15};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
if(data15 <= 0 || isNaN(data15)){
const err34 = {instancePath:instancePath+"/metrics/" + i0+"/cutoff",schemaPath:"#/definitions/rule/properties/cutoff/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema13.properties.cutoff,data:data15};
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
const err35 = {instancePath:instancePath+"/metrics/" + i0+"/cutoff",schemaPath:"#/definitions/rule/properties/cutoff/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema13.properties.cutoff.type,parentSchema:schema13.properties.cutoff,data:data15};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
}
if(data12.worse !== undefined){
let data16 = data12.worse;
if(!(((data16 === "higher") || (data16 === "lower")) || (data16 === "both"))){
const err36 = {instancePath:instancePath+"/metrics/" + i0+"/worse",schemaPath:"#/definitions/rule/properties/worse/enum",keyword:"enum",params:{allowedValues: schema13.properties.worse.enum},message:"must be equal to one of the allowed values",schema:schema13.properties.worse.enum,parentSchema:schema13.properties.worse,data:data16};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
if(data12.tolerance !== undefined){
let data17 = data12.tolerance;
const _errs45 = errors;
let valid11 = false;
const _errs46 = errors;
if((typeof data17 == "number") && (isFinite(data17))){
if(data17 < 0 || isNaN(data17)){
const err37 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/definitions/rule/properties/tolerance/anyOf/0/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema13.properties.tolerance.anyOf[0],data:data17};
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
const err38 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/definitions/rule/properties/tolerance/anyOf/0/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema13.properties.tolerance.anyOf[0].type,parentSchema:schema13.properties.tolerance.anyOf[0],data:data17};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
var _valid2 = _errs46 === errors;
valid11 = valid11 || _valid2;
if(!valid11){
const _errs48 = errors;
if(typeof data17 === "string"){
if(!pattern0.test(data17)){
const err39 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/definitions/rule/properties/tolerance/anyOf/1/pattern",keyword:"pattern",params:{pattern: "^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"},message:"must match pattern \""+"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"+"\"",schema:"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$",parentSchema:schema13.properties.tolerance.anyOf[1],data:data17};
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
const err40 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/definitions/rule/properties/tolerance/anyOf/1/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema13.properties.tolerance.anyOf[1].type,parentSchema:schema13.properties.tolerance.anyOf[1],data:data17};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
var _valid2 = _errs48 === errors;
valid11 = valid11 || _valid2;
}
if(!valid11){
const err41 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/definitions/rule/properties/tolerance/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema13.properties.tolerance.anyOf,parentSchema:schema13.properties.tolerance,data:data17};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
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
if(data12.resolution !== undefined){
let data18 = data12.resolution;
if((typeof data18 == "number") && (isFinite(data18))){
if(data18 < 0 || isNaN(data18)){
const err42 = {instancePath:instancePath+"/metrics/" + i0+"/resolution",schemaPath:"#/definitions/rule/properties/resolution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema13.properties.resolution,data:data18};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
}
else {
const err43 = {instancePath:instancePath+"/metrics/" + i0+"/resolution",schemaPath:"#/definitions/rule/properties/resolution/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema13.properties.resolution.type,parentSchema:schema13.properties.resolution,data:data18};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
}
if(data12.window !== undefined){
let data19 = data12.window;
if(!(((typeof data19 == "number") && (!(data19 % 1) && !isNaN(data19))) && (isFinite(data19)))){
const err44 = {instancePath:instancePath+"/metrics/" + i0+"/window",schemaPath:"#/definitions/rule/properties/window/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema13.properties.window.type,parentSchema:schema13.properties.window,data:data19};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
if((typeof data19 == "number") && (isFinite(data19))){
if(data19 < 2 || isNaN(data19)){
const err45 = {instancePath:instancePath+"/metrics/" + i0+"/window",schemaPath:"#/definitions/rule/properties/window/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema13.properties.window,data:data19};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
}
}
if(data12["min-runs"] !== undefined){
let data20 = data12["min-runs"];
if(!(((typeof data20 == "number") && (!(data20 % 1) && !isNaN(data20))) && (isFinite(data20)))){
const err46 = {instancePath:instancePath+"/metrics/" + i0+"/min-runs",schemaPath:"#/definitions/rule/properties/min-runs/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema13.properties["min-runs"].type,parentSchema:schema13.properties["min-runs"],data:data20};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
if((typeof data20 == "number") && (isFinite(data20))){
if(data20 < 2 || isNaN(data20)){
const err47 = {instancePath:instancePath+"/metrics/" + i0+"/min-runs",schemaPath:"#/definitions/rule/properties/min-runs/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema13.properties["min-runs"],data:data20};
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
if(data12.transform !== undefined){
let data21 = data12.transform;
if(!(((data21 === "auto") || (data21 === "none")) || (data21 === "log"))){
const err48 = {instancePath:instancePath+"/metrics/" + i0+"/transform",schemaPath:"#/definitions/rule/properties/transform/enum",keyword:"enum",params:{allowedValues: schema13.properties.transform.enum},message:"must be equal to one of the allowed values",schema:schema13.properties.transform.enum,parentSchema:schema13.properties.transform,data:data21};
if(vErrors === null){
vErrors = [err48];
}
else {
vErrors.push(err48);
}
errors++;
}
}
if(data12.aggregate !== undefined){
let data22 = data12.aggregate;
if(!(((((data22 === "auto") || (data22 === "median")) || (data22 === "mean")) || (data22 === "min")) || (data22 === "max"))){
const err49 = {instancePath:instancePath+"/metrics/" + i0+"/aggregate",schemaPath:"#/definitions/rule/properties/aggregate/enum",keyword:"enum",params:{allowedValues: schema13.properties.aggregate.enum},message:"must be equal to one of the allowed values",schema:schema13.properties.aggregate.enum,parentSchema:schema13.properties.aggregate,data:data22};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
}
if(data12["change-points"] !== undefined){
let data23 = data12["change-points"];
if(typeof data23 !== "boolean"){
const err50 = {instancePath:instancePath+"/metrics/" + i0+"/change-points",schemaPath:"#/definitions/rule/properties/change-points/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema13.properties["change-points"].type,parentSchema:schema13.properties["change-points"],data:data23};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
}
if(data12["shared-move"] !== undefined){
let data24 = data12["shared-move"];
if(typeof data24 !== "boolean"){
const err51 = {instancePath:instancePath+"/metrics/" + i0+"/shared-move",schemaPath:"#/definitions/rule/properties/shared-move/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema13.properties["shared-move"].type,parentSchema:schema13.properties["shared-move"],data:data24};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
}
if(data12.ignore !== undefined){
let data25 = data12.ignore;
if(typeof data25 !== "boolean"){
const err52 = {instancePath:instancePath+"/metrics/" + i0+"/ignore",schemaPath:"#/definitions/rule/properties/ignore/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema13.properties.ignore.type,parentSchema:schema13.properties.ignore,data:data25};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
}
if(data12["relative-to"] !== undefined){
let data26 = data12["relative-to"];
if(typeof data26 === "string"){
if(func5(data26) < 1){
const err53 = {instancePath:instancePath+"/metrics/" + i0+"/relative-to",schemaPath:"#/definitions/rule/properties/relative-to/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema13.properties["relative-to"],data:data26};
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
const err54 = {instancePath:instancePath+"/metrics/" + i0+"/relative-to",schemaPath:"#/definitions/rule/properties/relative-to/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema13.properties["relative-to"].type,parentSchema:schema13.properties["relative-to"],data:data26};
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
const err55 = {instancePath:instancePath+"/metrics/" + i0,schemaPath:"#/definitions/rule/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema13.type,parentSchema:schema13,data:data12};
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
}
if(data.groups !== undefined){
let data27 = data.groups;
if((!(Array.isArray(data27))) && (data27 !== null)){
const err56 = {instancePath:instancePath+"/groups",schemaPath:"#/properties/groups/type",keyword:"type",params:{type: schema11.properties.groups.type},message:"must be array,null",schema:schema11.properties.groups.type,parentSchema:schema11.properties.groups,data:data27};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
if(Array.isArray(data27)){
const len2 = data27.length;
for(let i2=0; i2<len2; i2++){
let data28 = data27[i2];
if(data28 && typeof data28 == "object" && !Array.isArray(data28)){
if(data28.name === undefined){
const err57 = {instancePath:instancePath+"/groups/" + i2,schemaPath:"#/definitions/group/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'",schema:schema14.required,parentSchema:schema14,data:data28};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
for(const key3 in data28){
if(!((key3 === "name") || (key3 === "match"))){
const err58 = {instancePath:instancePath+"/groups/" + i2,schemaPath:"#/definitions/group/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties",schema:false,parentSchema:schema14,data:data28};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
}
if(data28.name !== undefined){
let data29 = data28.name;
if(typeof data29 === "string"){
if(func5(data29) > 200){
const err59 = {instancePath:instancePath+"/groups/" + i2+"/name",schemaPath:"#/definitions/group/properties/name/maxLength",keyword:"maxLength",params:{limit: 200},message:"must NOT have more than 200 characters",schema:200,parentSchema:schema14.properties.name,data:data29};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
if(func5(data29) < 1){
const err60 = {instancePath:instancePath+"/groups/" + i2+"/name",schemaPath:"#/definitions/group/properties/name/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema14.properties.name,data:data29};
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
const err61 = {instancePath:instancePath+"/groups/" + i2+"/name",schemaPath:"#/definitions/group/properties/name/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema14.properties.name.type,parentSchema:schema14.properties.name,data:data29};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
}
if(data28.match !== undefined){
let data30 = data28.match;
const _errs75 = errors;
let valid16 = false;
const _errs76 = errors;
if(typeof data30 === "string"){
if(func5(data30) < 1){
const err62 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/definitions/group/properties/match/anyOf/0/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema14.properties.match.anyOf[0],data:data30};
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
const err63 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/definitions/group/properties/match/anyOf/0/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema14.properties.match.anyOf[0].type,parentSchema:schema14.properties.match.anyOf[0],data:data30};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
var _valid3 = _errs76 === errors;
valid16 = valid16 || _valid3;
if(!valid16){
const _errs78 = errors;
if(Array.isArray(data30)){
if(data30.length < 1){
const err64 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/definitions/group/properties/match/anyOf/1/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema14.properties.match.anyOf[1],data:data30};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
const len3 = data30.length;
for(let i3=0; i3<len3; i3++){
let data31 = data30[i3];
if(typeof data31 === "string"){
if(func5(data31) < 1){
const err65 = {instancePath:instancePath+"/groups/" + i2+"/match/" + i3,schemaPath:"#/definitions/group/properties/match/anyOf/1/items/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema14.properties.match.anyOf[1].items,data:data31};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
}
else {
const err66 = {instancePath:instancePath+"/groups/" + i2+"/match/" + i3,schemaPath:"#/definitions/group/properties/match/anyOf/1/items/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema14.properties.match.anyOf[1].items.type,parentSchema:schema14.properties.match.anyOf[1].items,data:data31};
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
const err67 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/definitions/group/properties/match/anyOf/1/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema14.properties.match.anyOf[1].type,parentSchema:schema14.properties.match.anyOf[1],data:data30};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
var _valid3 = _errs78 === errors;
valid16 = valid16 || _valid3;
}
if(!valid16){
const err68 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/definitions/group/properties/match/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema14.properties.match.anyOf,parentSchema:schema14.properties.match,data:data30};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
else {
errors = _errs75;
if(vErrors !== null){
if(_errs75){
vErrors.length = _errs75;
}
else {
vErrors = null;
}
}
}
}
}
else {
const err69 = {instancePath:instancePath+"/groups/" + i2,schemaPath:"#/definitions/group/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema14.type,parentSchema:schema14,data:data28};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
}
}
}
if(data.family !== undefined){
let data32 = data.family;
if(!((((data32 === "none") || (data32 === "bonferroni")) || (data32 === "holm")) || (data32 === "fdr"))){
const err70 = {instancePath:instancePath+"/family",schemaPath:"#/properties/family/enum",keyword:"enum",params:{allowedValues: schema11.properties.family.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.family.enum,parentSchema:schema11.properties.family,data:data32};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
}
if(data.budget !== undefined){
let data33 = data.budget;
if(typeof data33 === "string"){
if(!pattern0.test(data33)){
const err71 = {instancePath:instancePath+"/budget",schemaPath:"#/properties/budget/pattern",keyword:"pattern",params:{pattern: "^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"},message:"must match pattern \""+"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"+"\"",schema:"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$",parentSchema:schema11.properties.budget,data:data33};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
}
else {
const err72 = {instancePath:instancePath+"/budget",schemaPath:"#/properties/budget/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.budget.type,parentSchema:schema11.properties.budget,data:data33};
if(vErrors === null){
vErrors = [err72];
}
else {
vErrors.push(err72);
}
errors++;
}
}
if(data.unsettled !== undefined){
let data34 = data.unsettled;
if(!((data34 === "pass") || (data34 === "block"))){
const err73 = {instancePath:instancePath+"/unsettled",schemaPath:"#/properties/unsettled/enum",keyword:"enum",params:{allowedValues: schema11.properties.unsettled.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.unsettled.enum,parentSchema:schema11.properties.unsettled,data:data34};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
}
if(data.keep !== undefined){
let data35 = data.keep;
if(!(((typeof data35 == "number") && (!(data35 % 1) && !isNaN(data35))) && (isFinite(data35)))){
const err74 = {instancePath:instancePath+"/keep",schemaPath:"#/properties/keep/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.keep.type,parentSchema:schema11.properties.keep,data:data35};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
if((typeof data35 == "number") && (isFinite(data35))){
if(data35 < 1 || isNaN(data35)){
const err75 = {instancePath:instancePath+"/keep",schemaPath:"#/properties/keep/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema11.properties.keep,data:data35};
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
if(data["input-format"] !== undefined){
let data36 = data["input-format"];
if(!((((((data36 === "json") || (data36 === "jsonl")) || (data36 === "csv")) || (data36 === "openmetrics")) || (data36 === "gobench")) || (data36 === "junit"))){
const err76 = {instancePath:instancePath+"/input-format",schemaPath:"#/properties/input-format/enum",keyword:"enum",params:{allowedValues: schema11.properties["input-format"].enum},message:"must be equal to one of the allowed values",schema:schema11.properties["input-format"].enum,parentSchema:schema11.properties["input-format"],data:data36};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
}
if(data.limits !== undefined){
let data37 = data.limits;
if((!(data37 && typeof data37 == "object" && !Array.isArray(data37))) && (data37 !== null)){
const err77 = {instancePath:instancePath+"/limits",schemaPath:"#/definitions/limits/type",keyword:"type",params:{type: schema15.type},message:"must be object,null",schema:schema15.type,parentSchema:schema15,data:data37};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
if(data37 && typeof data37 == "object" && !Array.isArray(data37)){
for(const key4 in data37){
if(!((((key4 === "max-file-bytes") || (key4 === "max-line-length")) || (key4 === "max-metrics")) || (key4 === "max-samples"))){
const err78 = {instancePath:instancePath+"/limits",schemaPath:"#/definitions/limits/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties",schema:false,parentSchema:schema15,data:data37};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
}
if(data37["max-file-bytes"] !== undefined){
let data38 = data37["max-file-bytes"];
if(!(((typeof data38 == "number") && (!(data38 % 1) && !isNaN(data38))) && (isFinite(data38)))){
const err79 = {instancePath:instancePath+"/limits/max-file-bytes",schemaPath:"#/definitions/limits/properties/max-file-bytes/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema15.properties["max-file-bytes"].type,parentSchema:schema15.properties["max-file-bytes"],data:data38};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
if((typeof data38 == "number") && (isFinite(data38))){
if(data38 < 1 || isNaN(data38)){
const err80 = {instancePath:instancePath+"/limits/max-file-bytes",schemaPath:"#/definitions/limits/properties/max-file-bytes/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema15.properties["max-file-bytes"],data:data38};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
}
}
if(data37["max-line-length"] !== undefined){
let data39 = data37["max-line-length"];
if(!(((typeof data39 == "number") && (!(data39 % 1) && !isNaN(data39))) && (isFinite(data39)))){
const err81 = {instancePath:instancePath+"/limits/max-line-length",schemaPath:"#/definitions/limits/properties/max-line-length/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema15.properties["max-line-length"].type,parentSchema:schema15.properties["max-line-length"],data:data39};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
if((typeof data39 == "number") && (isFinite(data39))){
if(data39 < 1 || isNaN(data39)){
const err82 = {instancePath:instancePath+"/limits/max-line-length",schemaPath:"#/definitions/limits/properties/max-line-length/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema15.properties["max-line-length"],data:data39};
if(vErrors === null){
vErrors = [err82];
}
else {
vErrors.push(err82);
}
errors++;
}
}
}
if(data37["max-metrics"] !== undefined){
let data40 = data37["max-metrics"];
if(!(((typeof data40 == "number") && (!(data40 % 1) && !isNaN(data40))) && (isFinite(data40)))){
const err83 = {instancePath:instancePath+"/limits/max-metrics",schemaPath:"#/definitions/limits/properties/max-metrics/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema15.properties["max-metrics"].type,parentSchema:schema15.properties["max-metrics"],data:data40};
if(vErrors === null){
vErrors = [err83];
}
else {
vErrors.push(err83);
}
errors++;
}
if((typeof data40 == "number") && (isFinite(data40))){
if(data40 < 1 || isNaN(data40)){
const err84 = {instancePath:instancePath+"/limits/max-metrics",schemaPath:"#/definitions/limits/properties/max-metrics/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema15.properties["max-metrics"],data:data40};
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
if(data37["max-samples"] !== undefined){
let data41 = data37["max-samples"];
if(!(((typeof data41 == "number") && (!(data41 % 1) && !isNaN(data41))) && (isFinite(data41)))){
const err85 = {instancePath:instancePath+"/limits/max-samples",schemaPath:"#/definitions/limits/properties/max-samples/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema15.properties["max-samples"].type,parentSchema:schema15.properties["max-samples"],data:data41};
if(vErrors === null){
vErrors = [err85];
}
else {
vErrors.push(err85);
}
errors++;
}
if((typeof data41 == "number") && (isFinite(data41))){
if(data41 < 1 || isNaN(data41)){
const err86 = {instancePath:instancePath+"/limits/max-samples",schemaPath:"#/definitions/limits/properties/max-samples/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema15.properties["max-samples"],data:data41};
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
}
}
}
validate10.errors = vErrors;
return errors === 0;
}
