console.log("generate placeholder")
