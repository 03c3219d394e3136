// A local lint rule for the apps' one form pattern (DEVELOPERS.md, "Forms"): a component that draws a <form> keeps
// its fields in react-hook-form, so it calls useForm itself.

/** The component a node sits in: the outermost function around it (a component's own handlers are inside it). */
function componentOf(node) {
  let component;
  for (let parent = node.parent; parent; parent = parent.parent) {
    if (/Function/.test(parent.type)) component = parent;
  }
  return component;
}

export const formNeedsUseForm = {
  meta: {
    type: 'suggestion',
    docs: { description: 'a component that renders a <form> keeps its fields with useForm (react-hook-form)' },
    messages: {
      missing: 'keep this form’s fields in react-hook-form: call useForm with a zod schema in this component',
    },
    schema: [],
  },
  create(context) {
    const forms = [];
    const withUseForm = new Set();
    return {
      JSXOpeningElement(node) {
        if (node.name.type === 'JSXIdentifier' && node.name.name === 'form') forms.push(node);
      },
      'CallExpression[callee.name="useForm"]'(node) {
        withUseForm.add(componentOf(node));
      },
      'Program:exit'() {
        for (const form of forms)
          if (!withUseForm.has(componentOf(form))) context.report({ node: form, messageId: 'missing' });
      },
    };
  },
};

export default { rules: { 'form-needs-use-form': formNeedsUseForm } };
