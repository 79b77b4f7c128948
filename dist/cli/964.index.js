export const id = 964;
export const ids = [964];
export const modules = {

/***/ 6964:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  wR: () => (/* binding */ checkedConfigTree),
  H2: () => (/* binding */ configFromTree),
  jW: () => (/* binding */ needsGlobLibrary)
});

// EXTERNAL MODULE: ./src/config/did-you-mean.ts
var did_you_mean = __webpack_require__(9255);
;// CONCATENATED MODULE: ./src/config/bellgate.schema.json
const bellgate_schema_namespaceObject = /*#__PURE__*/JSON.parse('{"$schema":"http://json-schema.org/draft-07/schema#","title":"Bellgate configuration (.github/bellgate.yml)","description":"All keys are optional. Rules under metrics apply in order; a later match overrides an earlier one.","type":["object","null"],"additionalProperties":false,"properties":{"defaults":{"description":"Settings for every metric, before rules apply.","type":["object","null"],"additionalProperties":false,"properties":{"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"default":0.01,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"default":"higher","examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric\'s unit, or a percent of the baseline mean.","default":"1%","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\\\.[0-9]*)?|\\\\.[0-9]+) ?%$","description":"a percent such as \\"1%\\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"default":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"default":60,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"default":8,"examples":[8]},"transform":{"description":"Scale the Gaussian is fitted on.","enum":["none","log"],"default":"none","examples":["log"]},"fit":{"description":"How the centre and spread are estimated.","enum":["mle","unbiased","robust"],"default":"mle","examples":["robust"]},"uncertainty":{"description":"predictive: Student-t predictive density for a new run; plug-in: the fitted Gaussian as is.","enum":["predictive","plug-in"],"default":"predictive","examples":["plug-in"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"default":"median","examples":["min"]},"change-points":{"description":"Fit only the runs since the last detected level change.","type":"boolean","default":true,"examples":[false]}}},"metrics":{"description":"Rules over metric names, applied in order.","type":["array","null"],"items":{"type":"object","additionalProperties":false,"required":["match"],"properties":{"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"a glob over metric names, or a list of them; \'*\' stays within one \'/\' segment, \'**\' crosses them; a leading \'!\' excludes","examples":["size/**"]},"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric\'s unit, or a percent of the baseline mean.","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\\\.[0-9]*)?|\\\\.[0-9]+) ?%$","description":"a percent such as \\"1%\\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"examples":[8]},"transform":{"description":"Scale the Gaussian is fitted on.","enum":["none","log"],"examples":["log"]},"fit":{"description":"How the centre and spread are estimated.","enum":["mle","unbiased","robust"],"examples":["robust"]},"uncertainty":{"description":"predictive: Student-t predictive density for a new run; plug-in: the fitted Gaussian as is.","enum":["predictive","plug-in"],"examples":["plug-in"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"examples":["min"]},"change-points":{"description":"Fit only the runs since the last detected level change.","type":"boolean","examples":[false]},"ignore":{"description":"Report matching metrics as ignored and never judge them.","type":"boolean","examples":[true]},"relative-to":{"description":"Divide matching metrics by this metric of the same run before fitting (a calibration benchmark).","type":"string","minLength":1,"examples":["latency/calibrate"]}}}},"groups":{"description":"Metrics that share a common move (for example the runner\'s speed).","type":["array","null"],"items":{"type":"object","additionalProperties":false,"required":["name"],"properties":{"name":{"description":"Name of the group, unique in the file.","type":"string","minLength":1,"maxLength":200,"examples":["latency"]},"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"Members of the group (default: the name followed by /**). a glob over metric names, or a list of them; \'*\' stays within one \'/\' segment, \'**\' crosses them; a leading \'!\' excludes","examples":["latency/*"]}}}},"family":{"description":"Correction for judging many metrics at once.","enum":["none","bonferroni","holm","fdr"],"default":"none","examples":["holm"]},"keep":{"description":"Newest runs kept in the history; trimming is the only deletion.","type":"integer","minimum":1,"default":500,"examples":[500]},"input-format":{"description":"Force the metric file format instead of detecting it from content.","enum":["json","jsonl","csv","openmetrics","gobench","junit"],"examples":["json"]},"limits":{"description":"Size limits for metric files.","type":["object","null"],"additionalProperties":false,"properties":{"max-file-bytes":{"description":"Largest metric file read, in bytes.","type":"integer","minimum":1,"default":67108864,"examples":[67108864]},"max-line-length":{"description":"Longest line in a metric file, in characters.","type":"integer","minimum":1,"default":1048576,"examples":[1048576]},"max-metrics":{"description":"Most metrics in one run.","type":"integer","minimum":1,"default":100000,"examples":[100000]}}}}}');
;// CONCATENATED MODULE: ./src/config/schema-validator.generated.js
// GENERATED FILE, do not edit. The validator of src/config/bellgate.schema.json, written by ajv
// standalone code generation (options: allErrors, verbose, strict).
// Regenerate after changing the schema: npm run gen:config-validator
// (= node test/gen-config-validator.mjs); test/config/validator-fresh.test.ts fails while it is stale.
/* eslint-disable */
const validate = validate10;
/* harmony default export */ const schema_validator_generated = ((/* unused pure expression or super */ null && (validate10)));
const schema11 = {"$schema":"http://json-schema.org/draft-07/schema#","title":"Bellgate configuration (.github/bellgate.yml)","description":"All keys are optional. Rules under metrics apply in order; a later match overrides an earlier one.","type":["object","null"],"additionalProperties":false,"properties":{"defaults":{"description":"Settings for every metric, before rules apply.","type":["object","null"],"additionalProperties":false,"properties":{"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"default":0.01,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"default":"higher","examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","default":"1%","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"default":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"default":60,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"default":8,"examples":[8]},"transform":{"description":"Scale the Gaussian is fitted on.","enum":["none","log"],"default":"none","examples":["log"]},"fit":{"description":"How the centre and spread are estimated.","enum":["mle","unbiased","robust"],"default":"mle","examples":["robust"]},"uncertainty":{"description":"predictive: Student-t predictive density for a new run; plug-in: the fitted Gaussian as is.","enum":["predictive","plug-in"],"default":"predictive","examples":["plug-in"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"default":"median","examples":["min"]},"change-points":{"description":"Fit only the runs since the last detected level change.","type":"boolean","default":true,"examples":[false]}}},"metrics":{"description":"Rules over metric names, applied in order.","type":["array","null"],"items":{"type":"object","additionalProperties":false,"required":["match"],"properties":{"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["size/**"]},"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric's unit, or a percent of the baseline mean.","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$","description":"a percent such as \"1%\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"examples":[8]},"transform":{"description":"Scale the Gaussian is fitted on.","enum":["none","log"],"examples":["log"]},"fit":{"description":"How the centre and spread are estimated.","enum":["mle","unbiased","robust"],"examples":["robust"]},"uncertainty":{"description":"predictive: Student-t predictive density for a new run; plug-in: the fitted Gaussian as is.","enum":["predictive","plug-in"],"examples":["plug-in"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"examples":["min"]},"change-points":{"description":"Fit only the runs since the last detected level change.","type":"boolean","examples":[false]},"ignore":{"description":"Report matching metrics as ignored and never judge them.","type":"boolean","examples":[true]},"relative-to":{"description":"Divide matching metrics by this metric of the same run before fitting (a calibration benchmark).","type":"string","minLength":1,"examples":["latency/calibrate"]}}}},"groups":{"description":"Metrics that share a common move (for example the runner's speed).","type":["array","null"],"items":{"type":"object","additionalProperties":false,"required":["name"],"properties":{"name":{"description":"Name of the group, unique in the file.","type":"string","minLength":1,"maxLength":200,"examples":["latency"]},"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"Members of the group (default: the name followed by /**). a glob over metric names, or a list of them; '*' stays within one '/' segment, '**' crosses them; a leading '!' excludes","examples":["latency/*"]}}}},"family":{"description":"Correction for judging many metrics at once.","enum":["none","bonferroni","holm","fdr"],"default":"none","examples":["holm"]},"keep":{"description":"Newest runs kept in the history; trimming is the only deletion.","type":"integer","minimum":1,"default":500,"examples":[500]},"input-format":{"description":"Force the metric file format instead of detecting it from content.","enum":["json","jsonl","csv","openmetrics","gobench","junit"],"examples":["json"]},"limits":{"description":"Size limits for metric files.","type":["object","null"],"additionalProperties":false,"properties":{"max-file-bytes":{"description":"Largest metric file read, in bytes.","type":"integer","minimum":1,"default":67108864,"examples":[67108864]},"max-line-length":{"description":"Longest line in a metric file, in characters.","type":"integer","minimum":1,"default":1048576,"examples":[1048576]},"max-metrics":{"description":"Most metrics in one run.","type":"integer","minimum":1,"default":100000,"examples":[100000]}}}}};
const func2 = Object.prototype.hasOwnProperty;
const func4 = (function ucs2length(str) {
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
if(!(((((((key0 === "defaults") || (key0 === "metrics")) || (key0 === "groups")) || (key0 === "family")) || (key0 === "keep")) || (key0 === "input-format")) || (key0 === "limits"))){
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
const err2 = {instancePath:instancePath+"/defaults",schemaPath:"#/properties/defaults/type",keyword:"type",params:{type: schema11.properties.defaults.type},message:"must be object,null",schema:schema11.properties.defaults.type,parentSchema:schema11.properties.defaults,data:data0};
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
if(!(func2.call(schema11.properties.defaults.properties, key1))){
const err3 = {instancePath:instancePath+"/defaults",schemaPath:"#/properties/defaults/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema11.properties.defaults,data:data0};
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
const err4 = {instancePath:instancePath+"/defaults/cutoff",schemaPath:"#/properties/defaults/properties/cutoff/exclusiveMaximum",keyword:"exclusiveMaximum",params:{comparison: "<", limit: 1},message:"must be < 1",schema:1,parentSchema:schema11.properties.defaults.properties.cutoff,data:data1};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if(data1 <= 0 || isNaN(data1)){
const err5 = {instancePath:instancePath+"/defaults/cutoff",schemaPath:"#/properties/defaults/properties/cutoff/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema11.properties.defaults.properties.cutoff,data:data1};
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
const err6 = {instancePath:instancePath+"/defaults/cutoff",schemaPath:"#/properties/defaults/properties/cutoff/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema11.properties.defaults.properties.cutoff.type,parentSchema:schema11.properties.defaults.properties.cutoff,data:data1};
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
const err7 = {instancePath:instancePath+"/defaults/worse",schemaPath:"#/properties/defaults/properties/worse/enum",keyword:"enum",params:{allowedValues: schema11.properties.defaults.properties.worse.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.defaults.properties.worse.enum,parentSchema:schema11.properties.defaults.properties.worse,data:data2};
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
const _errs9 = errors;
let valid2 = false;
const _errs10 = errors;
if((typeof data3 == "number") && (isFinite(data3))){
if(data3 < 0 || isNaN(data3)){
const err8 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/properties/defaults/properties/tolerance/anyOf/0/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema11.properties.defaults.properties.tolerance.anyOf[0],data:data3};
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
const err9 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/properties/defaults/properties/tolerance/anyOf/0/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema11.properties.defaults.properties.tolerance.anyOf[0].type,parentSchema:schema11.properties.defaults.properties.tolerance.anyOf[0],data:data3};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
var _valid0 = _errs10 === errors;
valid2 = valid2 || _valid0;
if(!valid2){
const _errs12 = errors;
if(typeof data3 === "string"){
if(!pattern0.test(data3)){
const err10 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/properties/defaults/properties/tolerance/anyOf/1/pattern",keyword:"pattern",params:{pattern: "^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"},message:"must match pattern \""+"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"+"\"",schema:"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$",parentSchema:schema11.properties.defaults.properties.tolerance.anyOf[1],data:data3};
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
const err11 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/properties/defaults/properties/tolerance/anyOf/1/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.defaults.properties.tolerance.anyOf[1].type,parentSchema:schema11.properties.defaults.properties.tolerance.anyOf[1],data:data3};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
var _valid0 = _errs12 === errors;
valid2 = valid2 || _valid0;
}
if(!valid2){
const err12 = {instancePath:instancePath+"/defaults/tolerance",schemaPath:"#/properties/defaults/properties/tolerance/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema11.properties.defaults.properties.tolerance.anyOf,parentSchema:schema11.properties.defaults.properties.tolerance,data:data3};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
else {
errors = _errs9;
if(vErrors !== null){
if(_errs9){
vErrors.length = _errs9;
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
const err13 = {instancePath:instancePath+"/defaults/resolution",schemaPath:"#/properties/defaults/properties/resolution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema11.properties.defaults.properties.resolution,data:data4};
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
const err14 = {instancePath:instancePath+"/defaults/resolution",schemaPath:"#/properties/defaults/properties/resolution/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema11.properties.defaults.properties.resolution.type,parentSchema:schema11.properties.defaults.properties.resolution,data:data4};
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
const err15 = {instancePath:instancePath+"/defaults/window",schemaPath:"#/properties/defaults/properties/window/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.defaults.properties.window.type,parentSchema:schema11.properties.defaults.properties.window,data:data5};
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
const err16 = {instancePath:instancePath+"/defaults/window",schemaPath:"#/properties/defaults/properties/window/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema11.properties.defaults.properties.window,data:data5};
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
const err17 = {instancePath:instancePath+"/defaults/min-runs",schemaPath:"#/properties/defaults/properties/min-runs/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.defaults.properties["min-runs"].type,parentSchema:schema11.properties.defaults.properties["min-runs"],data:data6};
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
const err18 = {instancePath:instancePath+"/defaults/min-runs",schemaPath:"#/properties/defaults/properties/min-runs/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema11.properties.defaults.properties["min-runs"],data:data6};
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
if(!((data7 === "none") || (data7 === "log"))){
const err19 = {instancePath:instancePath+"/defaults/transform",schemaPath:"#/properties/defaults/properties/transform/enum",keyword:"enum",params:{allowedValues: schema11.properties.defaults.properties.transform.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.defaults.properties.transform.enum,parentSchema:schema11.properties.defaults.properties.transform,data:data7};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data0.fit !== undefined){
let data8 = data0.fit;
if(!(((data8 === "mle") || (data8 === "unbiased")) || (data8 === "robust"))){
const err20 = {instancePath:instancePath+"/defaults/fit",schemaPath:"#/properties/defaults/properties/fit/enum",keyword:"enum",params:{allowedValues: schema11.properties.defaults.properties.fit.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.defaults.properties.fit.enum,parentSchema:schema11.properties.defaults.properties.fit,data:data8};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
if(data0.uncertainty !== undefined){
let data9 = data0.uncertainty;
if(!((data9 === "predictive") || (data9 === "plug-in"))){
const err21 = {instancePath:instancePath+"/defaults/uncertainty",schemaPath:"#/properties/defaults/properties/uncertainty/enum",keyword:"enum",params:{allowedValues: schema11.properties.defaults.properties.uncertainty.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.defaults.properties.uncertainty.enum,parentSchema:schema11.properties.defaults.properties.uncertainty,data:data9};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
if(data0.aggregate !== undefined){
let data10 = data0.aggregate;
if(!((((data10 === "median") || (data10 === "mean")) || (data10 === "min")) || (data10 === "max"))){
const err22 = {instancePath:instancePath+"/defaults/aggregate",schemaPath:"#/properties/defaults/properties/aggregate/enum",keyword:"enum",params:{allowedValues: schema11.properties.defaults.properties.aggregate.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.defaults.properties.aggregate.enum,parentSchema:schema11.properties.defaults.properties.aggregate,data:data10};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
if(data0["change-points"] !== undefined){
let data11 = data0["change-points"];
if(typeof data11 !== "boolean"){
const err23 = {instancePath:instancePath+"/defaults/change-points",schemaPath:"#/properties/defaults/properties/change-points/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema11.properties.defaults.properties["change-points"].type,parentSchema:schema11.properties.defaults.properties["change-points"],data:data11};
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
}
if(data.metrics !== undefined){
let data12 = data.metrics;
if((!(Array.isArray(data12))) && (data12 !== null)){
const err24 = {instancePath:instancePath+"/metrics",schemaPath:"#/properties/metrics/type",keyword:"type",params:{type: schema11.properties.metrics.type},message:"must be array,null",schema:schema11.properties.metrics.type,parentSchema:schema11.properties.metrics,data:data12};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
if(Array.isArray(data12)){
const len0 = data12.length;
for(let i0=0; i0<len0; i0++){
let data13 = data12[i0];
if(data13 && typeof data13 == "object" && !Array.isArray(data13)){
if(data13.match === undefined){
const err25 = {instancePath:instancePath+"/metrics/" + i0,schemaPath:"#/properties/metrics/items/required",keyword:"required",params:{missingProperty: "match"},message:"must have required property '"+"match"+"'",schema:schema11.properties.metrics.items.required,parentSchema:schema11.properties.metrics.items,data:data13};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
for(const key2 in data13){
if(!(func2.call(schema11.properties.metrics.items.properties, key2))){
const err26 = {instancePath:instancePath+"/metrics/" + i0,schemaPath:"#/properties/metrics/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties",schema:false,parentSchema:schema11.properties.metrics.items,data:data13};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
if(data13.match !== undefined){
let data14 = data13.match;
const _errs32 = errors;
let valid6 = false;
const _errs33 = errors;
if(typeof data14 === "string"){
if(func4(data14) < 1){
const err27 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/properties/metrics/items/properties/match/anyOf/0/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema11.properties.metrics.items.properties.match.anyOf[0],data:data14};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
}
else {
const err28 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/properties/metrics/items/properties/match/anyOf/0/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.metrics.items.properties.match.anyOf[0].type,parentSchema:schema11.properties.metrics.items.properties.match.anyOf[0],data:data14};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
var _valid1 = _errs33 === errors;
valid6 = valid6 || _valid1;
if(!valid6){
const _errs35 = errors;
if(Array.isArray(data14)){
if(data14.length < 1){
const err29 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/properties/metrics/items/properties/match/anyOf/1/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema11.properties.metrics.items.properties.match.anyOf[1],data:data14};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
const len1 = data14.length;
for(let i1=0; i1<len1; i1++){
let data15 = data14[i1];
if(typeof data15 === "string"){
if(func4(data15) < 1){
const err30 = {instancePath:instancePath+"/metrics/" + i0+"/match/" + i1,schemaPath:"#/properties/metrics/items/properties/match/anyOf/1/items/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema11.properties.metrics.items.properties.match.anyOf[1].items,data:data15};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
else {
const err31 = {instancePath:instancePath+"/metrics/" + i0+"/match/" + i1,schemaPath:"#/properties/metrics/items/properties/match/anyOf/1/items/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.metrics.items.properties.match.anyOf[1].items.type,parentSchema:schema11.properties.metrics.items.properties.match.anyOf[1].items,data:data15};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
}
}
else {
const err32 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/properties/metrics/items/properties/match/anyOf/1/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema11.properties.metrics.items.properties.match.anyOf[1].type,parentSchema:schema11.properties.metrics.items.properties.match.anyOf[1],data:data14};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
var _valid1 = _errs35 === errors;
valid6 = valid6 || _valid1;
}
if(!valid6){
const err33 = {instancePath:instancePath+"/metrics/" + i0+"/match",schemaPath:"#/properties/metrics/items/properties/match/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema11.properties.metrics.items.properties.match.anyOf,parentSchema:schema11.properties.metrics.items.properties.match,data:data14};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
else {
errors = _errs32;
if(vErrors !== null){
if(_errs32){
vErrors.length = _errs32;
}
else {
vErrors = null;
}
}
}
}
if(data13.cutoff !== undefined){
let data16 = data13.cutoff;
if((typeof data16 == "number") && (isFinite(data16))){
if(data16 >= 1 || isNaN(data16)){
const err34 = {instancePath:instancePath+"/metrics/" + i0+"/cutoff",schemaPath:"#/properties/metrics/items/properties/cutoff/exclusiveMaximum",keyword:"exclusiveMaximum",params:{comparison: "<", limit: 1},message:"must be < 1",schema:1,parentSchema:schema11.properties.metrics.items.properties.cutoff,data:data16};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
if(data16 <= 0 || isNaN(data16)){
const err35 = {instancePath:instancePath+"/metrics/" + i0+"/cutoff",schemaPath:"#/properties/metrics/items/properties/cutoff/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema11.properties.metrics.items.properties.cutoff,data:data16};
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
const err36 = {instancePath:instancePath+"/metrics/" + i0+"/cutoff",schemaPath:"#/properties/metrics/items/properties/cutoff/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema11.properties.metrics.items.properties.cutoff.type,parentSchema:schema11.properties.metrics.items.properties.cutoff,data:data16};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
if(data13.worse !== undefined){
let data17 = data13.worse;
if(!(((data17 === "higher") || (data17 === "lower")) || (data17 === "both"))){
const err37 = {instancePath:instancePath+"/metrics/" + i0+"/worse",schemaPath:"#/properties/metrics/items/properties/worse/enum",keyword:"enum",params:{allowedValues: schema11.properties.metrics.items.properties.worse.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.metrics.items.properties.worse.enum,parentSchema:schema11.properties.metrics.items.properties.worse,data:data17};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
}
if(data13.tolerance !== undefined){
let data18 = data13.tolerance;
const _errs43 = errors;
let valid9 = false;
const _errs44 = errors;
if((typeof data18 == "number") && (isFinite(data18))){
if(data18 < 0 || isNaN(data18)){
const err38 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/properties/metrics/items/properties/tolerance/anyOf/0/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema11.properties.metrics.items.properties.tolerance.anyOf[0],data:data18};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
}
else {
const err39 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/properties/metrics/items/properties/tolerance/anyOf/0/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema11.properties.metrics.items.properties.tolerance.anyOf[0].type,parentSchema:schema11.properties.metrics.items.properties.tolerance.anyOf[0],data:data18};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
var _valid2 = _errs44 === errors;
valid9 = valid9 || _valid2;
if(!valid9){
const _errs46 = errors;
if(typeof data18 === "string"){
if(!pattern0.test(data18)){
const err40 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/properties/metrics/items/properties/tolerance/anyOf/1/pattern",keyword:"pattern",params:{pattern: "^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"},message:"must match pattern \""+"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$"+"\"",schema:"^(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+) ?%$",parentSchema:schema11.properties.metrics.items.properties.tolerance.anyOf[1],data:data18};
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
const err41 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/properties/metrics/items/properties/tolerance/anyOf/1/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.metrics.items.properties.tolerance.anyOf[1].type,parentSchema:schema11.properties.metrics.items.properties.tolerance.anyOf[1],data:data18};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
var _valid2 = _errs46 === errors;
valid9 = valid9 || _valid2;
}
if(!valid9){
const err42 = {instancePath:instancePath+"/metrics/" + i0+"/tolerance",schemaPath:"#/properties/metrics/items/properties/tolerance/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema11.properties.metrics.items.properties.tolerance.anyOf,parentSchema:schema11.properties.metrics.items.properties.tolerance,data:data18};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
else {
errors = _errs43;
if(vErrors !== null){
if(_errs43){
vErrors.length = _errs43;
}
else {
vErrors = null;
}
}
}
}
if(data13.resolution !== undefined){
let data19 = data13.resolution;
if((typeof data19 == "number") && (isFinite(data19))){
if(data19 < 0 || isNaN(data19)){
const err43 = {instancePath:instancePath+"/metrics/" + i0+"/resolution",schemaPath:"#/properties/metrics/items/properties/resolution/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema11.properties.metrics.items.properties.resolution,data:data19};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
}
else {
const err44 = {instancePath:instancePath+"/metrics/" + i0+"/resolution",schemaPath:"#/properties/metrics/items/properties/resolution/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema11.properties.metrics.items.properties.resolution.type,parentSchema:schema11.properties.metrics.items.properties.resolution,data:data19};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
}
if(data13.window !== undefined){
let data20 = data13.window;
if(!(((typeof data20 == "number") && (!(data20 % 1) && !isNaN(data20))) && (isFinite(data20)))){
const err45 = {instancePath:instancePath+"/metrics/" + i0+"/window",schemaPath:"#/properties/metrics/items/properties/window/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.metrics.items.properties.window.type,parentSchema:schema11.properties.metrics.items.properties.window,data:data20};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
if((typeof data20 == "number") && (isFinite(data20))){
if(data20 < 2 || isNaN(data20)){
const err46 = {instancePath:instancePath+"/metrics/" + i0+"/window",schemaPath:"#/properties/metrics/items/properties/window/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema11.properties.metrics.items.properties.window,data:data20};
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
if(data13["min-runs"] !== undefined){
let data21 = data13["min-runs"];
if(!(((typeof data21 == "number") && (!(data21 % 1) && !isNaN(data21))) && (isFinite(data21)))){
const err47 = {instancePath:instancePath+"/metrics/" + i0+"/min-runs",schemaPath:"#/properties/metrics/items/properties/min-runs/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.metrics.items.properties["min-runs"].type,parentSchema:schema11.properties.metrics.items.properties["min-runs"],data:data21};
if(vErrors === null){
vErrors = [err47];
}
else {
vErrors.push(err47);
}
errors++;
}
if((typeof data21 == "number") && (isFinite(data21))){
if(data21 < 2 || isNaN(data21)){
const err48 = {instancePath:instancePath+"/metrics/" + i0+"/min-runs",schemaPath:"#/properties/metrics/items/properties/min-runs/minimum",keyword:"minimum",params:{comparison: ">=", limit: 2},message:"must be >= 2",schema:2,parentSchema:schema11.properties.metrics.items.properties["min-runs"],data:data21};
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
if(data13.transform !== undefined){
let data22 = data13.transform;
if(!((data22 === "none") || (data22 === "log"))){
const err49 = {instancePath:instancePath+"/metrics/" + i0+"/transform",schemaPath:"#/properties/metrics/items/properties/transform/enum",keyword:"enum",params:{allowedValues: schema11.properties.metrics.items.properties.transform.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.metrics.items.properties.transform.enum,parentSchema:schema11.properties.metrics.items.properties.transform,data:data22};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
}
if(data13.fit !== undefined){
let data23 = data13.fit;
if(!(((data23 === "mle") || (data23 === "unbiased")) || (data23 === "robust"))){
const err50 = {instancePath:instancePath+"/metrics/" + i0+"/fit",schemaPath:"#/properties/metrics/items/properties/fit/enum",keyword:"enum",params:{allowedValues: schema11.properties.metrics.items.properties.fit.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.metrics.items.properties.fit.enum,parentSchema:schema11.properties.metrics.items.properties.fit,data:data23};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
}
if(data13.uncertainty !== undefined){
let data24 = data13.uncertainty;
if(!((data24 === "predictive") || (data24 === "plug-in"))){
const err51 = {instancePath:instancePath+"/metrics/" + i0+"/uncertainty",schemaPath:"#/properties/metrics/items/properties/uncertainty/enum",keyword:"enum",params:{allowedValues: schema11.properties.metrics.items.properties.uncertainty.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.metrics.items.properties.uncertainty.enum,parentSchema:schema11.properties.metrics.items.properties.uncertainty,data:data24};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
}
if(data13.aggregate !== undefined){
let data25 = data13.aggregate;
if(!((((data25 === "median") || (data25 === "mean")) || (data25 === "min")) || (data25 === "max"))){
const err52 = {instancePath:instancePath+"/metrics/" + i0+"/aggregate",schemaPath:"#/properties/metrics/items/properties/aggregate/enum",keyword:"enum",params:{allowedValues: schema11.properties.metrics.items.properties.aggregate.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.metrics.items.properties.aggregate.enum,parentSchema:schema11.properties.metrics.items.properties.aggregate,data:data25};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
}
if(data13["change-points"] !== undefined){
let data26 = data13["change-points"];
if(typeof data26 !== "boolean"){
const err53 = {instancePath:instancePath+"/metrics/" + i0+"/change-points",schemaPath:"#/properties/metrics/items/properties/change-points/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema11.properties.metrics.items.properties["change-points"].type,parentSchema:schema11.properties.metrics.items.properties["change-points"],data:data26};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
}
if(data13.ignore !== undefined){
let data27 = data13.ignore;
if(typeof data27 !== "boolean"){
const err54 = {instancePath:instancePath+"/metrics/" + i0+"/ignore",schemaPath:"#/properties/metrics/items/properties/ignore/type",keyword:"type",params:{type: "boolean"},message:"must be boolean",schema:schema11.properties.metrics.items.properties.ignore.type,parentSchema:schema11.properties.metrics.items.properties.ignore,data:data27};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
}
if(data13["relative-to"] !== undefined){
let data28 = data13["relative-to"];
if(typeof data28 === "string"){
if(func4(data28) < 1){
const err55 = {instancePath:instancePath+"/metrics/" + i0+"/relative-to",schemaPath:"#/properties/metrics/items/properties/relative-to/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema11.properties.metrics.items.properties["relative-to"],data:data28};
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
const err56 = {instancePath:instancePath+"/metrics/" + i0+"/relative-to",schemaPath:"#/properties/metrics/items/properties/relative-to/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.metrics.items.properties["relative-to"].type,parentSchema:schema11.properties.metrics.items.properties["relative-to"],data:data28};
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
const err57 = {instancePath:instancePath+"/metrics/" + i0,schemaPath:"#/properties/metrics/items/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema11.properties.metrics.items.type,parentSchema:schema11.properties.metrics.items,data:data13};
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
}
if(data.groups !== undefined){
let data29 = data.groups;
if((!(Array.isArray(data29))) && (data29 !== null)){
const err58 = {instancePath:instancePath+"/groups",schemaPath:"#/properties/groups/type",keyword:"type",params:{type: schema11.properties.groups.type},message:"must be array,null",schema:schema11.properties.groups.type,parentSchema:schema11.properties.groups,data:data29};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
if(Array.isArray(data29)){
const len2 = data29.length;
for(let i2=0; i2<len2; i2++){
let data30 = data29[i2];
if(data30 && typeof data30 == "object" && !Array.isArray(data30)){
if(data30.name === undefined){
const err59 = {instancePath:instancePath+"/groups/" + i2,schemaPath:"#/properties/groups/items/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'",schema:schema11.properties.groups.items.required,parentSchema:schema11.properties.groups.items,data:data30};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
for(const key3 in data30){
if(!((key3 === "name") || (key3 === "match"))){
const err60 = {instancePath:instancePath+"/groups/" + i2,schemaPath:"#/properties/groups/items/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties",schema:false,parentSchema:schema11.properties.groups.items,data:data30};
if(vErrors === null){
vErrors = [err60];
}
else {
vErrors.push(err60);
}
errors++;
}
}
if(data30.name !== undefined){
let data31 = data30.name;
if(typeof data31 === "string"){
if(func4(data31) > 200){
const err61 = {instancePath:instancePath+"/groups/" + i2+"/name",schemaPath:"#/properties/groups/items/properties/name/maxLength",keyword:"maxLength",params:{limit: 200},message:"must NOT have more than 200 characters",schema:200,parentSchema:schema11.properties.groups.items.properties.name,data:data31};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
if(func4(data31) < 1){
const err62 = {instancePath:instancePath+"/groups/" + i2+"/name",schemaPath:"#/properties/groups/items/properties/name/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema11.properties.groups.items.properties.name,data:data31};
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
const err63 = {instancePath:instancePath+"/groups/" + i2+"/name",schemaPath:"#/properties/groups/items/properties/name/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.groups.items.properties.name.type,parentSchema:schema11.properties.groups.items.properties.name,data:data31};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
}
if(data30.match !== undefined){
let data32 = data30.match;
const _errs72 = errors;
let valid13 = false;
const _errs73 = errors;
if(typeof data32 === "string"){
if(func4(data32) < 1){
const err64 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/properties/groups/items/properties/match/anyOf/0/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema11.properties.groups.items.properties.match.anyOf[0],data:data32};
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
const err65 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/properties/groups/items/properties/match/anyOf/0/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.groups.items.properties.match.anyOf[0].type,parentSchema:schema11.properties.groups.items.properties.match.anyOf[0],data:data32};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
var _valid3 = _errs73 === errors;
valid13 = valid13 || _valid3;
if(!valid13){
const _errs75 = errors;
if(Array.isArray(data32)){
if(data32.length < 1){
const err66 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/properties/groups/items/properties/match/anyOf/1/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema11.properties.groups.items.properties.match.anyOf[1],data:data32};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
const len3 = data32.length;
for(let i3=0; i3<len3; i3++){
let data33 = data32[i3];
if(typeof data33 === "string"){
if(func4(data33) < 1){
const err67 = {instancePath:instancePath+"/groups/" + i2+"/match/" + i3,schemaPath:"#/properties/groups/items/properties/match/anyOf/1/items/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema11.properties.groups.items.properties.match.anyOf[1].items,data:data33};
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
const err68 = {instancePath:instancePath+"/groups/" + i2+"/match/" + i3,schemaPath:"#/properties/groups/items/properties/match/anyOf/1/items/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema11.properties.groups.items.properties.match.anyOf[1].items.type,parentSchema:schema11.properties.groups.items.properties.match.anyOf[1].items,data:data33};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
}
}
else {
const err69 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/properties/groups/items/properties/match/anyOf/1/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema11.properties.groups.items.properties.match.anyOf[1].type,parentSchema:schema11.properties.groups.items.properties.match.anyOf[1],data:data32};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
var _valid3 = _errs75 === errors;
valid13 = valid13 || _valid3;
}
if(!valid13){
const err70 = {instancePath:instancePath+"/groups/" + i2+"/match",schemaPath:"#/properties/groups/items/properties/match/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema11.properties.groups.items.properties.match.anyOf,parentSchema:schema11.properties.groups.items.properties.match,data:data32};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
else {
errors = _errs72;
if(vErrors !== null){
if(_errs72){
vErrors.length = _errs72;
}
else {
vErrors = null;
}
}
}
}
}
else {
const err71 = {instancePath:instancePath+"/groups/" + i2,schemaPath:"#/properties/groups/items/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema11.properties.groups.items.type,parentSchema:schema11.properties.groups.items,data:data30};
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
}
if(data.family !== undefined){
let data34 = data.family;
if(!((((data34 === "none") || (data34 === "bonferroni")) || (data34 === "holm")) || (data34 === "fdr"))){
const err72 = {instancePath:instancePath+"/family",schemaPath:"#/properties/family/enum",keyword:"enum",params:{allowedValues: schema11.properties.family.enum},message:"must be equal to one of the allowed values",schema:schema11.properties.family.enum,parentSchema:schema11.properties.family,data:data34};
if(vErrors === null){
vErrors = [err72];
}
else {
vErrors.push(err72);
}
errors++;
}
}
if(data.keep !== undefined){
let data35 = data.keep;
if(!(((typeof data35 == "number") && (!(data35 % 1) && !isNaN(data35))) && (isFinite(data35)))){
const err73 = {instancePath:instancePath+"/keep",schemaPath:"#/properties/keep/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.keep.type,parentSchema:schema11.properties.keep,data:data35};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
if((typeof data35 == "number") && (isFinite(data35))){
if(data35 < 1 || isNaN(data35)){
const err74 = {instancePath:instancePath+"/keep",schemaPath:"#/properties/keep/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema11.properties.keep,data:data35};
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
if(data["input-format"] !== undefined){
let data36 = data["input-format"];
if(!((((((data36 === "json") || (data36 === "jsonl")) || (data36 === "csv")) || (data36 === "openmetrics")) || (data36 === "gobench")) || (data36 === "junit"))){
const err75 = {instancePath:instancePath+"/input-format",schemaPath:"#/properties/input-format/enum",keyword:"enum",params:{allowedValues: schema11.properties["input-format"].enum},message:"must be equal to one of the allowed values",schema:schema11.properties["input-format"].enum,parentSchema:schema11.properties["input-format"],data:data36};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
}
if(data.limits !== undefined){
let data37 = data.limits;
if((!(data37 && typeof data37 == "object" && !Array.isArray(data37))) && (data37 !== null)){
const err76 = {instancePath:instancePath+"/limits",schemaPath:"#/properties/limits/type",keyword:"type",params:{type: schema11.properties.limits.type},message:"must be object,null",schema:schema11.properties.limits.type,parentSchema:schema11.properties.limits,data:data37};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
if(data37 && typeof data37 == "object" && !Array.isArray(data37)){
for(const key4 in data37){
if(!(((key4 === "max-file-bytes") || (key4 === "max-line-length")) || (key4 === "max-metrics"))){
const err77 = {instancePath:instancePath+"/limits",schemaPath:"#/properties/limits/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties",schema:false,parentSchema:schema11.properties.limits,data:data37};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
}
if(data37["max-file-bytes"] !== undefined){
let data38 = data37["max-file-bytes"];
if(!(((typeof data38 == "number") && (!(data38 % 1) && !isNaN(data38))) && (isFinite(data38)))){
const err78 = {instancePath:instancePath+"/limits/max-file-bytes",schemaPath:"#/properties/limits/properties/max-file-bytes/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.limits.properties["max-file-bytes"].type,parentSchema:schema11.properties.limits.properties["max-file-bytes"],data:data38};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
if((typeof data38 == "number") && (isFinite(data38))){
if(data38 < 1 || isNaN(data38)){
const err79 = {instancePath:instancePath+"/limits/max-file-bytes",schemaPath:"#/properties/limits/properties/max-file-bytes/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema11.properties.limits.properties["max-file-bytes"],data:data38};
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
if(data37["max-line-length"] !== undefined){
let data39 = data37["max-line-length"];
if(!(((typeof data39 == "number") && (!(data39 % 1) && !isNaN(data39))) && (isFinite(data39)))){
const err80 = {instancePath:instancePath+"/limits/max-line-length",schemaPath:"#/properties/limits/properties/max-line-length/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.limits.properties["max-line-length"].type,parentSchema:schema11.properties.limits.properties["max-line-length"],data:data39};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
if((typeof data39 == "number") && (isFinite(data39))){
if(data39 < 1 || isNaN(data39)){
const err81 = {instancePath:instancePath+"/limits/max-line-length",schemaPath:"#/properties/limits/properties/max-line-length/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema11.properties.limits.properties["max-line-length"],data:data39};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
}
}
if(data37["max-metrics"] !== undefined){
let data40 = data37["max-metrics"];
if(!(((typeof data40 == "number") && (!(data40 % 1) && !isNaN(data40))) && (isFinite(data40)))){
const err82 = {instancePath:instancePath+"/limits/max-metrics",schemaPath:"#/properties/limits/properties/max-metrics/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema11.properties.limits.properties["max-metrics"].type,parentSchema:schema11.properties.limits.properties["max-metrics"],data:data40};
if(vErrors === null){
vErrors = [err82];
}
else {
vErrors.push(err82);
}
errors++;
}
if((typeof data40 == "number") && (isFinite(data40))){
if(data40 < 1 || isNaN(data40)){
const err83 = {instancePath:instancePath+"/limits/max-metrics",schemaPath:"#/properties/limits/properties/max-metrics/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema11.properties.limits.properties["max-metrics"],data:data40};
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
}
}
}
validate10.errors = vErrors;
return errors === 0;
}

;// CONCATENATED MODULE: ./src/config/schema.ts


/**
 * The JSON Schema of `.github/bellgate.yml` (draft-07), the same file that ships in the package
 * for editors. Draft-07 because it is what editor YAML plugins and ajv's default build support best.
 */
const configSchema = bellgate_schema_namespaceObject;
/**
 * Validates plain data (from the YAML tree) against the config schema and returns every error
 * (ajv allErrors, verbose so each error carries its schema node for wording).
 * The validator is ajv's own code for this schema, generated ahead of time
 * (schema-validator.generated.js, `npm run gen:config-validator`): compiling it at every start
 * cost about 40 ms and loading ajv's compiler another 275 KB. test/config/schema.test.ts checks
 * the schema against the draft-07 meta-schema; validator-fresh.test.ts that the module is current.
 * @example schemaErrors({ defaults: { cutoff: 2 } })[0].keyword // 'exclusiveMaximum'
 */
function schemaErrors(value) {
    return validate(value) ? [] : [...(validate.errors ?? [])];
}

;// CONCATENATED MODULE: ./src/config/wording.ts
/** Words for config values and schema nodes, shared by the schema and cross-field checks. */
/**
 * A value as a user wrote it, short: strings quoted and cut at 60 characters.
 * @example describeValue(null) // 'an empty value'
 */
function describeValue(value) {
    if (value === null || value === undefined)
        return 'an empty value';
    if (typeof value === 'string')
        return JSON.stringify(value.length > 60 ? `${value.slice(0, 57)}...` : value);
    if (typeof value === 'number' || typeof value === 'boolean')
        return String(value);
    if (Array.isArray(value))
        return 'a list';
    if (typeof value === 'object' && Object.getPrototypeOf(value) === null)
        return 'a mapping';
    return 'a value of an unsupported type';
}
const TYPE_WORDS = {
    object: 'a mapping',
    array: 'a list',
    string: 'a string',
    number: 'a number',
    integer: 'a whole number',
    boolean: 'true or false',
};
/**
 * What a schema node allows, in words: "one of higher, lower, both", "a whole number of at
 * least 2", "a number greater than 0 and less than 1".
 * @example describeAllowed({ type: 'integer', minimum: 2 }) // 'a whole number of at least 2'
 */
function describeAllowed(node) {
    if (Array.isArray(node.anyOf))
        return node.anyOf.map(describeAllowed).join(', or ');
    if (Array.isArray(node.enum))
        return `one of ${node.enum.join(', ')}`;
    if (node.type === 'string' && typeof node.pattern === 'string' && typeof node.description === 'string') {
        return node.description;
    }
    const types = (Array.isArray(node.type) ? node.type : [node.type]).filter((t) => t !== 'null');
    let words = types.map((t) => TYPE_WORDS[t] ?? t).join(' or ');
    const bounds = [];
    if (typeof node.minimum === 'number')
        bounds.push(`at least ${node.minimum}`);
    if (typeof node.exclusiveMinimum === 'number')
        bounds.push(`greater than ${node.exclusiveMinimum}`);
    if (typeof node.maximum === 'number')
        bounds.push(`at most ${node.maximum}`);
    if (typeof node.exclusiveMaximum === 'number')
        bounds.push(`less than ${node.exclusiveMaximum}`);
    if (bounds.length > 0)
        words += `${bounds[0].startsWith('at ') ? ' of' : ''} ${bounds.join(' and ')}`;
    if (node.minLength === 1)
        words = words.replace(/^a /, 'a non-empty ');
    if (typeof node.maxLength === 'number')
        words += ` of at most ${node.maxLength} characters`;
    if (node.type === 'array' && typeof node.items === 'object' && node.items !== null) {
        words = `${node.minItems === 1 ? 'a non-empty list' : 'a list'} of ${plural(describeAllowed(node.items))}`;
    }
    return words;
}
function plural(words) {
    return words.replace(/^an? (non-empty )?(\w+)/, (_, ne, noun) => `${ne ?? ''}${noun}s`);
}

// EXTERNAL MODULE: ./node_modules/yaml/dist/index.js
var dist = __webpack_require__(8815);
;// CONCATENATED MODULE: ./src/config/yaml-limits.ts
/** Largest config text accepted (characters); a real config is a few kilobytes. */
const MAX_CONFIG_CHARS = 1024 * 1024;
/** Deepest nesting of collections; a config needs five levels, so 32 leaves room without risk. */
const MAX_CONFIG_DEPTH = 32;
/** Longest single scalar (characters); globs and names are short. */
const MAX_SCALAR_CHARS = 16 * 1024;
/** Most alias uses (`*name`) in one file; the guard against "billion laughs" expansion. */
const MAX_ALIAS_COUNT = 100;
/** Most values after aliases are expanded. */
const MAX_CONFIG_VALUES = 10_000;
/**
 * Most entries (keys, list items, flow commas and brackets) in the text, counted before parsing
 * so that an oversized document costs a linear scan, not a parse; a large real config has a few
 * hundred.
 */
const MAX_CONFIG_ENTRIES = 5_000;
const DEEP = {
    message: `nesting is deeper than ${MAX_CONFIG_DEPTH} levels`,
    fix: 'a Bellgate config needs only a few levels (section, list, rule, globs); flatten the document',
};
/**
 * Checks the raw token tree before anything recursive runs over it: nesting depth and scalar
 * length. Walks with an explicit stack, so a 10,000-deep `[[[[...` cannot overflow the call stack.
 * Returns the first problem found, or undefined.
 * @example checkTokenLimits(tokens, counter) // undefined for an ordinary config
 */
function checkTokenLimits(tokens, counter) {
    const stack = tokens.map((t) => [t, 0]);
    while (stack.length > 0) {
        const [token, depth] = stack.pop();
        const at = counter.linePos(token.offset);
        switch (token.type) {
            case 'document':
                if (token.value)
                    stack.push([token.value, depth]);
                break;
            case 'block-map':
            case 'block-seq':
            case 'flow-collection': {
                if (depth + 1 > MAX_CONFIG_DEPTH) {
                    return { ...at, ...DEEP };
                }
                for (const item of token.items) {
                    if ('key' in item && item.key)
                        stack.push([item.key, depth + 1]);
                    if (item.value)
                        stack.push([item.value, depth + 1]);
                }
                break;
            }
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
            case 'block-scalar':
                if (token.source.length > MAX_SCALAR_CHARS) {
                    return {
                        ...at,
                        message: `a value of ${token.source.length} characters is longer than the limit of ${MAX_SCALAR_CHARS}`,
                        fix: 'globs, names and numbers are short; remove the oversized value',
                    };
                }
                break;
            default:
                break;
        }
    }
    return undefined;
}
/**
 * A linear scan of the raw text, before the parser, for the shapes that make the YAML library
 * slow down faster than linearly: flow brackets nested past the limit (10,000 "[" take 0.6 s to
 * parse), compact block indicators at the start of a line ("- - - x"; 300,000 take 4 s), and
 * more than MAX_CONFIG_ENTRIES keys or items. Quotes and
 * comments are skipped; checkTokenLimits still checks the real tree after parsing.
 * Returns a problem at the first bracket, indicator or entry past a limit, or undefined.
 * @example prescanShape('[[[]]]') // undefined
 */
function prescanShape(text) {
    let depth = 0;
    let entries = 0;
    let line = 1;
    let lineStart = 0;
    for (let i = 0; i < text.length; i++) {
        const c = text[i];
        if (c === '\n') {
            line++;
            lineStart = i + 1;
            continue;
        }
        if (i === lineStart) {
            let j = i;
            let indicators = 0;
            while (j < text.length && (text[j] === ' ' || text[j] === '\t'))
                j++;
            while ('-?:'.includes(text[j] ?? 'x') && (text[j + 1] === ' ' || text[j + 1] === '\t')) {
                if (++indicators > MAX_CONFIG_DEPTH)
                    return { line, col: j - lineStart + 1, ...DEEP };
                j += 2;
                while (text[j] === ' ' || text[j] === '\t')
                    j++;
            }
        }
        const prev = i === 0 ? ' ' : text[i - 1];
        const tokenStart = ' \t\n[{,:-?'.includes(prev);
        if (c === '#' && (prev === ' ' || prev === '\t' || i === lineStart)) {
            while (i + 1 < text.length && text[i + 1] !== '\n')
                i++;
        }
        else if ((c === '"' || c === "'") && tokenStart) {
            // Skip the quoted scalar, counting its line breaks.
            for (i++; i < text.length; i++) {
                if (c === '"' && text[i] === '\\')
                    i++;
                else if (text[i] === c)
                    break;
                else if (text[i] === '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
        }
        else if ((c === ':' && (' \t\r\n'.includes(text[i + 1] ?? ' ') || (depth > 0 && ',]}'.includes(text[i + 1])))) ||
            (c === '-' && tokenStart && ' \t\r\n'.includes(text[i + 1] ?? ' ')) ||
            (c === ',' && depth > 0) ||
            c === '[' ||
            c === '{') {
            if (++entries > MAX_CONFIG_ENTRIES) {
                return {
                    line,
                    col: i - lineStart + 1,
                    message: `the config has more than ${MAX_CONFIG_ENTRIES} entries`,
                    fix: 'a Bellgate config needs a few hundred keys and list items; use globs to cover many metrics with one rule',
                };
            }
        }
        if (c === '[' || c === '{') {
            if (++depth > MAX_CONFIG_DEPTH)
                return { line, col: i - lineStart + 1, ...DEEP };
        }
        else if ((c === ']' || c === '}') && depth > 0) {
            depth--;
        }
    }
    return undefined;
}

;// CONCATENATED MODULE: ./src/config/yaml-tree.ts


/** Thrown inside the builder to stop at a limit; turned into a problem by readYamlTree. */
class Stop {
    problem;
    constructor(problem) {
        this.problem = problem;
    }
}
/**
 * JSON pointer segment escaping (RFC 6901: "~" -> "~0", "/" -> "~1"), the same as ajv's instancePath.
 * @example pointerSegment('size/app.js') // 'size~1app.js'
 */
function pointerSegment(key) {
    return String(key).replace(/~/g, '~0').replace(/\//g, '~1');
}
/**
 * Parses YAML text into plain data under hard limits (size, depth, scalar length, alias uses and
 * expanded values), keeping the line:column of every key and value. Never throws for bad text:
 * problems come back in the list, and `tree` is undefined when any was found.
 * Keys are kept as own properties of null-prototype objects, so `__proto__` is just a key.
 * @example readYamlTree('cutoff: 0.05\n').tree?.value // { cutoff: 0.05 }
 */
function readYamlTree(text) {
    if (text.length > MAX_CONFIG_CHARS) {
        return {
            problems: [{
                    line: 1,
                    col: 1,
                    message: `the config is ${text.length} characters; the limit is ${MAX_CONFIG_CHARS} (1 MiB)`,
                    fix: 'a Bellgate config is a few kilobytes; check that the right file is named',
                }],
        };
    }
    const deep = prescanShape(text);
    if (deep)
        return { problems: [deep] };
    const counter = new dist/* LineCounter */.HN();
    let docs;
    try {
        const tokens = [...new dist/* Parser */.iX(counter.addNewLine).parse(text)];
        const tooBig = checkTokenLimits(tokens, counter);
        if (tooBig)
            return { problems: [tooBig] };
        docs = [...new dist/* Composer */.Dk({ uniqueKeys: false, merge: false, strict: true }).compose(tokens, true, text.length)];
    }
    catch (err) {
        // The YAML library reports problems in doc.errors; a throw would be its own bug, still shown as bad input.
        return { problems: [{ line: 1, col: 1, message: `the YAML could not be read (${err.message})`, fix: 'simplify the file' }] };
    }
    const problems = [];
    const at = (offset) => counter.linePos(offset);
    for (const doc of docs) {
        for (const issue of [...doc.errors, ...doc.warnings]) {
            problems.push({ ...at(issue.pos[0]), message: firstLine(issue.message), fix: 'write valid YAML (see https://yaml.org/spec/1.2.2/)' });
        }
    }
    if (docs.length > 1) {
        const second = docs[1];
        problems.push({
            ...at(second.range[0]),
            message: `the file holds ${docs.length} YAML documents; a config is one`,
            fix: 'remove the "---" separator and merge the documents',
        });
    }
    const doc = docs.length === 1 ? docs[0] : undefined;
    const tree = { value: undefined, valueAt: new Map(), keyAt: new Map() };
    // Built even when the parser complained, so duplicate keys are reported with syntax errors.
    if (doc !== undefined && doc.contents !== null) {
        try {
            tree.value = buildValue(doc, doc.contents, tree, at, problems);
        }
        catch (err) {
            if (!(err instanceof Stop))
                throw err;
            problems.push(err.problem);
        }
        problems.push(...collectNonFinite(tree));
    }
    return problems.length > 0 ? { problems } : { tree, problems };
}
function firstLine(message) {
    return message.split('\n')[0].trim();
}
// Duplicate keys are found here with a Set: the YAML library's own check (uniqueKeys) compares
// every pair of keys, which takes seconds on a few thousand keys.
function buildValue(doc, root, tree, at, problems) {
    let values = 0;
    let aliases = 0;
    const build = (node, pointer, depth) => {
        const pos = at(node.range?.[0] ?? 0);
        if (++values > MAX_CONFIG_VALUES || depth > MAX_CONFIG_DEPTH) {
            const what = values > MAX_CONFIG_VALUES ? `more than ${MAX_CONFIG_VALUES} values` : `nesting deeper than ${MAX_CONFIG_DEPTH} levels`;
            throw new Stop({ ...pos, message: `the config expands to ${what}`, fix: 'use fewer aliases (*name); a config needs a few hundred values at most' });
        }
        if (!tree.valueAt.has(pointer))
            tree.valueAt.set(pointer, pos);
        if ((0,dist/* isAlias */.Vj)(node)) {
            if (++aliases > MAX_ALIAS_COUNT) {
                throw new Stop({ ...pos, message: `more than ${MAX_ALIAS_COUNT} aliases (*name)`, fix: 'repeat the values instead of aliasing them' });
            }
            const target = node.resolve(doc);
            if (target === undefined)
                throw new Stop({ ...pos, message: `alias *${node.source} names no anchor`, fix: `define &${node.source} before using it` });
            return build(target, pointer, depth + 1);
        }
        if ((0,dist/* isScalar */.jn)(node))
            return node.value;
        if ((0,dist/* isSeq */.oP)(node))
            return node.items.map((item, i) => build(item, `${pointer}/${i}`, depth + 1));
        if ((0,dist/* isMap */.jh)(node)) {
            const out = Object.create(null);
            for (const pair of node.items) {
                const keyNode = pair.key;
                const keyPos = at(keyNode?.range?.[0] ?? node.range?.[0] ?? 0);
                const key = (0,dist/* isScalar */.jn)(keyNode) ? keyNode.value : undefined;
                if (typeof key !== 'string' && typeof key !== 'number') {
                    throw new Stop({ ...keyPos, message: 'a key must be a plain name', fix: 'write keys like "cutoff:"; lists and mappings cannot be keys' });
                }
                if (Object.hasOwn(out, String(key))) {
                    problems.push({ ...keyPos, message: `the key ${JSON.stringify(String(key))} appears twice in one mapping`, fix: 'keep one of the two entries' });
                    continue;
                }
                const child = `${pointer}/${pointerSegment(key)}`;
                tree.keyAt.set(child, keyPos);
                const value = pair.value === null ? null : build(pair.value, child, depth + 1);
                if (pair.value === null)
                    tree.valueAt.set(child, keyPos);
                out[String(key)] = value;
            }
            return out;
        }
        throw new Stop({ ...pos, message: 'unsupported YAML node', fix: 'write plain mappings, lists and scalars' });
    };
    return build(root, '', 0);
}
/** YAML spells infinity and not-a-number (.inf, .nan); no setting accepts them. */
function collectNonFinite(tree) {
    const problems = [];
    const walk = (value, pointer) => {
        if (typeof value === 'number' && !Number.isFinite(value)) {
            const pos = tree.valueAt.get(pointer) ?? { line: 1, col: 1 };
            problems.push({ ...pos, message: `${value > 0 ? '.inf' : value < 0 ? '-.inf' : '.nan'} is not a finite number`, fix: 'write an ordinary number' });
        }
        else if (Array.isArray(value)) {
            value.forEach((item, i) => walk(item, `${pointer}/${i}`));
        }
        else if (value !== null && typeof value === 'object') {
            for (const [key, item] of Object.entries(value))
                walk(item, `${pointer}/${pointerSegment(key)}`);
        }
    };
    walk(tree.value, '');
    return problems;
}

;// CONCATENATED MODULE: ./src/config/explain-schema-errors.ts




const MAX_EXPLAINED = 200;
const SETTING_KEYS = Object.keys(configSchema.properties.defaults.properties);
const RULE_ONLY_KEYS = ['match', 'ignore', 'relative-to'];
const TOP_KEYS = Object.keys(configSchema.properties);
function segments(pointer) {
    return pointer === '' ? [] : pointer.slice(1).split('/').map((s) => s.replace(/~1/g, '/').replace(/~0/g, '~'));
}
/**
 * A human name for a place in the config: "cutoff (in defaults)", "worse (in metrics rule #2)",
 * "match item #1 (in metrics rule #3)". List positions are 1-based, as people count.
 * @example placeName('/metrics/1/worse') // 'worse (in metrics rule #2)'
 */
function placeName(pointer) {
    const parts = segments(pointer);
    if (parts.length === 0)
        return 'the config';
    const section = parts[0];
    const entry = section === 'metrics' ? 'metrics rule' : 'groups entry';
    let context = '';
    let rest = parts.slice(1);
    if ((section === 'metrics' || section === 'groups') && rest.length > 0) {
        context = `${entry} #${Number(rest[0]) + 1}`;
        rest = rest.slice(1);
    }
    else if (rest.length > 0) {
        context = section;
    }
    if (rest.length === 0)
        return context === '' ? section : context;
    let name = rest[0];
    if (rest.length > 1)
        name += ` item #${Number(rest[1]) + 1}`;
    return `${name} (in ${context})`;
}
function position(tree, pointer, key = false) {
    for (let p = pointer;; p = p.slice(0, p.lastIndexOf('/'))) {
        const found = (key ? tree.keyAt.get(p) : undefined) ?? tree.valueAt.get(p);
        if (found)
            return found;
        if (p === '')
            return { line: 1, col: 1 };
    }
}
function unknownKey(error, tree) {
    const key = String(error.params.additionalProperty);
    const pointer = `${error.instancePath}/${pointerSegment(key)}`;
    const allowed = Object.keys(error.parentSchema.properties);
    const where = error.instancePath === '' ? 'at the top level' : `in ${placeName(error.instancePath)}`;
    const guess = (0,did_you_mean/* didYouMean */.a)(key, allowed);
    let fix = guess ? `did you mean "${guess}"?` : `allowed here: ${allowed.join(', ')}`;
    if (!guess && error.instancePath === '' && SETTING_KEYS.includes(key))
        fix = `"${key}" is a metric setting: put it under defaults: or in a metrics rule`;
    if (!guess && error.instancePath !== '' && TOP_KEYS.includes(key))
        fix = `"${key}" is a top-level key: write it without indentation`;
    if (!guess && error.instancePath === '/defaults' && RULE_ONLY_KEYS.includes(key))
        fix = `"${key}" belongs in a metrics rule (under metrics:), not in defaults`;
    return { ...position(tree, pointer, true), message: `unknown key ${JSON.stringify(key)} ${where}`, fix };
}
function wrongValue(error, tree) {
    const node = error.parentSchema;
    const name = placeName(error.instancePath);
    const allowed = describeAllowed(node);
    const message = `${name} must be ${allowed}; got ${describeValue(error.data)}`;
    let fix;
    if (Array.isArray(node.enum) && typeof error.data === 'string') {
        const guess = (0,did_you_mean/* didYouMean */.a)(error.data, node.enum.map(String));
        if (guess)
            fix = `did you mean "${guess}"?`;
    }
    const data = error.data;
    const wantsNumber = node.type === 'number' || node.type === 'integer' || Array.isArray(node.anyOf);
    if (!fix && typeof data === 'string' && wantsNumber && data.trim() !== '' && Number.isFinite(Number(data))) {
        fix = `write the number without quotes: ${data.trim()}`;
    }
    if (!fix && typeof data === 'string' && node.type === 'boolean' && /^(yes|no|on|off|y|n)$/i.test(data)) {
        fix = `write true or false (YAML 1.2 reads ${data} as text)`;
    }
    if (!fix && Array.isArray(node.examples))
        fix = `for example: ${JSON.stringify(node.examples[0])}`;
    if (!fix && node.type === 'array')
        fix = `write ${name} as a YAML list, one item per line starting with "- "`;
    if (!fix)
        fix = `change it to ${allowed}`; // every refusal says what to do, even without an example
    return { ...position(tree, error.instancePath), message, fix };
}
/**
 * Turns ajv errors into problems at the line:column of the offending key or value, worded as
 * what is allowed there. Errors inside an `anyOf` (match: string or list; tolerance: number or
 * percent) are folded into one problem, placed at the deepest failing part.
 * @example explainSchemaErrors(schemaErrors(value), tree) // [{ line: 2, col: 3, message: 'unknown key "cuttoff" in defaults', fix: 'did you mean "cutoff"?' }]
 */
function explainSchemaErrors(errors, tree) {
    const problems = [];
    const branches = errors.filter((e) => e.schemaPath.includes('/anyOf/'));
    // A message lists 20 problems; explaining thousands (a file of unknown keys) only costs time.
    for (const error of errors.slice(0, MAX_EXPLAINED)) {
        if (error.schemaPath.includes('/anyOf/'))
            continue;
        if (error.keyword === 'additionalProperties') {
            problems.push(unknownKey(error, tree));
        }
        else if (error.keyword === 'required') {
            const key = String(error.params.missingProperty);
            problems.push({
                ...position(tree, error.instancePath),
                message: `${placeName(error.instancePath)} has no "${key}"`,
                fix: key === 'match' ? 'add a glob over metric names, e.g. match: "latency/*"' : `add ${key}:`,
            });
        }
        else if (error.keyword === 'anyOf') {
            const inner = branches
                .filter((b) => b.instancePath.startsWith(`${error.instancePath}/`) && b.keyword !== 'type')
                .concat(branches.filter((b) => b.instancePath.startsWith(`${error.instancePath}/`)))[0];
            problems.push(wrongValue(inner ?? error, tree));
        }
        else {
            problems.push(wrongValue(error, tree));
        }
    }
    const seen = new Set();
    return problems.filter((p) => {
        const id = `${p.line}:${p.col}:${p.message}`;
        return seen.has(id) ? false : (seen.add(id), true);
    });
}

// EXTERNAL MODULE: ./src/config/name-matchers.ts
var name_matchers = __webpack_require__(6471);
// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
;// CONCATENATED MODULE: ./src/config/problems.ts

/** How many problems one error lists; a file with more has bigger trouble than a list can fix. */
const MAX_LISTED_PROBLEMS = 20;
/**
 * One InputError for all problems of a file, in reading order: the first one is the message,
 * `where` ("file:line:col") and `fix`; the others follow in the message, one a line.
 * @example problemsError([{ line: 2, col: 3, message: 'unknown key "cuttoff"' }], 'bellgate.yml').where // 'bellgate.yml:2:3'
 */
function problemsError(problems, source) {
    const sorted = [...problems].sort((a, b) => a.line - b.line || a.col - b.col);
    const first = sorted[0];
    if (first === undefined)
        throw new Error('problemsError needs at least one problem');
    const rest = sorted.slice(1, MAX_LISTED_PROBLEMS);
    let message = first.message;
    if (rest.length > 0) {
        const lines = rest.map((p) => `  ${source}:${p.line}:${p.col}: ${p.message}${p.fix ? ` (${p.fix})` : ''}`);
        const more = sorted.length - 1 - rest.length;
        message += `\nand ${sorted.length - 1} more problem${sorted.length > 2 ? 's' : ''}:\n${lines.join('\n')}`;
        if (more > 0)
            message += `\n  ... ${more} not shown`;
    }
    return new input_error/* InputError */.d(message, { where: `${source}:${first.line}:${first.col}`, fix: first.fix });
}

// EXTERNAL MODULE: ./src/config/defaults.ts
var defaults = __webpack_require__(1954);
;// CONCATENATED MODULE: ./src/config/tolerance.ts
const PERCENT = /^((?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)) ?%$/;
/**
 * Reads a `tolerance:` value: a number is absolute (in the metric's unit), a string "N%" is a
 * share of the baseline mean. Returns undefined for anything else (the schema has refused it).
 * @example parseTolerance('1%') // { kind: 'percent', amount: 0.01 }
 * @example parseTolerance(512) // { kind: 'absolute', amount: 512 }
 */
function parseTolerance(value) {
    if (typeof value === 'number' && Number.isFinite(value) && value >= 0)
        return { kind: 'absolute', amount: value };
    if (typeof value !== 'string')
        return undefined;
    const found = PERCENT.exec(value);
    return found ? { kind: 'percent', amount: Number(found[1]) / 100 } : undefined;
}

;// CONCATENATED MODULE: ./src/config/to-config.ts


/** YAML key -> MetricSettings field. */
const FIELDS = [
    ['cutoff', 'cutoff'], ['worse', 'worse'], ['tolerance', 'tolerance'], ['resolution', 'resolution'],
    ['window', 'window'], ['min-runs', 'minRuns'], ['transform', 'transform'], ['fit', 'fit'],
    ['uncertainty', 'uncertainty'], ['aggregate', 'aggregate'], ['change-points', 'changePoints'],
    ['ignore', 'ignore'], ['relative-to', 'relativeTo'],
];
function settingsOf(data) {
    const out = {};
    for (const [key, field] of FIELDS) {
        if (data[key] === undefined)
            continue;
        out[field] = field === 'tolerance' ? parseTolerance(data[key]) : data[key];
    }
    return out;
}
/** A `match:` value (one glob or a list) as a list. */
function globList(value) {
    return Array.isArray(value) ? value.map(String) : [String(value)];
}
/**
 * Builds the Config from schema-valid plain data, and checks what the schema cannot: globs that
 * do not compile, a `relative-to` naming its own rule's metric, group names used twice, and
 * window or keep too small for min-runs (such metrics could never leave learning). Each rule's and
 * group's globs are compiled here with `globs` (picomatch, or string comparison when every glob is
 * a plain name), which files the matchers for settingsFor and groupFor.
 * @example toConfig({ defaults: { tolerance: '2%' } }, tree, 'bellgate.yml', picomatchCompiler).config.defaults.tolerance // { kind: 'percent', amount: 0.02 }
 */
function toConfig(value, tree, source, globs) {
    const config = (0,defaults/* defaultConfig */.sb)();
    config.source = source;
    const problems = [];
    const at = (pointer, key = false) => {
        for (let p = pointer;; p = p.slice(0, p.lastIndexOf('/'))) {
            const found = (key ? tree.keyAt.get(p) : undefined) ?? tree.valueAt.get(p);
            if (found || p === '')
                return found ?? { line: 1, col: 1 };
        }
    };
    const root = (value ?? {});
    Object.assign(config.defaults, settingsOf((root.defaults ?? {})));
    if (root.family !== undefined)
        config.family = root.family;
    if (root.keep !== undefined)
        config.keep = root.keep;
    if (root['input-format'] !== undefined)
        config.inputFormat = root['input-format'];
    const limits = (root.limits ?? {});
    if (limits['max-file-bytes'] !== undefined)
        config.limits.maxFileBytes = limits['max-file-bytes'];
    if (limits['max-line-length'] !== undefined)
        config.limits.maxLineLength = limits['max-line-length'];
    if (limits['max-metrics'] !== undefined)
        config.limits.maxMetrics = limits['max-metrics'];
    const checkGlobs = (list, pointer) => {
        try {
            globs.compile(list);
        }
        catch (err) {
            problems.push({ ...at(pointer), message: `a glob cannot be used: ${err.message}`, fix: 'write a shorter, simpler glob' });
        }
    };
    (root.metrics ?? []).forEach((item, i) => {
        const pointer = `/metrics/${i}`;
        const rule = { match: globList(item.match), settings: settingsOf(item), line: at(pointer).line };
        checkGlobs(rule.match, `${pointer}/match`);
        const target = rule.settings.relativeTo;
        if (target !== undefined && rule.match.length === 1 && globs.isLiteral(rule.match[0]) && rule.match[0] === target) {
            problems.push({
                ...at(`${pointer}/relative-to`),
                message: `relative-to names the rule's own metric "${target}"; it would be divided by itself`,
                fix: 'name a different metric of the same run, such as a calibration benchmark',
            });
        }
        config.rules.push(rule);
    });
    const names = new Map();
    (root.groups ?? []).forEach((item, i) => {
        const pointer = `/groups/${i}`;
        const name = String(item.name);
        const group = { name, match: item.match === undefined ? [`${name}/**`] : globList(item.match), line: at(pointer).line };
        checkGlobs(group.match, `${pointer}/match`);
        const earlier = names.get(name);
        if (earlier !== undefined) {
            problems.push({ ...at(`${pointer}/name`), message: `group name "${name}" is used twice (first on line ${earlier})`, fix: 'give each group its own name' });
        }
        else {
            names.set(name, at(`${pointer}/name`).line);
        }
        config.groups.push(group);
    });
    checkRunCounts(config, root, at, problems);
    return { config, problems };
}
/** window and keep below min-runs leave a metric in learning for ever; say so where it was set. */
function checkRunCounts(config, root, at, problems) {
    const levels = [
        { pointer: '/defaults', own: (root.defaults ?? {}), settings: config.defaults, label: 'defaults' },
        ...config.rules.map((rule, i) => ({
            pointer: `/metrics/${i}`,
            own: (root.metrics ?? [])[i] ?? {},
            settings: { ...config.defaults, ...rule.settings },
            label: `metrics rule #${i + 1}`,
        })),
    ];
    for (const { pointer, own, settings, label } of levels) {
        const setHere = own.window !== undefined || own['min-runs'] !== undefined;
        if (settings.window < settings.minRuns && (setHere || pointer === '/defaults')) {
            const key = own.window !== undefined ? 'window' : own['min-runs'] !== undefined ? 'min-runs' : '';
            problems.push({
                ...at(key ? `${pointer}/${key}` : pointer, true),
                message: `window (${settings.window}) is smaller than min-runs (${settings.minRuns}) in ${label}, so its metrics would never leave learning`,
                fix: 'make window at least as large as min-runs',
            });
        }
        if (config.keep < settings.minRuns && (own['min-runs'] !== undefined || pointer === '/defaults')) {
            const pointerOfKeep = root.keep !== undefined ? '/keep' : `${pointer}/min-runs`;
            problems.push({
                ...at(pointerOfKeep, true),
                message: `keep (${config.keep}) is smaller than min-runs (${settings.minRuns}) in ${label}, so the history could never hold enough runs`,
                fix: 'make keep at least as large as every min-runs',
            });
        }
    }
}

;// CONCATENATED MODULE: ./src/config/config-text.ts






/**
 * The first two steps of reading a config: YAML under hard limits (yaml-tree.ts), then the JSON
 * Schema (bellgate.schema.json). Returns the tree, or undefined when the file is empty or holds
 * only comments (the defaults apply). A leading byte-order mark is dropped.
 * @throws InputError listing every problem, at the "source:line:col" of the first.
 * @example checkedConfigTree('cutoff: 2\n', 'b.yml') // throws InputError at b.yml:1:1 (unknown key)
 */
function checkedConfigTree(text, source) {
    const body = text.startsWith('\uFEFF') ? text.slice(1) : text;
    const { tree, problems } = readYamlTree(body);
    if (!tree || problems.length > 0)
        throw problemsError(problems, source);
    if (tree.value === undefined || tree.value === null)
        return undefined;
    const schemaProblems = explainSchemaErrors(schemaErrors(tree.value), tree);
    if (schemaProblems.length > 0)
        throw problemsError(schemaProblems, source);
    return tree;
}
/**
 * The last step: the Config from a checked tree (to-config.ts), with the rules' globs compiled by
 * `globs`. @throws InputError for what the schema cannot say (a bad glob, window < min-runs, ...).
 * @example configFromTree(checkedConfigTree('keep: 900\n', 'b.yml')!, 'b.yml', exactNameCompiler).keep // 900
 */
function configFromTree(tree, source, globs) {
    const built = toConfig(tree.value, tree, source, globs);
    if (built.problems.length > 0)
        throw problemsError(built.problems, source);
    return built.config;
}
/**
 * Whether any `metrics:` rule or `groups:` entry of a checked tree has a glob that is more than a
 * plain name (a group without `match` means "name/**"), so the glob library must be loaded.
 * @example needsGlobLibrary({ metrics: [{ match: 'latency/render' }] }) // false
 */
function needsGlobLibrary(value) {
    const root = (value ?? {});
    const rules = (root.metrics ?? []);
    const groups = (root.groups ?? []);
    return rules.some((rule) => !(0,name_matchers/* exactMatcher */.Gh)(globList(rule.match)))
        || groups.some((group) => group.match === undefined || !(0,name_matchers/* exactMatcher */.Gh)(globList(group.match)));
}


/***/ }),

/***/ 9255:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Y: () => (/* binding */ editDistance),
/* harmony export */   a: () => (/* binding */ didYouMean)
/* harmony export */ });
/**
 * Levenshtein edit distance (insertions, deletions, substitutions each cost 1), by the classic
 * two-row dynamic programme (Wagner & Fischer 1974). O(|a| * |b|) time, O(|b|) memory.
 * @example editDistance('cuttoff', 'cutoff') // 1
 */
function editDistance(a, b) {
    let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
    for (let i = 1; i <= a.length; i++) {
        const current = [i];
        for (let j = 1; j <= b.length; j++) {
            const cost = a[i - 1] === b[j - 1] ? 0 : 1;
            current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, previous[j - 1] + cost);
        }
        previous = current;
    }
    return previous[b.length];
}
/** Case, dashes, underscores and spaces are what people most often get "wrong" in a key. */
function normalise(word) {
    return word.toLowerCase().replace(/[-_\s]/g, '');
}
/**
 * The candidate a mistyped word most likely meant, or undefined when none is close: equal after
 * ignoring case, '-', '_' and spaces (`minRuns`, `min_runs` -> `min-runs`), else within an edit
 * distance of about a third of the candidate's length (`cuttoff` -> `cutoff`).
 * @example didYouMean('tolerence', ['cutoff', 'tolerance']) // 'tolerance'
 */
function didYouMean(word, candidates) {
    if (word.length > 64)
        return undefined;
    const plain = normalise(word);
    let best;
    let bestDistance = Infinity;
    for (const candidate of candidates) {
        const target = normalise(candidate);
        if (target === plain)
            return candidate;
        const distance = editDistance(plain, target);
        if (distance <= Math.max(1, Math.floor(target.length / 3)) && distance < bestDistance) {
            best = candidate;
            bestDistance = distance;
        }
    }
    return best;
}


/***/ })

};
