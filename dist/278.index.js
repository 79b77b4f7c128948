export const id = 278;
export const ids = [278];
export const modules = {

/***/ 63278:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   artifactName: () => (/* binding */ artifactName)
/* harmony export */ });
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(77598);
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_crypto__WEBPACK_IMPORTED_MODULE_0__);

/**
 * The artifact name of a series: readable slug plus a short hash, so distinct series never share a
 * name even when their slugs coincide. Only characters the artifact service accepts. A module of
 * its own so the action can name artifacts without loading the artifact store and its zip reader.
 * @example artifactName('bellgate-history', 'bench/linux') // 'bellgate-history-bench-linux-<8 hex>'
 */
function artifactName(history, series) {
    const slug = series
        .replace(/[^A-Za-z0-9._-]+/g, '-')
        .replace(/^-+|-+$/g, '')
        .slice(0, 60);
    const hash = (0,node_crypto__WEBPACK_IMPORTED_MODULE_0__.createHash)('sha256').update(series).digest('hex').slice(0, 8);
    return slug === '' ? `${history}-${hash}` : `${history}-${slug}-${hash}`;
}


/***/ })

};
