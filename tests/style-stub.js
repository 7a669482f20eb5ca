// CSS files are for the web bundle; Jest only needs something to import.
module.exports = {};
